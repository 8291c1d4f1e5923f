import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, type TestApp } from "../../test/harness.ts";
import { SignInThrottle } from "../../lib/sign-in-throttle.ts";
import { demo } from "../../test/demo.ts";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp({ throttle: new SignInThrottle({ perAddress: 8, perAccount: 3, windowMs: 60_000 }) });
});
afterAll(() => t.close());

const attempt = (email: string, password: string) => t.client().post("/api/session").send({ email, password });

describe("sign-in throttling", () => {
  it("answers 429 for an account after repeated failures, even with the right password", async () => {
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

describe("SignInThrottle window", () => {
  it("lets an account try again once the window has passed", () => {
    let now = 0;
    const throttle = new SignInThrottle({ perAddress: 100, perAccount: 2, windowMs: 1000 }, () => now);
    throttle.recordFailure("a", "x@y.test");
    throttle.recordFailure("a", "x@y.test");
    expect(() => throttle.assertAllowed("a", "x@y.test")).toThrow(/Too many/);
    now = 1001;
    expect(() => throttle.assertAllowed("a", "x@y.test")).not.toThrow();
  });
});
