import { afterAll, beforeAll, describe, expect, it } from "vitest";
import ExcelJS from "exceljs";
import readXlsxFile from "read-excel-file/node";
import { DateTime } from "luxon";
import { binaryBody } from "../../test/binary-body.ts";
import { createTestApp, type TestApp } from "../../test/harness.ts";
import { demo } from "../../test/demo.ts";

let t: TestApp;
let owner: Awaited<ReturnType<TestApp["signIn"]>>;
let books: Awaited<ReturnType<TestApp["signIn"]>>;
let manager: Awaited<ReturnType<TestApp["signIn"]>>;
const zone = "America/Chicago";
/** Four weeks back: a workweek the seed leaves empty. */
const monday = DateTime.now().setZone(zone).startOf("week").minus({ weeks: 4 });
let periodId: number;
let joId: string;


beforeAll(async () => {
  t = await createTestApp();
  owner = await t.signIn(demo.owner);
  books = await t.signIn(demo.bookkeeper);
  manager = await t.signIn(demo.manager);
  const jo = await t.signIn("jo@wrenfield.test");
  joId = (await jo.get("/api/me")).body.id;
  // 29 CFR 778.110(a): $12 an hour, 46 hours in the workweek. Jo's assistant rate is $12 that week only.
  await owner.post("/api/pay-rates").send({ staffUserId: joId, code: "assistant", hourlyRateCents: 1200, effectiveFrom: monday.toISODate() });
  await owner.post("/api/pay-rates").send({ staffUserId: joId, code: "assistant", hourlyRateCents: 2200, effectiveFrom: monday.plus({ days: 7 }).toISODate() });
  const shifts: [number, number, number][] = [...[0, 1, 2, 3, 4].map((d): [number, number, number] => [d, 9, 18]), [5, 10, 11]];
  for (const [day, from, to] of shifts) {
    const proposed = await jo.post("/api/time-entry-edits").send({
      startedAt: monday.plus({ days: day, hours: from }).toISO(),
      endedAt: monday.plus({ days: day, hours: to }).toISO(),
      reason: "Paper timesheet from the week the clock was down",
    });
    expect(proposed.status).toBe(201);
    expect((await manager.post(`/api/time-entry-edits/${proposed.body.id}/approve`).send({})).status).toBe(200);
  }
  const periods = (await books.get("/api/pay-periods")).body as { id: number; startDate: string }[];
  periodId = periods.find((p) => p.startDate === monday.toISODate())!.id;
});
afterAll(() => t.close());

describe("pay period review", () => {
  it("pays $12/h for 46 hours as 40 regular + 6 overtime = $588 (29 CFR 778.110(a)) [S]", async () => {
    const review = await books.get(`/api/pay-periods/${periodId}`);
    expect(review.status).toBe(200);
    const jo = review.body.staff.find((s: { name: string }) => s.name === "Jo Kettering");
    expect(jo).toMatchObject({ workedMinutes: 46 * 60, regularMinutes: 40 * 60, overtimeMinutes: 6 * 60, doubleTimeMinutes: 0, grossCents: 58800, overtimePremiumCents: 3600 });
    expect(review.body.caution).toMatch(/licensed accountant or payroll provider decide/);
    expect(review.body.totals.workedMinutes).toBe(review.body.staff.reduce((t: number, s: { workedMinutes: number }) => t + s.workedMinutes, 0));
  });

  it("conserves hours: regular + overtime + double time = worked, for every person in the seeded weeks", async () => {
    const periods = (await books.get("/api/pay-periods")).body as { id: number }[];
    for (const p of periods) {
      const review = (await books.get(`/api/pay-periods/${p.id}`)).body;
      for (const s of review.staff) expect(s.regularMinutes + s.overtimeMinutes + s.doubleTimeMinutes).toBe(s.workedMinutes);
    }
  });

  it("flags the seeded pending correction in last week's period and refuses to approve it until decided", async () => {
    const periods = (await books.get("/api/pay-periods")).body as { id: number; startDate: string }[];
    const lastWeek = periods.find((p) => p.startDate === DateTime.now().setZone(zone).startOf("week").minus({ weeks: 1 }).toISODate())!;
    const review = (await books.get(`/api/pay-periods/${lastWeek.id}`)).body;
    expect(review.flags.map((f: { kind: string }) => f.kind)).toContain("pending_edit");
    const approve = await books.post(`/api/pay-periods/${lastWeek.id}/approve`);
    expect(approve.status).toBe(409);
    expect(approve.body.error.code).toBe("edits_pending");
    const priya = review.staff.find((s: { name: string }) => s.name === "Priya Oduya");
    expect(priya.overtimeMinutes).toBeGreaterThan(0);
  });
});

