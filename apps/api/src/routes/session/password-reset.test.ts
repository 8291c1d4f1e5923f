import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { user, verification } from "@takeup/db";
import { createTestApp, linkIn, type TestApp } from "../../test/harness.ts";
import { settleAfterResponseWork } from "../../lib/after-response.ts";
import { demo } from "../../test/demo.ts";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const requestReset = (email: string) => t.client().post("/api/session/password-reset-requests").send({ email });
const resetWith = (token: string, password: string) => t.client().post("/api/session/password-resets").send({ token, password });
const tokenIn = (message: Parameters<typeof linkIn>[0]) => new URL(linkIn(message, "/reset-password")).searchParams.get("token")!;

describe("password reset by e-mail", () => {
  it("mails a one-hour link that opens our reset page and sets a new password", async () => {
    const requested = await requestReset(demo.bookkeeper);
    expect(requested.status).toBe(202);
    await settleAfterResponseWork();
    const [message] = t.mailTo(demo.bookkeeper);
    expect(message!.subject).toBe("Reset your Wrenfield Sound password");
    const token = tokenIn(message!);

    const reset = await resetWith(token, "a-brand-new-password");
    expect(reset.status).toBe(200);
    const oldPassword = await t.client().post("/api/session").send({ email: demo.bookkeeper, password: "studio-demo-2026" });
    expect(oldPassword.status).toBe(401);
    const newPassword = await t.client().post("/api/session").send({ email: demo.bookkeeper, password: "a-brand-new-password" });
    expect(newPassword.status).toBe(200);

    const reused = await resetWith(token, "yet-another-password");
    expect(reused.status).toBe(400);
    expect(reused.body.error.code).toBe("invalid_reset_token");
  });

  it("answers the same for an unknown address and sends nothing", async () => {
    const known = await requestReset(demo.manager);
    const unknown = await requestReset("stranger@example.test");
    expect(unknown.status).toBe(known.status);
    expect(unknown.body).toEqual(known.body);
    await settleAfterResponseWork();
    expect(t.mailTo("stranger@example.test")).toEqual([]);
  });

  it("answers before looking the address up, so the answer's timing cannot tell a known address from an unknown one", async () => {
    // While better-auth's token table is locked, neither the lookup nor the token can be written:
    // the answers still arrive, and the e-mail follows once the table is free.
    const lock = await t.pool.getConnection();
    await lock.query("LOCK TABLES verification WRITE");
    try {
      const known = await requestReset(demo.engineer);
      const unknown = await requestReset("nobody-here@example.test");
      expect([known.status, unknown.status]).toEqual([202, 202]);
      expect(t.mailTo(demo.engineer)).toEqual([]);
    } finally {
      await lock.query("UNLOCK TABLES");
      lock.release();
    }
    await settleAfterResponseWork();
    expect(t.mailTo(demo.engineer)).toHaveLength(1);
  });

  it("ends an older link when a newer one is sent", async () => {
    await requestReset(demo.client);
    await settleAfterResponseWork();
    await requestReset(demo.client);
    await settleAfterResponseWork();
    const [first, second] = t.mailTo(demo.client);
    const older = await resetWith(tokenIn(first!), "older-link-password");
    expect(older.status).toBe(400);
    expect(older.body.error.code).toBe("invalid_reset_token");
    expect((await resetWith(tokenIn(second!), "newer-link-password")).status).toBe(200);
  });

  it("ends every other link still out for the account when a reset succeeds", async () => {
    const [owner] = await t.db.select({ id: user.id }).from(user).where(eq(user.email, demo.owner));
    // A link from before this rule (or any that slipped through) is still in the table.
    await t.db.insert(verification).values({
      id: "legacy-reset-row",
      identifier: "reset-password:legacy-link-token-0123",
      value: owner!.id,
      expiresAt: new Date(Date.now() + 30 * 60 * 1000),
    });
    await requestReset(demo.owner);
    await settleAfterResponseWork();
    const [message] = t.mailTo(demo.owner);
    // The newer link already ended it; put it back to check the reset itself ends it too.
    await t.db.insert(verification).values({
      id: "legacy-reset-row-2",
      identifier: "reset-password:legacy-link-token-4567",
      value: owner!.id,
      expiresAt: new Date(Date.now() + 30 * 60 * 1000),
    });
    expect((await resetWith(tokenIn(message!), "owner-new-password")).status).toBe(200);
    const legacy = await resetWith("legacy-link-token-4567", "a-guessers-password");
    expect(legacy.status).toBe(400);
    expect(legacy.body.error.code).toBe("invalid_reset_token");
  });
});

describe("reset request limits", () => {
  it("sends at most 3 e-mails an hour to one address and answers 429 past 10 requests from one client address", async () => {
    const fresh = await createTestApp();
    try {
      const statuses: number[] = [];
      for (let i = 0; i < 30; i++) {
        const response = await fresh.client().post("/api/session/password-reset-requests").send({ email: demo.client });
        statuses.push(response.status);
      }
      await settleAfterResponseWork();
      expect(statuses.filter((s) => s === 202)).toHaveLength(10);
      expect(statuses.filter((s) => s === 429)).toHaveLength(20);
      expect(fresh.mailTo(demo.client)).toHaveLength(3);
    } finally {
      await fresh.close();
    }
  });
});
