import { DateTime } from "luxon";
import type { IsoWeekday, StudioCalendar } from "./types.ts";

/**
 * Workdays and workweeks in the studio's time zone. A workday is the local calendar day,
 * shifted to begin at the workweek's start hour (midnight by default), so it is 23 or 25
 * hours long on a daylight-saving change; a workweek is seven such workdays.
 */

const isoDate = /^\d{4}-\d{2}-\d{2}$/;

export function assertCalendar(calendar: StudioCalendar): void {
  if (!DateTime.now().setZone(calendar.timeZone).isValid) {
    throw new RangeError(`Unknown time zone ${calendar.timeZone}`);
  }
  const { isoWeekday, hour } = calendar.workweekStart;
  if (!Number.isInteger(isoWeekday) || isoWeekday < 1 || isoWeekday > 7) {
    throw new RangeError("The workweek must start on an ISO weekday 1–7");
  }
  if (!Number.isInteger(hour) || hour < 0 || hour > 23) {
    throw new RangeError("The workweek must start on a whole hour 0–23");
  }
}

/** Pure date arithmetic; UTC so that no zone rule can shift the day. */
function calendarDate(date: string): DateTime {
  const parsed = isoDate.test(date) ? DateTime.fromISO(date, { zone: "utc" }) : null;
  if (!parsed || !parsed.isValid) throw new RangeError(`Not a calendar date: ${date}`);
  return parsed;
}

export function addDays(date: string, days: number): string {
  return calendarDate(date).plus({ days }).toISODate() ?? date;
}

export function isoWeekdayOf(date: string): IsoWeekday {
  return calendarDate(date).weekday as IsoWeekday;
}

export function assertCalendarDate(date: string): void {
  calendarDate(date);
}

/** The workday an instant belongs to. */
export function workdayOf(at: Date, calendar: StudioCalendar): string {
  const local = DateTime.fromJSDate(at, { zone: calendar.timeZone });
  const day = local.hour < calendar.workweekStart.hour ? local.minus({ days: 1 }) : local;
  return day.toISODate() ?? "";
}

/**
 * The instant a workday begins. If the start hour does not exist that day (a spring-forward
 * gap), luxon moves it to the first instant that does, which keeps days contiguous.
 */
export function workdayStart(workday: string, calendar: StudioCalendar): Date {
  const { year, month, day } = calendarDate(workday);
  return DateTime.fromObject(
    { year, month, day, hour: calendar.workweekStart.hour },
    { zone: calendar.timeZone },
  ).toJSDate();
}

/** First workday of the workweek holding the given workday. */
export function workweekStartOf(workday: string, calendar: StudioCalendar): string {
  const back = (isoWeekdayOf(workday) - calendar.workweekStart.isoWeekday + 7) % 7;
  return addDays(workday, -back);
}

export interface Workweek {
  /** Studio-local date of the first workday. */
  workweekStart: string;
  start: Date;
  /** Exclusive: the next workweek's start. */
  end: Date;
}

export function workweekOfWorkday(workday: string, calendar: StudioCalendar): Workweek {
  const first = workweekStartOf(workday, calendar);
  return {
    workweekStart: first,
    start: workdayStart(first, calendar),
    end: workdayStart(addDays(first, 7), calendar),
  };
}

/** The workweek containing an instant (29 CFR 778.105). */
export function workweekContaining(at: Date, calendar: StudioCalendar): Workweek {
  assertCalendar(calendar);
  return workweekOfWorkday(workdayOf(at, calendar), calendar);
}
