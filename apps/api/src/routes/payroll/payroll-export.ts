// The payroll export: column layout documented in docs/payroll-export.md and kept stable.
import type { Response } from "express";
import ExcelJS from "exceljs";
import { localDateTime, payrollCaution, type EntryTrace } from "@takeup/domain";
import type { ComputedPeriod } from "./compute-period.ts";
import { addSafeRow, toCsv } from "../../lib/spreadsheet.ts";

const hours = (minutes: number) => Math.round((minutes / 60) * 100) / 100;
const dollars = (cents: number) => cents / 100;
const local = (iso: string | Date | null, zone: string) => (iso ? localDateTime(new Date(iso).getTime(), zone) : "");

/**
 * Gives every cell of a row its column's one style object. exceljs otherwise merges a fresh
 * style object into each cell, so its style cache (keyed by the object) never hits and every
 * cell's style is rendered to XML again just to find its id: on a 100 k-row sheet, the bulk
 * of the write (docs/benchmarks.md, payroll).
 */
function sharedStyles(sheet: ExcelJS.Worksheet): (row: ExcelJS.Row) => ExcelJS.Row {
  const styles = (sheet.columns ?? []).map((column) => ({ ...(column.style ?? {}) }) as Partial<ExcelJS.Style>);
  return (row) => {
    row.eachCell((cell, col) => {
      const style = styles[col - 1];
      if (style) cell.style = style;
    });
    return row;
  };
}

export const summaryColumns = [
  { header: "Staff ID", key: "staffId", width: 34 },
  { header: "Name", key: "name", width: 22 },
  { header: "Period start", key: "periodStart", width: 13 },
  { header: "Period end", key: "periodEnd", width: 13 },
  { header: "Regular hours", key: "regularHours", width: 14, numFmt: "0.00" },
  { header: "Overtime hours", key: "overtimeHours", width: 15, numFmt: "0.00" },
  { header: "Double-time hours", key: "doubleTimeHours", width: 17, numFmt: "0.00" },
  { header: "Total hours", key: "totalHours", width: 12, numFmt: "0.00" },
  { header: "Total time", key: "totalTime", width: 11, numFmt: "[h]:mm" },
  { header: "Pay rates", key: "rates", width: 30 },
  { header: "Straight-time pay", key: "straightTime", width: 17, numFmt: "#,##0.00" },
  { header: "Overtime premium", key: "overtimePremium", width: 17, numFmt: "#,##0.00" },
  { header: "Double-time premium", key: "doubleTimePremium", width: 19, numFmt: "#,##0.00" },
  { header: "Gross pay", key: "gross", width: 12, numFmt: "#,##0.00" },
] as const;

export function summaryRows(c: ComputedPeriod) {
  return c.summary.staff.map((s) => {
    const weeks = c.result.workweeks.filter((w) => w.staffId === s.staffId && s.workweekStarts.includes(w.workweekStart));
    const rates = [...new Set(weeks.flatMap((w) => w.rateLines.map((l) => `${l.rateCode} ${(l.centsPerHour / 100).toFixed(2)}/h`)))].join("; ");
    return {
      staffId: s.staffId,
      name: c.names.get(s.staffId) ?? "",
      periodStart: c.period.startDate,
      periodEnd: c.period.endDate,
      regularHours: hours(s.regularMinutes),
      overtimeHours: hours(s.overtimeMinutes),
      doubleTimeHours: hours(s.doubleTimeMinutes),
      totalHours: hours(s.workedMinutes),
      totalTime: s.workedMinutes / 1440,
      rates,
      straightTime: dollars(s.straightTimeCents + s.bonusCents),
      overtimePremium: dollars(s.overtimePremiumCents),
      doubleTimePremium: dollars(s.doubleTimePremiumCents),
      gross: dollars(s.grossCents),
    };
  });
}

