import { HttpError } from "./http-error.ts";

type Window = { failures: number; firstAt: number };

/**
 * Counts failed sign-ins per client address and per account in a sliding window; past the
 * limit, sign-in answers 429 until the window has passed. In memory: one API process.
 */
export class SignInThrottle {
  private readonly byAddress = new Map<string, Window>();
  private readonly byAccount = new Map<string, Window>();

  constructor(
    private readonly limits = { perAddress: 20, perAccount: 5, windowMs: 15 * 60 * 1000 },
    private readonly now: () => number = Date.now,
  ) {}

  assertAllowed(address: string, email: string): void {
    const blocked =
      this.over(this.byAccount, email.toLowerCase(), this.limits.perAccount) ??
      this.over(this.byAddress, address, this.limits.perAddress);
    if (blocked !== undefined) {
      const minutes = Math.max(1, Math.ceil(blocked / 60000));
      throw new HttpError(429, "too_many_attempts", `Too many failed sign-ins. Try again in ${minutes} minute${minutes === 1 ? "" : "s"}.`);
    }
  }

  recordFailure(address: string, email: string): void {
    this.bump(this.byAddress, address);
    this.bump(this.byAccount, email.toLowerCase());
  }

  recordSuccess(email: string): void {
    this.byAccount.delete(email.toLowerCase());
  }

  /** Milliseconds until the key may try again, or undefined when it is under the limit. */
  private over(map: Map<string, Window>, key: string, limit: number): number | undefined {
    const entry = map.get(key);
    if (!entry) return undefined;
    const age = this.now() - entry.firstAt;
    if (age > this.limits.windowMs) {
      map.delete(key);
      return undefined;
    }
    return entry.failures >= limit ? this.limits.windowMs - age : undefined;
  }

  private bump(map: Map<string, Window>, key: string) {
    const entry = map.get(key);
    if (!entry || this.now() - entry.firstAt > this.limits.windowMs) map.set(key, { failures: 1, firstAt: this.now() });
    else entry.failures++;
    if (map.size > 50_000) map.delete(map.keys().next().value as string);
  }
}
