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
    const response = await owner.patch("/api/studio").send({ phone: "555-0100", holdHours: 24 });
    expect(response.body).toMatchObject({ phone: "555-0100", holdHours: 24 });
    const [audit] = await t.db.select().from(auditEvents).where(eq(auditEvents.action, "studio.updated"));
    expect(audit).toMatchObject({ before: { holdHours: 48 }, after: { phone: "555-0100", holdHours: 24 } });
    const policy = await owner.patch("/api/studio").send({ depositBp: 5000, cancellationTiers: [{ noticeUnderHours: 168, feeBp: 2000 }, { noticeUnderHours: 24, feeBp: 10000 }] });
    expect(policy.body).toMatchObject({ depositBp: 5000, cancellationTiers: [{ noticeUnderHours: 24, feeBp: 10000 }, { noticeUnderHours: 168, feeBp: 2000 }] });
    expect((await owner.get("/api/studio")).body).toMatchObject({ holdHours: 24, depositBp: 5000 });
    // The workweek decides overtime: it changes only with the payroll settings (PATCH /api/payroll-settings).
    const workweek = await owner.patch("/api/studio").send({ workweekStartDay: 7 });
    expect(workweek.status).toBe(400);
    const log = await owner.get("/api/audit-events?limit=5");
    expect(log.body[0]).toMatchObject({ action: "studio.updated", actorName: "Mara Linden" });
  });
});