/** A CSV of the summary (RFC 4180: CRLF lines, fields with commas or quotes quoted). */
export function summaryCsv(c: ComputedPeriod): string {
  const columns = summaryColumns.filter((col) => col.key !== "totalTime");
  const lines = [columns.map((col) => col.header), ...summaryRows(c).map((row) => columns.map((col) => (col.key.endsWith("Hours") || ["straightTime", "overtimePremium", "doubleTimePremium", "gross"].includes(col.key) ? (row[col.key] as number).toFixed(2) : row[col.key])))];
  return toCsv(lines);
}

/** Streams the workbook (summary, daily detail, raw entries) straight to the response. */
export async function writeWorkbook(c: ComputedPeriod, res: Response, timeZone: string) {
  const workbook = new ExcelJS.stream.xlsx.WorkbookWriter({ stream: res, useStyles: true });
  workbook.creator = "Takeup";

  const summary = workbook.addWorksheet("Summary", { views: [{ state: "frozen", ySplit: 4 }] });
  summary.getRow(1).values = [`Payroll hours ${c.period.startDate} to ${c.period.endDate} (${timeZone})`];
  summary.getRow(1).font = { bold: true, size: 13 };
  summary.getRow(2).values = [payrollCaution];
  summary.getRow(2).font = { italic: true };
  summary.getRow(1).commit();
  summary.getRow(2).commit();
  summary.getRow(3).commit();
  const header = summary.getRow(4);
  header.values = summaryColumns.map((col) => col.header);
  header.font = { bold: true };
  header.commit();
  summary.columns = summaryColumns.map((col) => ({ key: col.key, width: col.width, style: "numFmt" in col ? { numFmt: col.numFmt } : {} }));
  const rows = summaryRows(c);
  for (const row of rows) addSafeRow(summary, row).commit();
  const total = (k: "regularHours" | "overtimeHours" | "doubleTimeHours" | "totalHours" | "totalTime" | "straightTime" | "overtimePremium" | "doubleTimePremium" | "gross") => rows.reduce((t, r) => t + r[k], 0);
  const totalRow = addSafeRow(summary, {
    staffId: "Total",
    regularHours: hours(c.summary.staff.reduce((t, s) => t + s.regularMinutes, 0)),
    overtimeHours: hours(c.summary.staff.reduce((t, s) => t + s.overtimeMinutes, 0)),
    doubleTimeHours: hours(c.summary.staff.reduce((t, s) => t + s.doubleTimeMinutes, 0)),
    totalHours: hours(c.summary.staff.reduce((t, s) => t + s.workedMinutes, 0)),
    totalTime: total("totalTime"),
    straightTime: dollars(c.summary.staff.reduce((t, s) => t + s.straightTimeCents + s.bonusCents, 0)),
    overtimePremium: dollars(c.summary.staff.reduce((t, s) => t + s.overtimePremiumCents, 0)),
    doubleTimePremium: dollars(c.summary.staff.reduce((t, s) => t + s.doubleTimePremiumCents, 0)),
    gross: dollars(c.summary.staff.reduce((t, s) => t + s.grossCents, 0)),
  });
  totalRow.font = { bold: true };
  totalRow.commit();
  summary.commit();

  const daily = workbook.addWorksheet("Daily detail", { views: [{ state: "frozen", ySplit: 1 }] });
  daily.columns = [
    { header: "Staff ID", key: "staffId", width: 34 },
    { header: "Name", key: "name", width: 22 },
    { header: "Workweek start", key: "workweekStart", width: 15 },
    { header: "Date", key: "date", width: 12 },
    { header: "Worked hours", key: "worked", width: 13, style: { numFmt: "0.00" } },
    { header: "Regular hours", key: "regular", width: 13, style: { numFmt: "0.00" } },
    { header: "Overtime hours", key: "overtime", width: 14, style: { numFmt: "0.00" } },
    { header: "Double-time hours", key: "doubleTime", width: 17, style: { numFmt: "0.00" } },
  ];
  daily.getRow(1).font = { bold: true };
  const dailyStyled = sharedStyles(daily);
  for (const s of c.summary.staff) {
    for (const w of c.result.workweeks.filter((w) => w.staffId === s.staffId && s.workweekStarts.includes(w.workweekStart))) {
      for (const d of w.days) {
        dailyStyled(addSafeRow(daily, { staffId: s.staffId, name: c.names.get(s.staffId) ?? "", workweekStart: w.workweekStart, date: d.workday, worked: hours(d.workedMinutes), regular: hours(d.regularMinutes), overtime: hours(d.overtimeMinutes), doubleTime: hours(d.doubleTimeMinutes) })).commit();
      }
    }
  }
  daily.commit();

  const raw = workbook.addWorksheet("Entries", { views: [{ state: "frozen", ySplit: 1 }] });
  raw.columns = [
    { header: "Entry ID", key: "id", width: 9 },
    { header: "Staff ID", key: "staffId", width: 34 },
    { header: "Name", key: "name", width: 22 },
    { header: "Kind", key: "kind", width: 9 },
    { header: "Session", key: "session", width: 28 },
    { header: "Source", key: "source", width: 8 },
    { header: "Clocked in", key: "in", width: 17 },
    { header: "Clocked out", key: "out", width: 17 },
    { header: "Paid from", key: "roundedIn", width: 17 },
    { header: "Paid to", key: "roundedOut", width: 17 },
    { header: "Break minutes", key: "breaks", width: 13 },
    { header: "Worked hours", key: "worked", width: 13, style: { numFmt: "0.00" } },
    { header: "Pay rate code", key: "rate", width: 13 },
    { header: "Note", key: "note", width: 40 },
    { header: "Self-approved", key: "selfApproved", width: 13 },
  ];
  raw.getRow(1).font = { bold: true };
  const rawStyled = sharedStyles(raw);
  const { entries, traces } = exportedEntries(c);
  for (const e of entries) {
    const trace = traces.get(String(e.id));
    rawStyled(addSafeRow(raw, {
      id: e.id,
      staffId: e.staffUserId,
      name: e.staffName,
      kind: e.kind,
      session: e.booking ? `${e.booking.clientName}, ${e.booking.roomName}` : "Shop time",
      source: e.source,
      in: local(e.startedAt, timeZone),
      out: local(e.endedAt, timeZone),
      roundedIn: trace ? local(trace.roundedStart, timeZone) : "",
      roundedOut: trace ? local(trace.roundedEnd, timeZone) : "",
      breaks: trace?.breakMinutes ?? "",
      worked: trace ? hours(trace.workedMinutes) : "",
      rate: e.payRateCode,
      // The reason it is not paid comes first; the entry's own note follows.
      note: [whyUnpaid(e, trace), e.note].filter(Boolean).join(" — "),
      // An owner approved a correction to their own time (decision 011): the bookkeeper checks it.
      selfApproved: e.flags.includes("self_approved") ? "yes" : "",
    })).commit();
  }
  raw.commit();
  await workbook.commit();
}

