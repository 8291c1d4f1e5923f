import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { DateTime } from "luxon";
import { auditEvents } from "@takeup/db";
import { createTestApp, type TestApp } from "../../test/harness.ts";
import { demo } from "../../test/demo.ts";

let t: TestApp;
let owner: Awaited<ReturnType<TestApp["signIn"]>>;
let books: Awaited<ReturnType<TestApp["signIn"]>>;
let priyaId: string;
let samId: string;
const zone = "America/Chicago";
const thisMonday = DateTime.now().setZone(zone).startOf("week");

beforeAll(async () => {
  t = await createTestApp();
  owner = await t.signIn(demo.owner);
  books = await t.signIn(demo.bookkeeper);
  priyaId = (await (await t.signIn(demo.engineer)).get("/api/me")).body.id;
  samId = (await (await t.signIn("sam@wrenfield.test")).get("/api/me")).body.id;
});
afterAll(() => t.close());

type Rate = { id: number; staffUserId: string; code: string; hourlyRateCents: number; effectiveFrom: string; usedByLockedPeriod: boolean };

describe("pay rates", () => {
  it("refuses a second rate for the same person, code and date with 409, and every period still computes", async () => {
    const rate = { staffUserId: priyaId, code: "engineer", hourlyRateCents: 3500, effectiveFrom: thisMonday.plus({ weeks: 2 }).toISODate() };
    expect((await owner.post("/api/pay-rates").send(rate)).status).toBe(201);
    const again = await owner.post("/api/pay-rates").send({ ...rate, hourlyRateCents: 3600 });
    expect(again.status).toBe(409);
    expect(again.body.error).toMatchObject({ code: "duplicate_pay_rate", message: expect.stringContaining("Priya Oduya already has an engineer rate from") });
    expect(again.body.error.details[0]).toMatchObject({ field: "effectiveFrom", rule: "unique" });
    const periods = (await books.get("/api/pay-periods")).body as { id: number }[];
    for (const p of periods) expect((await books.get(`/api/pay-periods/${p.id}`)).status).toBe(200);
  });

  it("lets the owner correct a rate no locked period used, audited with before, after and reason", async () => {
    const created = await owner.post("/api/pay-rates").send({ staffUserId: samId, code: "engineer", hourlyRateCents: 3100, effectiveFrom: thisMonday.plus({ weeks: 3 }).toISODate() });
    expect(created.body.usedByLockedPeriod).toBe(false);
    const noReason = await owner.patch(`/api/pay-rates/${created.body.id}`).send({ hourlyRateCents: 3150 });
    expect(noReason.status).toBe(400);
    expect(noReason.body.error.details[0].field).toBe("reason");
    expect((await books.patch(`/api/pay-rates/${created.body.id}`).send({ hourlyRateCents: 3150, reason: "Typo" })).status).toBe(403);
    const corrected = await owner.patch(`/api/pay-rates/${created.body.id}`).send({ hourlyRateCents: 3150, effectiveFrom: thisMonday.plus({ weeks: 4 }).toISODate(), reason: "Agreed $31.50 from the month after" });
    expect(corrected.status).toBe(200);
    expect(corrected.body).toMatchObject({ id: created.body.id, hourlyRateCents: 3150, effectiveFrom: thisMonday.plus({ weeks: 4 }).toISODate() });
    const [audit] = await t.db.select().from(auditEvents).where(and(eq(auditEvents.action, "pay_rate.corrected"), eq(auditEvents.entityId, String(created.body.id))));
    expect(audit!.before).toMatchObject({ hourlyRateCents: 3100 });
    expect(audit!.after).toMatchObject({ hourlyRateCents: 3150, reason: "Agreed $31.50 from the month after" });
    const clash = await owner.patch(`/api/pay-rates/${created.body.id}`).send({ effectiveFrom: "2026-01-01", reason: "Back-date it" });
    expect(clash.status).toBe(409);
    expect(clash.body.error.code).toBe("duplicate_pay_rate");
    expect((await owner.patch("/api/pay-rates/999999").send({ hourlyRateCents: 1, reason: "Nothing" })).status).toBe(404);
  });

  it("refuses to correct a rate a locked period was computed with (423), and says so in the list", async () => {
    const periods = (await books.get("/api/pay-periods")).body as { id: number; startDate: string; status: string }[];
    // The week before last holds no pending correction in the seed, so it can be approved and locked.
    const weekBeforeLast = periods.find((p) => p.startDate === thisMonday.minus({ weeks: 2 }).toISODate())!;
    expect((await books.post(`/api/pay-periods/${weekBeforeLast.id}/approve`)).status).toBe(200);
    expect((await books.post(`/api/pay-periods/${weekBeforeLast.id}/lock`)).status).toBe(200);
    const rates = (await owner.get("/api/pay-rates")).body as Rate[];
    const used = rates.find((r) => r.staffUserId === priyaId && r.effectiveFrom === "2026-01-01")!;
    expect(used.usedByLockedPeriod).toBe(true);
    const refused = await owner.patch(`/api/pay-rates/${used.id}`).send({ hourlyRateCents: 1, reason: "Oops" });
    expect(refused.status).toBe(423);
    expect(refused.body.error).toMatchObject({ code: "rate_used_by_locked_period", message: expect.stringContaining(weekBeforeLast.startDate) });
    const after = (await owner.get("/api/pay-rates")).body as Rate[];
    expect(after.find((r) => r.id === used.id)!.hourlyRateCents).toBe(3200);
  });
});

describe("engineer rates billed to clients", () => {
  it("refuses a second rate for the same grade (or engineer) and instant with 409", async () => {
    const rate = { grade: "engineer", hourlyRateCents: 4500, effectiveFrom: thisMonday.plus({ weeks: 5 }).toISO() };
    expect((await owner.post("/api/engineer-rates").send(rate)).status).toBe(201);
    const again = await owner.post("/api/engineer-rates").send(rate);
    expect(again.status).toBe(409);
    expect(again.body.error).toMatchObject({ code: "duplicate_engineer_rate" });
    expect(again.body.error.details[0]).toMatchObject({ field: "effectiveFrom", rule: "unique" });
    const own = { ...rate, staffUserId: priyaId };
    expect((await owner.post("/api/engineer-rates").send(own)).status).toBe(201);
    expect((await owner.post("/api/engineer-rates").send(own)).status).toBe(409);
  });

  it("lets the owner correct an engineer rate, audited; quotes already given keep their figures", async () => {
    const created = await owner.post("/api/engineer-rates").send({ grade: "assistant", hourlyRateCents: 2600, effectiveFrom: thisMonday.plus({ weeks: 6 }).toISO() });
    const corrected = await owner.patch(`/api/engineer-rates/${created.body.id}`).send({ hourlyRateCents: 2700, reason: "Meant $27" });
    expect(corrected.status).toBe(200);
    expect(corrected.body).toMatchObject({ id: created.body.id, hourlyRateCents: 2700, grade: "assistant" });
    const [audit] = await t.db.select().from(auditEvents).where(and(eq(auditEvents.action, "engineer_rate.corrected"), eq(auditEvents.entityId, String(created.body.id))));
    expect(audit!.before).toMatchObject({ hourlyRateCents: 2600 });
    expect(audit!.after).toMatchObject({ hourlyRateCents: 2700, reason: "Meant $27" });
    expect((await (await t.signIn(demo.manager)).patch(`/api/engineer-rates/${created.body.id}`).send({ hourlyRateCents: 1, reason: "No" })).status).toBe(403);
  });
});
