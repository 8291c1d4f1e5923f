import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, type TestApp } from "../../test/harness.ts";
import { demo } from "../../test/demo.ts";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe("sign-in", () => {
  it("signs a demo owner in, sets an httpOnly SameSite cookie and reports the role", async () => {
    const agent = t.client();
    const response = await agent.post("/api/session").send({ email: demo.owner, password: "studio-demo-2026" });
    expect(response.status).toBe(200);
    expect(response.body).toMatchObject({ email: demo.owner, role: "owner", clientAccount: null });
    const cookie = String(response.headers["set-cookie"]);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    const me = await agent.get("/api/me");
    expect(me.body).toMatchObject({ name: "Mara Linden", role: "owner" });
  });

  it("tells a client user which client account it belongs to", async () => {
    const agent = await t.signIn(demo.client);
    const me = await agent.get("/api/me");
    expect(me.body).toMatchObject({ role: "client", clientAccount: { name: "Lantern Static" } });
  });

  it("answers 401 in our error shape for a wrong password", async () => {
    const response = await t.client().post("/api/session").send({ email: demo.manager, password: "not-the-password" });
    expect(response.status).toBe(401);
    expect(response.body).toEqual({ error: { code: "invalid_credentials", message: expect.any(String) } });
  });

  it("answers 401 on /api/me when signed out", async () => {
    const response = await t.client().get("/api/me");
    expect(response.status).toBe(401);
    expect(response.body.error.code).toBe("signed_out");
  });

  it("ends the session on sign-out", async () => {
    const agent = await t.signIn(demo.bookkeeper);
    expect((await agent.delete("/api/session")).status).toBe(200);
    expect((await agent.get("/api/me")).status).toBe(401);
  });

  it("refuses a cookie-bearing write from another site", async () => {
    const agent = await t.signIn(demo.owner);
    const response = await agent.patch("/api/studio").set("Origin", "https://evil.test").send({ name: "Hijacked" });
    expect(response.status).toBe(403);
    expect(response.body.error.code).toBe("cross_site_request");
  });

  it("sends security headers", async () => {
    const response = await t.client().get("/api/health");
    expect(response.headers["x-content-type-options"]).toBe("nosniff");
    expect(response.headers["content-security-policy"]).toContain("default-src 'self'");
    expect(response.headers["x-powered-by"]).toBeUndefined();
  });
});