/** What the Entries sheet says of an entry that adds nothing to the figures. */
function whyUnpaid(e: ComputedPeriod["entries"][number], trace: EntryTrace | undefined): string {
  if (!e.endedAt) return "Still clocked in: not paid until closed";
  if (!trace) return "No pay rate for this work on this date: not paid";
  return trace.workedMinutes === 0 ? "Rounds to no paid time" : "";
}

/**
 * The entries behind the summary's figures, plus the period's entries that add nothing to them:
 * still open, without a pay rate, or rounded to no paid time. An entry of the period whose
 * workweek is paid in the next period (docs/payroll-export.md) waits for that period's file.
 */
export function exportedEntries(c: ComputedPeriod): { entries: ComputedPeriod["entries"]; traces: Map<string, EntryTrace> } {
  const traces = new Map(c.result.entries.map((t) => [t.entryId, t]));
  const paid = new Set(c.summary.staff.flatMap((s) => s.entryIds));
  const unpriced = new Set(c.unpriced.map((e) => e.id));
  const start = c.period.start.toISOString();
  const end = c.period.end.toISOString();
  const entries = c.entries.filter((e) => {
    if (paid.has(String(e.id))) return true;
    if (e.startedAt < start || e.startedAt >= end) return false;
    return e.endedAt === null || unpriced.has(e.id) || traces.get(String(e.id))?.workedMinutes === 0;
  });
  return { entries, traces };
}