describe("locking and exports", () => {
  it("approves and locks the period; a locked period refuses changes with 423 until the owner unlocks it (audited)", async () => {
    expect((await books.post(`/api/pay-periods/${periodId}/lock`)).status).toBe(409);
    expect((await books.post(`/api/pay-periods/${periodId}/approve`)).body.status).toBe("approved");
    const locked = await books.post(`/api/pay-periods/${periodId}/lock`);
    expect(locked.body).toMatchObject({ status: "locked", lockedByName: "Lena Marsh" });
    const jo = await t.signIn("jo@wrenfield.test");
    const shift = { startedAt: monday.plus({ days: 6, hours: 10 }).toISO(), endedAt: monday.plus({ days: 6, hours: 12 }).toISO(), reason: "One more shift" };
    const refused = await jo.post("/api/time-entry-edits").send(shift);
    expect(refused.status).toBe(423);
    expect(refused.body.error).toMatchObject({ code: "period_locked", message: expect.stringContaining("only the owner can unlock it") });
    expect((await books.post(`/api/pay-periods/${periodId}/unlock`).send({ reason: "Missing shift" })).status).toBe(403);
    expect((await owner.post(`/api/pay-periods/${periodId}/unlock`).send({})).status).toBe(400);
    const unlocked = await owner.post(`/api/pay-periods/${periodId}/unlock`).send({ reason: "A shift was missing" });
    expect(unlocked.body.status).toBe("open");
    const late = await jo.post("/api/time-entry-edits").send(shift);
    expect(late.status).toBe(201);
    await manager.post(`/api/time-entry-edits/${late.body.id}/reject`).send({ note: "Not worked" });
    await books.post(`/api/pay-periods/${periodId}/approve`);
    await books.post(`/api/pay-periods/${periodId}/lock`);
  });

  it("keeps a locked period's figures when the owner later changes rounding or pay rates", async () => {
    const before = (await books.get(`/api/pay-periods/${periodId}`)).body;
    expect(before.period.status).toBe("locked");
    await owner.patch("/api/payroll-settings").send({ overtimeRules: "daily_weekly_seventh_day", punchRounding: "5" });
    const raise = await owner.post("/api/pay-rates").send({ staffUserId: joId, code: "assistant", hourlyRateCents: 9900, effectiveFrom: monday.plus({ days: 1 }).toISODate() });
    expect(raise.status).toBe(201);
    const after = (await books.get(`/api/pay-periods/${periodId}`)).body;
    expect(after.staff).toEqual(before.staff);
    await owner.patch("/api/payroll-settings").send({ overtimeRules: "federal_weekly", punchRounding: "15" });
  });

  it("exports an XLSX whose figures match the review, read back with exceljs and with read-excel-file", async () => {
    const review = (await books.get(`/api/pay-periods/${periodId}`)).body;
    const response = await books.get(`/api/pay-periods/${periodId}/export?format=xlsx`).buffer(true).parse(binaryBody);
    expect(response.status).toBe(200);
    expect(response.headers["content-disposition"]).toContain(`takeup-payroll-${monday.toISODate()}_`);
    const workbook = new ExcelJS.Workbook();
    await workbook.xlsx.load(response.body as ArrayBuffer);
    expect(workbook.worksheets.map((w) => w.name)).toEqual(["Summary", "Daily detail", "Entries"]);
    const summary = workbook.getWorksheet("Summary")!;
    expect(String(summary.getCell("A2").value)).toMatch(/licensed accountant or payroll provider decide/);
    expect(summary.getRow(4).getCell(1).value).toBe("Staff ID");
    const joRow = summary.getRows(5, summary.rowCount - 4)!.find((r) => r.getCell(2).value === "Jo Kettering")!;
    const jo = review.staff.find((s: { name: string }) => s.name === "Jo Kettering");
    expect(joRow.getCell(5).value).toBe(jo.regularMinutes / 60);
    expect(joRow.getCell(6).value).toBe(jo.overtimeMinutes / 60);
    expect(joRow.getCell(14).value).toBe(jo.grossCents / 100);
    expect(joRow.getCell(9).numFmt).toBe("[h]:mm");
    // Hours keep their number format on the long sheets too (their cells share one style per column).
    expect(workbook.getWorksheet("Daily detail")!.getRow(2).getCell(5).numFmt).toBe("0.00");
    expect(workbook.getWorksheet("Entries")!.getRow(2).getCell(12).numFmt).toBe("0.00");

    // read-excel-file answers every sheet as { sheet, data }.
    const sheets = (await readXlsxFile(response.body as Buffer)) as unknown as { sheet: string; data: unknown[][] }[];
    const sheet = (name: string) => sheets.find((s) => s.sheet === name)!.data;
    const rows = sheet("Summary");
    const header = rows.findIndex((r) => r[0] === "Staff ID");
    const byName = rows.slice(header + 1).find((r) => r[1] === "Jo Kettering")!;
    expect(byName[13]).toBe(588);
    const total = rows.find((r) => r[0] === "Total")!;
    expect(total[13]).toBe(review.totals.grossCents / 100);
    const daily = sheet("Daily detail");
    const joDays = daily.filter((r) => r[1] === "Jo Kettering");
    expect(joDays.reduce((t, r) => t + Number(r[4]), 0)).toBe(46);
    const entries = sheet("Entries");
    expect(entries.filter((r) => r[2] === "Jo Kettering")).toHaveLength(6);
  });

  it("exports the summary as CSV with the same figures", async () => {
    const response = await books.get(`/api/pay-periods/${periodId}/export?format=csv`);
    expect(response.headers["content-type"]).toMatch(/^text\/csv/);
    const [header, ...lines] = response.text.trim().split("\r\n");
    expect(header).toBe("Staff ID,Name,Period start,Period end,Regular hours,Overtime hours,Double-time hours,Total hours,Pay rates,Straight-time pay,Overtime premium,Double-time premium,Gross pay,Weeks across the period's edge");
    const jo = lines.find((l) => l.includes("Jo Kettering"))!.split(",");
    expect(jo.slice(4, 8)).toEqual(["40.00", "6.00", "0.00", "46.00"]);
    // Gross pay, then the note on weeks across the period's edge (none here).
    expect(jo.slice(-2)).toEqual(["588.00", ""]);
  });

  it("refuses an unknown export format, naming the field", async () => {
    const response = await books.get(`/api/pay-periods/${periodId}/export?format=pdf`);
    expect(response.status).toBe(400);
    expect(response.body.error.details[0].field).toBe("format");
  });
});
