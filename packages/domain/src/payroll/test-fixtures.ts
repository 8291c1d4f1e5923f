import { DateTime } from "luxon";
import type { PayRate, PayrollSettings, TimeEntry, TimeInterval } from "./types.ts";

/**
 * Helpers for the payroll tests only (not exported from the package): the invented
 * Wrenfield Sound studio and its engineers, and wall-clock times in its zone.
 */

export const wrenfield: PayrollSettings = {
  timeZone: "America/Chicago",
  workweekStart: { isoWeekday: 1, hour: 0 },
  punchRounding: "none",
  overtimeRules: "federal_weekly",
};

export const californiaStyle: PayrollSettings = { ...wrenfield, overtimeRules: "daily_weekly_seventh_day" };

export const priya = "priya-oduya";
export const sam = "sam-reyes";
export const jo = "jo-kettering";

/** A wall-clock time at Wrenfield, e.g. "2026-02-02T07:55". */
export function localTime(local: string, zone = wrenfield.timeZone): Date {
  const dt = DateTime.fromISO(local, { zone });
  if (!dt.isValid) throw new RangeError(`Bad test time ${local}`);
  return dt.toJSDate();
}

export function rate(staffId: string, rateCode: string, centsPerHour: number, effectiveFrom = "2020-01-01"): PayRate {
  return { staffId, rateCode, centsPerHour, effectiveFrom };
}

let counter = 0;

/** One shift from a local start time lasting a number of minutes of real time. */
export function shift(
  staffId: string,
  startLocal: string,
  minutes: number,
  options: { rateCode?: string; id?: string; unpaidBreaks?: readonly TimeInterval[] | number } = {},
): TimeEntry {
  counter += 1;
  const start = localTime(startLocal);
  return {
    id: options.id ?? `e${counter}`,
    staffId,
    start,
    end: new Date(start.getTime() + minutes * 60_000),
    rateCode: options.rateCode ?? "engineer",
    ...(options.unpaidBreaks === undefined ? {} : { unpaidBreaks: options.unpaidBreaks }),
  };
}

/** Consecutive days from `firstDate`, each starting at 09:00, lasting the given hours. */
export function days(
  staffId: string,
  firstDate: string,
  hours: readonly number[],
  rateCode = "engineer",
): TimeEntry[] {
  const first = DateTime.fromISO(firstDate, { zone: "utc" });
  return hours.flatMap((h, i) => {
    if (h === 0) return [];
    const date = first.plus({ days: i }).toISODate() ?? firstDate;
    return [shift(staffId, `${date}T09:00`, Math.round(h * 60), { rateCode })];
  });
}

export const hours = (minutes: number) => minutes / 60;
