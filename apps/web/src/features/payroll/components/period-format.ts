import type { PayPeriodKind } from "@takeup/domain";
import { addDays, formatDayLong, startOfStudioWeek, studioParts } from "../../../lib/studio-time.ts";

const months = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"];

const parts = (date: string) => {
  const [year = "", month = "1", day = "1"] = date.split("-");
  return { year, month: months[Number(month) - 1] ?? "", day: String(Number(day)) };
};

/**
 * A period's studio-local dates, both days included: "30 Nov – 6 Dec 2026", "1–15 Dec 2026",
 * "28 Dec 2026 – 3 Jan 2027".
 */
export function formatPeriod(startDate: string, endDate: string): string {
  const a = parts(startDate);
  const b = parts(endDate);
  if (a.year !== b.year) return `${a.day} ${a.month} ${a.year} – ${b.day} ${b.month} ${b.year}`;
  if (a.month !== b.month) return `${a.day} ${a.month} – ${b.day} ${b.month} ${b.year}`;
  return `${a.day}–${b.day} ${b.month} ${b.year}`;
}

export const payPeriodKindLabels: Record<PayPeriodKind, string> = {
  weekly: "Weekly",
  fortnightly: "Every two weeks",
  semi_monthly: "Twice a month",
};

/** "Monday 7 December 2026 at 10:00", studio time. */
export function formatWhen(iso: string, timeZone: string): string {
  const at = studioParts(iso, timeZone);
  return `${formatDayLong(at.date)} at ${at.time}`;
}

/**
 * The days whose time a period pays: whole workweeks, each paid in the period holding its last
 * day (docs/payroll-export.md). From the start of the first such workweek to the end of the last.
 */
export function paidDays(startDate: string, endDate: string, workweekStartDay: number): { from: string; to: string } {
  const lastWeekStart = startOfStudioWeek(endDate, workweekStartDay);
  const to = addDays(lastWeekStart, 6) <= endDate ? endDate : addDays(lastWeekStart, -1);
  return { from: startOfStudioWeek(startDate, workweekStartDay), to };
}
