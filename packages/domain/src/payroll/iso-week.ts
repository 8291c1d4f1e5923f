import { DateTime } from "luxon";
import type { IsoWeekday } from "./types.ts";

export interface IsoWeekDate {
  /** The ISO week-numbering year, which differs from the calendar year around New Year. */
  year: number;
  week: number;
  weekday: IsoWeekday;
}

/**
 * ISO 8601 week date of an instant as the studio's calendar sees it: week 01 holds the
 * year's first Thursday and weeks start on Monday. The zone matters near midnight, when
 * UTC may already be in the next day (and so possibly the next week).
 */
export function isoWeek(date: Date, timeZone: string): IsoWeekDate {
  const local = DateTime.fromJSDate(date, { zone: timeZone });
  if (!local.isValid) throw new RangeError(`Cannot read ${String(date)} in ${timeZone}`);
  return { year: local.weekYear, week: local.weekNumber, weekday: local.weekday as IsoWeekday };
}

/** "2026-W53-4", the ISO 8601 extended form. */
export function formatIsoWeek({ year, week, weekday }: IsoWeekDate): string {
  return `${year}-W${String(week).padStart(2, "0")}-${weekday}`;
}
