import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { createApp } from "../../app.ts";
import { createMailer } from "../../lib/mailer.ts";
import { appUrl, createTestApp, type TestApp } from "../../test/harness.ts";
import { demo } from "../../test/demo.ts";

let t: TestApp;
let second: ReturnType<typeof createApp>;
let mailer: ReturnType<typeof createMailer>;
beforeAll(async () => {
  t = await createTestApp();
  // A second API process on the same database, as behind a load balancer.
  mailer = createMailer(t.db, t.config.smtpUrl, t.config.mailFrom, async () => "Wrenfield Sound");
  second = createApp({ db: t.db, config: t.config, mailer });
});
afterAll(async () => {
  mailer.close();
  await t.close();
});

describe("the sign-in throttle across API processes", () => {
  it("counts failures on two app instances sharing one database toward one limit", async () => {
    const apps = [t.app, second];
    const statuses: number[] = [];
    for (let i = 0; i < 5; i++) {
      const response = await request(apps[i % 2]!).post("/api/session").set("Origin", appUrl).send({ email: demo.engineer, password: `wrong-${i}` });
      statuses.push(response.status);
    }
    expect(statuses).toEqual([401, 401, 401, 401, 401]);
    for (const app of apps) {
      const response = await request(app).post("/api/session").set("Origin", appUrl).send({ email: demo.engineer, password: "studio-demo-2026" });
      expect(response.status).toBe(429);
    }
  });
});
