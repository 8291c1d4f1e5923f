import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, type TestApp } from "../../test/harness.ts";
import { SignInThrottle, defaultThrottlePolicy } from "../../lib/sign-in-throttle.ts";
import { demo } from "../../test/demo.ts";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp({
    throttlePolicy: {
      signInPerAddressAndAccount: { limit: 3, windowMs: 60_000, blockMs: 60_000 },
      signInPerAddress: { limit: 8, windowMs: 60_000, blockMs: 60_000 },
    },
  });
});
afterAll(() => t.close());

const attempt = (email: string, password: string) => t.client().post("/api/session").send({ email, password });

describe("sign-in throttling", () => {
  it("answers 429 for an account after repeated failures from one address, even with the right password", async () => {
    for (let i = 0; i < 3; i++) expect((await attempt(demo.engineer, "wrong-password")).status).toBe(401);
    const blocked = await attempt(demo.engineer, "studio-demo-2026");
    expect(blocked.status).toBe(429);
    expect(blocked.body.error).toMatchObject({ code: "too_many_attempts", message: expect.stringMatching(/Try again in \d+ minute/) });
  });

  it("answers 429 for an address after repeated failures across accounts", async () => {
    for (let i = 0; i < 5; i++) await attempt(`nobody${i}@wrenfield.test`, "wrong-password");
    const blocked = await attempt(demo.owner, "studio-demo-2026");
    expect(blocked.status).toBe(429);
  });
});

describe("who is locked out, and for how long (decision 009)", () => {
  const owner = "owner@wrenfield.test";
  const hour = 60 * 60 * 1000;

  it("locks the guesser's address out of the account for an hour while the owner, elsewhere, still signs in", async () => {
    let now = Date.parse("2026-03-02T09:00:00Z");
    const throttle = new SignInThrottle(t.db, {}, () => now);
    const { limit } = defaultThrottlePolicy.signInPerAddressAndAccount;
    for (let i = 0; i < limit; i++) await throttle.recordSignInFailure("203.0.113.7", owner);
    await expect(throttle.assertSignInAllowed("203.0.113.7", owner)).rejects.toMatchObject({ status: 429 });
    await expect(throttle.assertSignInAllowed("198.51.100.20", owner)).resolves.toBeUndefined();
    now += hour - 60_000;
    await expect(throttle.assertSignInAllowed("203.0.113.7", owner)).rejects.toMatchObject({ status: 429 });
    now += 120_000;
    await expect(throttle.assertSignInAllowed("203.0.113.7", owner)).resolves.toBeUndefined();
  });

  it("locks the account itself only for minutes when guesses come from many addresses, and the guessers stay locked longer", async () => {
    let now = Date.parse("2026-03-03T09:00:00Z");
    const throttle = new SignInThrottle(t.db, {}, () => now);
    const account = "manager@wrenfield.test";
    const perGuesser = defaultThrottlePolicy.signInPerAddressAndAccount.limit;
    const guessers = Math.ceil(defaultThrottlePolicy.signInPerAccount.limit / perGuesser);
    for (let g = 0; g < guessers; g++) {
      for (let i = 0; i < perGuesser; i++) await throttle.recordSignInFailure(`192.0.2.${g + 1}`, account);
    }
    await expect(throttle.assertSignInAllowed("198.51.100.20", account)).rejects.toMatchObject({ status: 429 });
    now += defaultThrottlePolicy.signInPerAccount.blockMs + 1000;
    await expect(throttle.assertSignInAllowed("198.51.100.20", account)).resolves.toBeUndefined();
    await expect(throttle.assertSignInAllowed("192.0.2.1", account)).rejects.toMatchObject({ status: 429 });
  });

  it("lets an address try again once the window has passed without reaching the limit", async () => {
    let now = Date.parse("2026-03-04T09:00:00Z");
    const throttle = new SignInThrottle(t.db, {}, () => now);
    const rule = defaultThrottlePolicy.signInPerAddressAndAccount;
    for (let i = 0; i < rule.limit - 1; i++) await throttle.recordSignInFailure("203.0.113.9", "books@wrenfield.test");
    now += rule.windowMs + 1000;
    await throttle.recordSignInFailure("203.0.113.9", "books@wrenfield.test");
    await expect(throttle.assertSignInAllowed("203.0.113.9", "books@wrenfield.test")).resolves.toBeUndefined();
  });

  it("forgets counters whose window and block have passed (these tests' earlier days too)", async () => {
    let now = Date.parse("2026-03-05T09:00:00Z");
    const throttle = new SignInThrottle(t.db, {}, () => now);
    await throttle.recordSignInFailure("203.0.113.50", "someone@wrenfield.test");
    now += 2 * hour;
    await throttle.purgeExpired();
    const [row] = (await t.pool.query("SELECT COUNT(*) AS n FROM throttle_counters WHERE window_started_at < '2026-03-06'")) as unknown as [{ n: number }[]];
    expect(Number(row[0]!.n)).toBe(0);
  });
});
