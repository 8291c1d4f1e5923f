// The export case, in its own process: the XLSX export of the bench period from the database,
// as the export route does it (loadPayroll, getPeriodRow, computePeriod, writeWorkbook), into a
// byte counter; given a file, the workbook is written there and read back instead.
//   TAKEUP_BENCH_DATABASE_URL=… tsx bench/payroll/export-case.ts <period id> [file.xlsx]
import { createWriteStream, statSync } from "node:fs";
import type { Response } from "express";
import type { RowDataPacket } from "mysql2/promise";
import { createDb } from "@takeup/db";
import { computePeriod } from "../../apps/api/src/routes/payroll/compute-period.ts";
import { exportedEntries, writeWorkbook } from "../../apps/api/src/routes/payroll/payroll-export.ts";
import { getPeriodRow } from "../../apps/api/src/routes/payroll/pay-periods.service.ts";
import { loadPayroll } from "../../apps/api/src/routes/payroll/payroll-settings.ts";
import { checkConservation } from "./checks.ts";
import { checkReadBack, readBackWorkbook } from "./read-back.ts";
import { ByteCounter, measureStep, report } from "./step.ts";

/** Node.js, tsx and the modules, before any data exists. */
const baselineRssMiB = process.memoryUsage().rss / 2 ** 20;
const [periodIdArg, file] = process.argv.slice(2);
const databaseUrl = process.env.TAKEUP_BENCH_DATABASE_URL;
if (!databaseUrl || !(Number(periodIdArg) > 0)) throw new Error("usage: TAKEUP_BENCH_DATABASE_URL=mysql://… tsx bench/payroll/export-case.ts <period id> [file.xlsx]");

const { db, pool } = createDb(databaseUrl);
try {
  const compute = await measureStep(async () => {
    const payroll = await loadPayroll(db);
    const row = await getPeriodRow(db, Number(periodIdArg));
    return { payroll, computed: await computePeriod(db, payroll, row) };
  });
  const { payroll, computed } = compute.value;
  const sink = file ? createWriteStream(file) : new ByteCounter();
  const write = await measureStep(() => writeWorkbook(computed, sink as unknown as Response, payroll.settings.timeZone));
  const bytes = sink instanceof ByteCounter ? sink.bytes : statSync(file!).size;

  const totals = checkConservation(computed.result, computed.summary);
  const { entries: listed } = exportedEntries(computed);
  // The bench fortnight is two whole workweeks, so every entry of the period belongs in its file,
  // those that round to no paid time included.
  const [[stored]] = await pool.query<RowDataPacket[]>("SELECT COUNT(*) AS n FROM time_entries WHERE started_at >= ? AND started_at < ?", [computed.period.start, computed.period.end]);
  if (listed.length !== Number(stored!.n)) throw new Error(`the Entries sheet lists ${listed.length} of the period's ${Number(stored!.n)} entries`);
  const listedIds = new Set(listed.map((e) => String(e.id)));
  const noPaidTime = computed.result.entries.filter((t) => t.workedMinutes === 0);
  const missing = noPaidTime.filter((t) => !listedIds.has(t.entryId));
  if (missing.length) throw new Error(`${missing.length} entries that round to no paid time are not listed (e.g. ${missing[0]!.entryId})`);

  const paidWeeks = new Set(computed.summary.staff.flatMap((s) => s.workweekStarts.map((start) => `${s.staffId} ${start}`)));
  const dailyRows = computed.result.workweeks.filter((w) => paidWeeks.has(`${w.staffId} ${w.workweekStart}`)).reduce((n, w) => n + w.days.length, 0);
  // The last row of each sheet, its header rows included.
  const expectedRows = { Summary: 4 + computed.summary.staff.length + 1, "Daily detail": 1 + dailyRows, Entries: 1 + listed.length };
  const readBack = file ? await readBackWorkbook(file) : null;
  if (readBack) checkReadBack(readBack, expectedRows, totals.grossCents, noPaidTime.length);
  report({ baselineRssMiB, compute: compute.step, write: write.step, bytes, listedEntries: listed.length, noPaidTime: noPaidTime.length, expectedRows, totals, readBack });
} finally {
  await pool.end();
}
