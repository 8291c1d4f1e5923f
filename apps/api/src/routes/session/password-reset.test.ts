import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, linkIn, type TestApp } from "../../test/harness.ts";
import { demo } from "../../test/demo.ts";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe("password reset by e-mail", () => {
  it("mails a one-hour link that opens our reset page and sets a new password", async () => {
    const requested = await t.client().post("/api/session/password-reset-requests").send({ email: demo.bookkeeper });
    expect(requested.status).toBe(202);
    const [message] = t.mailTo(demo.bookkeeper);
    expect(message!.subject).toBe("Reset your Wrenfield Sound password");
    const token = new URL(linkIn(message!, "/reset-password")).searchParams.get("token")!;

    const reset = await t.client().post("/api/session/password-resets").send({ token, password: "a-brand-new-password" });
    expect(reset.status).toBe(200);
    const oldPassword = await t.client().post("/api/session").send({ email: demo.bookkeeper, password: "studio-demo-2026" });
    expect(oldPassword.status).toBe(401);
    const newPassword = await t.client().post("/api/session").send({ email: demo.bookkeeper, password: "a-brand-new-password" });
    expect(newPassword.status).toBe(200);

    const reused = await t.client().post("/api/session/password-resets").send({ token, password: "yet-another-password" });
    expect(reused.status).toBe(400);
    expect(reused.body.error.code).toBe("invalid_reset_token");
  });

  it("answers the same for an unknown address and sends nothing", async () => {
    const response = await t.client().post("/api/session/password-reset-requests").send({ email: "stranger@example.test" });
    expect(response.status).toBe(202);
    expect(t.mailTo("stranger@example.test")).toEqual([]);
  });
});
