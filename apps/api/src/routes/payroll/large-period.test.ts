import { afterAll, beforeAll, describe, expect, it } from "vitest";
import ExcelJS from "exceljs";
import { desc } from "drizzle-orm";
import { DateTime } from "luxon";
import { staffProfiles, timeEntries, timeEntryBreaks } from "@takeup/db";
import { binaryBody } from "../../test/binary-body.ts";
import { createTestApp, type TestApp } from "../../test/harness.ts";
import { demo } from "../../test/demo.ts";

// A period with more entries than any one statement reads (breaks and corrections are fetched
// 5 000 entry ids at a time) must still be paid and exported whole, never cut short.
let t: TestApp;
const zone = "America/Chicago";
/** Five weeks back: a workweek the seed leaves empty, and one GET /api/pay-periods creates. */
const monday = DateTime.now().setZone(zone).startOf("week").minus({ weeks: 5 });
const perPerson = 2_100;
const people = ["Priya Oduya", "Sam Reyes", "Jo Kettering"];


beforeAll(async () => {
  t = await createTestApp();
  const staff = await t.db.select().from(staffProfiles);
  // Minute-long entries a minute apart: 2 100 a person fit in the week's first three days.
  const rows = people.flatMap((name) => {
    const person = staff.find((s) => s.displayName === name)!;
    return Array.from({ length: perPerson }, (_, i) => {
      const start = monday.plus({ minutes: 2 * i }).toJSDate();
      return { staffUserId: person.userId, kind: "shop" as const, payRateCode: person.engineerGrade === "assistant" ? "assistant" : "engineer", startedAt: start, endedAt: new Date(start.getTime() + 60_000), source: "manual" as const };
    });
  });
  for (let i = 0; i < rows.length; i += 2_000) await t.db.insert(timeEntries).values(rows.slice(i, i + 2_000));
  // One break on the very last entry, whose id falls in the last batch.
  const [last] = await t.db.select({ id: timeEntries.id, startedAt: timeEntries.startedAt }).from(timeEntries).orderBy(desc(timeEntries.id)).limit(1);
  await t.db.insert(timeEntryBreaks).values({ timeEntryId: last!.id, startedAt: new Date(last!.startedAt.getTime() + 15_000), endedAt: new Date(last!.startedAt.getTime() + 45_000) });
  const owner = await t.signIn(demo.owner);
  expect((await owner.patch("/api/payroll-settings").send({ punchRounding: "none" })).status).toBe(200);
});
afterAll(() => t.close());

describe("a pay period with thousands of entries", () => {
  it("pays every entry and lists every one in the export", async () => {
    const books = await t.signIn(demo.bookkeeper);
    const periods = (await books.get("/api/pay-periods")).body as { id: number; startDate: string }[];
    const period = periods.find((p) => p.startDate === monday.toISODate())!;
    const review = (await books.get(`/api/pay-periods/${period.id}`)).body;
    const count = review.staff.reduce((n: number, s: { entryCount: number }) => n + s.entryCount, 0);
    // Each entry is one minute; the one with a break (rounded to whole minutes) pays nothing,
    // so it is behind no figure; the Entries sheet still lists it, saying why.
    expect(count).toBe(people.length * perPerson - 1);
    expect(review.totals.workedMinutes).toBe(people.length * perPerson - 1);

    const response = await books.get(`/api/pay-periods/${period.id}/export?format=xlsx`).buffer(true).parse(binaryBody);
    const workbook = new ExcelJS.Workbook();
    await workbook.xlsx.load(response.body as ArrayBuffer);
    const entries = workbook.getWorksheet("Entries")!;
    expect(entries.actualRowCount - 1).toBe(people.length * perPerson);
    const notes = entries.getColumn(14).values.filter((v) => v === "Rounds to no paid time");
    expect(notes).toHaveLength(1);
  });
});
