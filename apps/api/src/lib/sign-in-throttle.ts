import { createHash } from "node:crypto";
import { and, gt, inArray, lt, or, isNull, sql } from "drizzle-orm";
import { throttleCounters, type Db } from "@takeup/db";
import { HttpError } from "./http-error.ts";

/** At `limit` hits within `windowMs` the key is refused for `blockMs` (0: only counted). */
export type ThrottleRule = { limit: number; windowMs: number; blockMs: number };

const minutes = (n: number) => n * 60 * 1000;

/**
 * The policy of decision 009. The guesser (one client address, and one address on one account)
 * is locked out for an hour; the account itself, which a stranger can reach from anywhere, only
 * for a few minutes, so nobody can keep the owner out of the studio for long.
 */
export type ThrottlePolicy = {
  signInPerAddressAndAccount: ThrottleRule;
  signInPerAddress: ThrottleRule;
  signInPerAccount: ThrottleRule;
  /** Reset requests from one client address: 429 past the limit. */
  resetRequestsPerAddress: ThrottleRule;
  /** Reset e-mails to one account: past the limit the request is answered the same and no e-mail goes out. */
  resetEmailsPerAccount: ThrottleRule;
};

export const defaultThrottlePolicy: ThrottlePolicy = {
  signInPerAddressAndAccount: { limit: 5, windowMs: minutes(15), blockMs: minutes(60) },
  signInPerAddress: { limit: 20, windowMs: minutes(15), blockMs: minutes(60) },
  signInPerAccount: { limit: 10, windowMs: minutes(15), blockMs: minutes(5) },
  resetRequestsPerAddress: { limit: 10, windowMs: minutes(15), blockMs: minutes(15) },
  resetEmailsPerAccount: { limit: 3, windowMs: minutes(60), blockMs: 0 },
};

type Key = { key: string; rule: ThrottleRule };

/** Keys are hashed: the table holds no e-mail or client address, and every key fits the column. */
const keyOf = (kind: string, ...parts: string[]) =>
  `${kind}:${createHash("sha256").update(parts.join("\u0000")).digest("base64url")}`;

const tooMany = (what: string, ms: number) => {
  const m = Math.max(1, Math.ceil(ms / 60000));
  return new HttpError(429, "too_many_attempts", `${what} Try again in ${m} minute${m === 1 ? "" : "s"}.`);
};

/**
 * Sign-in and password-reset throttles, counted in MariaDB (`throttle_counters`) so that every
 * API process shares one count. Each hit is one atomic upsert; nothing is kept in memory.
 */
export class SignInThrottle {
  readonly policy: ThrottlePolicy;

  constructor(
    private readonly db: Db,
    policy: Partial<ThrottlePolicy> = {},
    private readonly now: () => number = Date.now,
  ) {
    this.policy = { ...defaultThrottlePolicy, ...policy };
  }

  private signInKeys(address: string, email: string): Key[] {
    const account = email.toLowerCase();
    return [
      { key: keyOf("sign-in:address-account", address, account), rule: this.policy.signInPerAddressAndAccount },
      { key: keyOf("sign-in:address", address), rule: this.policy.signInPerAddress },
      { key: keyOf("sign-in:account", account), rule: this.policy.signInPerAccount },
    ];
  }

  async assertSignInAllowed(address: string, email: string): Promise<void> {
    const wait = await this.blockedFor(this.signInKeys(address, email));
    if (wait !== undefined) throw tooMany("Too many failed sign-ins.", wait);
  }

  async recordSignInFailure(address: string, email: string): Promise<void> {
    for (const key of this.signInKeys(address, email)) await this.hit(key);
  }

  /** The right password clears this address's count on the account and the account's own count. */
  async recordSignInSuccess(address: string, email: string): Promise<void> {
    const [addressAndAccount, , account] = this.signInKeys(address, email);
    await this.db.delete(throttleCounters).where(inArray(throttleCounters.key, [addressAndAccount!.key, account!.key]));
  }

  /** Counts a reset request from a client address; 429 once the address is over its limit. */
  async assertResetRequestAllowed(address: string): Promise<void> {
    const key = { key: keyOf("reset:address", address), rule: this.policy.resetRequestsPerAddress };
    const blocked = await this.blockedFor([key]);
    if (blocked !== undefined) throw tooMany("Too many password-reset requests.", blocked);
    await this.hit(key);
  }

  /** Whether another reset e-mail may go to this address now (counted whether or not the account exists). */
  async takeResetEmail(email: string): Promise<boolean> {
    const hits = await this.hit({ key: keyOf("reset:account", email.toLowerCase()), rule: this.policy.resetEmailsPerAccount });
    return hits <= this.policy.resetEmailsPerAccount.limit;
  }

  /** Drops counters whose window and block have both passed (called by the scheduler). */
  async purgeExpired(): Promise<void> {
    const longest = Math.max(...Object.values(this.policy).map((r) => Math.max(r.windowMs, r.blockMs)));
    const now = new Date(this.now());
    await this.db
      .delete(throttleCounters)
      .where(
        and(
          lt(throttleCounters.windowStartedAt, new Date(now.getTime() - longest)),
          or(isNull(throttleCounters.blockedUntil), lt(throttleCounters.blockedUntil, now)),
        ),
      );
  }

  /** Milliseconds until every key may try again, or undefined when none is blocked. */
  private async blockedFor(keys: Key[]): Promise<number | undefined> {
    const now = new Date(this.now());
    const rows = await this.db
      .select({ blockedUntil: throttleCounters.blockedUntil })
      .from(throttleCounters)
      .where(and(inArray(throttleCounters.key, keys.map((k) => k.key)), gt(throttleCounters.blockedUntil, now)));
    if (rows.length === 0) return undefined;
    return Math.max(...rows.map((r) => r.blockedUntil!.getTime() - now.getTime()));
  }

  /**
   * One atomic upsert: a hit after the window has passed starts a new window; the hit that reaches
   * the limit sets the block. MariaDB evaluates ON DUPLICATE KEY UPDATE assignments left to right
   * with the values already assigned, so blocked_until is computed first, from the old hits and
   * window, then hits, then the window. Returns the hits counted in the current window.
   */
  private async hit({ key, rule }: Key): Promise<number> {
    const now = new Date(this.now());
    const windowOpenedAfter = new Date(now.getTime() - rule.windowMs);
    const blockUntil = rule.blockMs > 0 ? new Date(now.getTime() + rule.blockMs) : null;
    const firstBlocks = rule.limit <= 1 ? blockUntil : null;
    await this.db.execute(sql`
      INSERT INTO ${throttleCounters} (\`key\`, hits, window_started_at, blocked_until)
      VALUES (${key}, 1, ${now}, ${firstBlocks})
      ON DUPLICATE KEY UPDATE
        blocked_until = IF(window_started_at <= ${windowOpenedAfter},
                           IF(blocked_until > ${now}, blocked_until, ${firstBlocks}),
                           IF(hits + 1 >= ${rule.limit} AND ${blockUntil} IS NOT NULL, ${blockUntil}, blocked_until)),
        hits = IF(window_started_at <= ${windowOpenedAfter}, 1, hits + 1),
        window_started_at = IF(window_started_at <= ${windowOpenedAfter}, ${now}, window_started_at)`);
    const [row] = await this.db
      .select({ hits: throttleCounters.hits })
      .from(throttleCounters)
      .where(inArray(throttleCounters.key, [key]));
    return row?.hits ?? 1;
  }
}
