import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { auditEvents } from "@takeup/db";
import { createTestApp, type TestApp } from "../../test/harness.ts";
import { demo } from "../../test/demo.ts";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe("studio settings", () => {
  it("shows every role the studio's time zone and currency", async () => {
    const engineer = await t.signIn(demo.engineer);
    const response = await engineer.get("/api/studio");
    expect(response.body).toMatchObject({ name: "Wrenfield Sound", timeZone: "America/Chicago", currency: "USD", workweekStartDay: 1 });
  });

  it("lets the owner change them, audited with before and after", async () => {
    const owner = await t.signIn(demo.owner);
    const response = await owner.patch("/api/studio").send({ phone: "555-0100", workweekStartDay: 7 });
    expect(response.body).toMatchObject({ phone: "555-0100", workweekStartDay: 7 });
    const [audit] = await t.db.select().from(auditEvents).where(eq(auditEvents.action, "studio.updated"));
    expect(audit).toMatchObject({ before: { workweekStartDay: 1 }, after: { workweekStartDay: 7 } });
    const log = await owner.get("/api/audit-events?limit=5");
    expect(log.body[0]).toMatchObject({ action: "studio.updated", actorName: "Mara Linden" });
  });
});
