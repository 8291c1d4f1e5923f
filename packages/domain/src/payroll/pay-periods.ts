import { DateTime } from "luxon";
import {
  addDays,
  assertCalendar,
  assertCalendarDate,
  workdayOf,
  workdayStart,
  workweekStartOf,
} from "./studio-calendar.ts";
import type { StudioCalendar } from "./types.ts";

/**
 * How the studio's pay periods repeat. Weekly periods are the workweeks; fortnightly ones
 * are 14 workdays counted from any one period's first day; semi-monthly ones run from the
 * 1st to the 15th and from the 16th to the month's last day.
 */
export type PayPeriodSchedule =
  | { kind: "weekly" }
  | { kind: "fortnightly"; anchorDate: string }
  | { kind: "semi_monthly" };

export interface PayPeriod {
  kind: PayPeriodSchedule["kind"];
  /** First workday, studio-local date. */
  startDate: string;
  /** Last workday, inclusive. */
  endDate: string;
  /** Instant the first workday begins. */
  start: Date;
  /** Instant the day after the last workday begins (exclusive). */
  end: Date;
}

function daysBetween(from: string, to: string): number {
  const a = DateTime.fromISO(from, { zone: "utc" });
  const b = DateTime.fromISO(to, { zone: "utc" });
  return Math.round(b.diff(a, "days").days);
}

function periodDates(workday: string, schedule: PayPeriodSchedule, calendar: StudioCalendar) {
  switch (schedule.kind) {
    case "weekly": {
      const startDate = workweekStartOf(workday, calendar);
      return { startDate, endDate: addDays(startDate, 6) };
    }
    case "fortnightly": {
      assertCalendarDate(schedule.anchorDate);
      // Floor division also finds periods before the anchor.
      const offset = Math.floor(daysBetween(schedule.anchorDate, workday) / 14) * 14;
      const startDate = addDays(schedule.anchorDate, offset);
      return { startDate, endDate: addDays(startDate, 13) };
    }
    case "semi_monthly": {
      const month = workday.slice(0, 7);
      if (Number(workday.slice(8, 10)) <= 15) return { startDate: `${month}-01`, endDate: `${month}-15` };
      const last = DateTime.fromISO(`${month}-01`, { zone: "utc" }).endOf("month").toISODate() ?? workday;
      return { startDate: `${month}-16`, endDate: last };
    }
  }
}

/** The pay period a workday (studio-local date, `YYYY-MM-DD`) falls in. */
export function payPeriodForWorkday(
  workday: string,
  schedule: PayPeriodSchedule,
  calendar: StudioCalendar,
): PayPeriod {
  assertCalendar(calendar);
  assertCalendarDate(workday);
  const { startDate, endDate } = periodDates(workday, schedule, calendar);
  return {
    kind: schedule.kind,
    startDate,
    endDate,
    start: workdayStart(startDate, calendar),
    end: workdayStart(addDays(endDate, 1), calendar),
  };
}

/** The pay period containing an instant, judged by the studio's clock, not UTC's. */
export function payPeriodContaining(at: Date, schedule: PayPeriodSchedule, calendar: StudioCalendar): PayPeriod {
  assertCalendar(calendar);
  return payPeriodForWorkday(workdayOf(at, calendar), schedule, calendar);
}
