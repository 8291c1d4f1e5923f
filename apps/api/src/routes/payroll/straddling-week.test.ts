import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { DateTime } from "luxon";
import { createTestApp, type TestApp } from "../../test/harness.ts";
import { demo } from "../../test/demo.ts";

// 29 CFR 778.106 (REFERENCES.md, "Pay periods and when pay is due"): on semi-monthly periods a
// workweek that straddles the 15th pays its straight time in the period each hour was worked
// in; only its overtime waits for the period holding the week's end.
let t: TestApp;
let books: Awaited<ReturnType<TestApp["signIn"]>>;
const zone = "America/Chicago";

/** The Monday of a recent Mon–Fri week with days on both sides of a 15th/16th boundary, clear of the seeded weeks. */
function straddlingMonday(): DateTime {
  for (let back = 1; back <= 2; back++) {
    const sixteenth = DateTime.now().setZone(zone).startOf("month").minus({ months: back }).set({ day: 16 });
    if (sixteenth.weekday >= 2 && sixteenth.weekday <= 5) return sixteenth.minus({ days: sixteenth.weekday - 1 }).startOf("day");
  }
  // Three months back at the latest: one of any three consecutive 16ths falls Tuesday to Friday.
  const sixteenth = DateTime.now().setZone(zone).startOf("month").minus({ months: 3 }).set({ day: 16 });
  return sixteenth.minus({ days: sixteenth.weekday - 1 }).startOf("day");
}
const monday = straddlingMonday();
const daysBeforeThe16th = 16 - monday.day;

beforeAll(async () => {
  t = await createTestApp();
  const owner = await t.signIn(demo.owner);
  const manager = await t.signIn(demo.manager);
  books = await t.signIn(demo.bookkeeper);
  const priya = await t.signIn(demo.engineer);
  const priyaId = (await priya.get("/api/me")).body.id;
  expect((await owner.patch("/api/payroll-settings").send({ payPeriodKind: "semi_monthly" })).status).toBe(200);
  await owner.post("/api/pay-rates").send({ staffUserId: priyaId, code: "engineer", hourlyRateCents: 2000, effectiveFrom: monday.toISODate() });
  await owner.post("/api/pay-rates").send({ staffUserId: priyaId, code: "engineer", hourlyRateCents: 2000, effectiveFrom: monday.plus({ days: 7 }).toISODate() });
  for (let day = 0; day < 5; day++) {
    const proposed = await priya.post("/api/time-entry-edits").send({
      startedAt: monday.plus({ days: day, hours: 9 }).toISO(),
      endedAt: monday.plus({ days: day, hours: 17 }).toISO(),
      reason: "Paper timesheet",
    });
    expect(proposed.status, JSON.stringify(proposed.body)).toBe(201);
    expect((await manager.post(`/api/time-entry-edits/${proposed.body.id}/approve`).send({})).status).toBe(200);
  }
});
afterAll(() => t.close());

describe("a workweek across two semi-monthly periods", () => {
  it("pays 8 h × $20 for each day in the period it was worked in, and names the week open at the first period's end (29 CFR 778.106; Cal. Lab. Code §204(a)) [D]", async () => {
    const periods = (await books.get("/api/pay-periods")).body as { id: number; startDate: string }[];
    const first = periods.find((p) => p.startDate === monday.set({ day: 1 }).toISODate())!;
    const second = periods.find((p) => p.startDate === monday.set({ day: 16 }).toISODate())!;
    const priyaIn = async (id: number) => ((await books.get(`/api/pay-periods/${id}`)).body.staff as { name: string; grossCents: number; workedMinutes: number; straddlingWeeks: { stillOpen: boolean; begunEarlier: boolean; workweekStart: string; note: string }[] }[]).find((s) => s.name === "Priya Oduya")!;
    const early = await priyaIn(first.id);
    const late = await priyaIn(second.id);
    // [D] e.g. Mon 12 – Fri 16 Jan 2026 in REFERENCES.md: $640 and $160, not $0 and $800.
    expect([early.workedMinutes, early.grossCents]).toEqual([daysBeforeThe16th * 480, daysBeforeThe16th * 16_000]);
    expect([late.workedMinutes, late.grossCents]).toEqual([(5 - daysBeforeThe16th) * 480, (5 - daysBeforeThe16th) * 16_000]);
    expect(early.straddlingWeeks).toMatchObject([{ workweekStart: monday.toISODate(), stillOpen: true, begunEarlier: false }]);
    expect(early.straddlingWeeks[0]?.note).toMatch(/still open at the period's end.*its overtime, if any, is paid in the period holding/);
    expect(late.straddlingWeeks).toMatchObject([{ workweekStart: monday.toISODate(), stillOpen: false, begunEarlier: true }]);
  });

  it("says the same in the export's last column", async () => {
    const periods = (await books.get("/api/pay-periods")).body as { id: number; startDate: string }[];
    const first = periods.find((p) => p.startDate === monday.set({ day: 1 }).toISODate())!;
    const csv = (await books.get(`/api/pay-periods/${first.id}/export?format=csv`)).text;
    expect(csv.split("\r\n").find((line) => line.includes("Priya Oduya"))).toMatch(/still open at the period's end/);
  });
});
