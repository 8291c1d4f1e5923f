// Writes the generated fortnight into the bench database beside the seeded demo: its staff, their
// pay rates, the entries and their breaks (multi-row INSERTs), the studio's payroll settings and
// the pay period row the export is asked for.
import { eq } from "drizzle-orm";
import type { Pool, RowDataPacket } from "mysql2/promise";
import { payPeriods, payRates, staffProfiles, studio, user, type Db } from "@takeup/db";
import { period, schedule } from "./scenario.ts";
import type { OvertimeRuleSet } from "@takeup/domain";
import type { BenchFortnight } from "./shifts.ts";

const rowsPerInsert = 5_000;

async function insertChunked(pool: Pool, sql: string, rows: unknown[][]) {
  for (let i = 0; i < rows.length; i += rowsPerInsert) await pool.query(sql, [rows.slice(i, i + rowsPerInsert)]);
}

export type Loaded = { periodId: number; firstEntryId: number; entries: number; breaks: number; seconds: number };

export async function loadFortnight(db: Db, pool: Pool, data: BenchFortnight, rules: OvertimeRuleSet): Promise<Loaded> {
  const started = performance.now();
  const now = new Date();
  for (let i = 0; i < data.staff.length; i += 500) {
    const chunk = data.staff.slice(i, i + 500);
    await db.insert(user).values(chunk.map((s) => ({ id: s.id, name: s.name, email: `${s.id}@bench.test`, emailVerified: true, createdAt: now, updatedAt: now })));
    await db.insert(staffProfiles).values(chunk.map((s) => ({ userId: s.id, role: "engineer" as const, displayName: s.name, engineerGrade: s.primaryCode })));
  }
  for (let i = 0; i < data.payRates.length; i += 1_000) {
    await db.insert(payRates).values(data.payRates.slice(i, i + 1_000).map((r) => ({ staffUserId: r.staffId, code: r.rateCode, hourlyRateCents: r.centsPerHour, effectiveFrom: r.effectiveFrom, createdAt: now })));
  }

  // Session entries point at the demo's bookings, so the export's room and client columns are read through its joins.
  const [bookingRows] = await pool.query<RowDataPacket[]>("SELECT id FROM bookings ORDER BY id");
  const bookingIds = bookingRows.map((r) => Number(r.id));
  const [[maxRow]] = await pool.query<RowDataPacket[]>("SELECT COALESCE(MAX(id), 0) AS maxId FROM time_entries");
  const firstEntryId = Number(maxRow!.maxId) + 1;
  const entryRows = data.entries.map((e, i) => [
    firstEntryId + i,
    e.staffId,
    e.kind === "session" && bookingIds.length ? bookingIds[i % bookingIds.length]! : null,
    e.kind === "session" && bookingIds.length ? "session" : "shop",
    e.rateCode,
    new Date(e.startMs),
    new Date(e.endMs),
    e.source,
    e.source === "manual" ? "Paper timesheet, clock was down" : null,
    e.source === "manual" ? null : e.staffId,
    now,
    now,
  ]);
  await insertChunked(
    pool,
    "INSERT INTO time_entries (id, staff_user_id, booking_id, kind, pay_rate_code, started_at, ended_at, source, note, created_by_user_id, created_at, updated_at) VALUES ?",
    entryRows,
  );
  const breakRows = data.entries.flatMap((e, i) => e.breaks.map((b) => [firstEntryId + i, new Date(b.startMs), new Date(b.endMs)]));
  await insertChunked(pool, "INSERT INTO time_entry_breaks (time_entry_id, started_at, ended_at) VALUES ?", breakRows);

  if (schedule.kind !== "fortnightly") throw new Error("the bench fortnight needs a fortnightly schedule");
  await db.update(studio).set({ payPeriodKind: "fortnightly", payPeriodAnchor: schedule.anchorDate, punchRounding: "15", overtimeRules: rules }).where(eq(studio.id, 1));
  const [created] = await db.insert(payPeriods).values({ kind: "fortnightly", startDate: period.startDate, endDate: period.endDate }).$returningId();
  await pool.query("ANALYZE TABLE time_entries, time_entry_breaks, pay_rates");
  return { periodId: created!.id, firstEntryId, entries: entryRows.length, breaks: breakRows.length, seconds: (performance.now() - started) / 1000 };
}
