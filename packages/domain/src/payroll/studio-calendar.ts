import { DateTime } from "luxon";
import { earliestWallClockInstant } from "../shared/wall-clock.ts";
import { wallClock } from "../shared/zone-offset.ts";
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

const dayMs = 86_400_000;
const pad = (n: number, width = 2) => String(n).padStart(width, "0");

/** Pure date arithmetic on UTC midnights, so that no zone rule can shift the day. */
function calendarDayMs(date: string): number {
  const known = parsedDays.get(date);
  if (known !== undefined) return known;
  const ms = parseCalendarDay(date);
  if (parsedDays.size >= 100_000) parsedDays.clear();
  parsedDays.set(date, ms);
  return ms;
}

/** Dates already parsed: payroll asks about the same few workdays for every entry. */
const parsedDays = new Map<string, number>();

function parseCalendarDay(date: string): number {
  const match = isoDate.test(date) ? date.split("-").map(Number) : null;
  const [year, month, day] = match ?? [];
  const ms = match ? Date.UTC(year!, month! - 1, day!) : Number.NaN;
  const back = new Date(ms);
  // Date.UTC rolls 30 February over into March; a real calendar date comes back unchanged.
  if (!Number.isFinite(ms) || back.getUTCFullYear() !== year || back.getUTCMonth() !== month! - 1 || back.getUTCDate() !== day) {
    throw new RangeError(`Not a calendar date: ${date}`);
  }
  return ms;
}

const formatDay = (utcMidnight: Date) => `${pad(utcMidnight.getUTCFullYear(), 4)}-${pad(utcMidnight.getUTCMonth() + 1)}-${pad(utcMidnight.getUTCDate())}`;

export function addDays(date: string, days: number): string {
  return formatDay(new Date(calendarDayMs(date) + days * dayMs));
}

export function isoWeekdayOf(date: string): IsoWeekday {
  return (((new Date(calendarDayMs(date)).getUTCDay() + 6) % 7) + 1) as IsoWeekday;
}

export function assertCalendarDate(date: string): void {
  calendarDayMs(date);
}

/** The workday an instant belongs to. */
export function workdayOf(at: Date, calendar: StudioCalendar): string {
  const wall = wallClock(at.getTime(), calendar.timeZone);
  const day = new Date(Date.UTC(wall.getUTCFullYear(), wall.getUTCMonth(), wall.getUTCDate()));
  return formatDay(wall.getUTCHours() < calendar.workweekStart.hour ? new Date(day.getTime() - dayMs) : day);
}

/** Workday starts already worked out: the rules engine asks for the same few days many times. */
const workdayStarts = new Map<string, number>();

/**
 * The instant a workday begins: the first instant that day whose wall clock reads the start
 * hour. In a fall-back hour, which reads twice, that is the earlier one, so the answer never
 * depends on the date the program runs. If the start hour does not exist that day (a
 * spring-forward gap), luxon moves it to the first instant that does, which keeps days
 * contiguous (both of luxon's guesses of the offset land there).
 */
export function workdayStart(workday: string, calendar: StudioCalendar): Date {
  const key = `${calendar.timeZone}|${calendar.workweekStart.hour}|${workday}`;
  let ms = workdayStarts.get(key);
  if (ms === undefined) {
    const at = new Date(calendarDayMs(workday));
    ms =
      earliestWallClockInstant(workday, calendar.workweekStart.hour * 60, calendar.timeZone) ??
      DateTime.fromObject(
        { year: at.getUTCFullYear(), month: at.getUTCMonth() + 1, day: at.getUTCDate(), hour: calendar.workweekStart.hour },
        { zone: calendar.timeZone },
      ).toMillis();
    if (workdayStarts.size >= 100_000) workdayStarts.clear();
    workdayStarts.set(key, ms);
  }
  return new Date(ms);
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
