import { DateTime } from "luxon";

// Every date and time on the booking screens is studio time: the studio's IANA zone decides
// what "Monday 10:00" means, never the zone of the browser that happens to show it.

// Day-first British English reads "Mon 7 Dec", as the grid names its cells.
const locale = "en-GB";

const at = (iso: string, timeZone: string) => DateTime.fromISO(iso, { zone: timeZone, locale });
const day = (date: string, timeZone: string) => DateTime.fromISO(date, { zone: timeZone, locale }).startOf("day");

/** Today's date at the studio, e.g. "2026-12-07". */
export function studioToday(timeZone: string, now: Date = new Date()): string {
  return DateTime.fromJSDate(now, { zone: timeZone }).toFormat("yyyy-MM-dd");
}

/** The current wall time at the studio, for a datetime-local field ("2026-12-07T10:05"). */
export function studioNowLocal(timeZone: string, now: Date = new Date()): string {
  return DateTime.fromJSDate(now, { zone: timeZone }).toFormat("yyyy-MM-dd'T'HH:mm");
}

/** Adds whole calendar days to an ISO date. */
export function addDays(date: string, days: number): string {
  return DateTime.fromISO(date, { zone: "UTC" }).plus({ days }).toFormat("yyyy-MM-dd");
}

/** Days from one ISO date to another (b − a). */
export function daysBetween(a: string, b: string): number {
  return Math.round(DateTime.fromISO(b, { zone: "UTC" }).diff(DateTime.fromISO(a, { zone: "UTC" }), "days").days);
}

/** The first day of the studio's week containing `date` (workweekStartDay: ISO 1 = Monday … 7 = Sunday). */
export function startOfStudioWeek(date: string, workweekStartDay: number): string {
  const weekday = DateTime.fromISO(date, { zone: "UTC" }).weekday;
  return addDays(date, -((weekday - workweekStartDay + 7) % 7));
}

/**
 * A studio-local wall time as an instant with the studio's offset, e.g. ("2026-12-07", "10:00")
 * in America/Chicago → "2026-12-07T10:00:00-06:00". A time in a spring-forward gap moves on
 * to the first wall time that exists, as luxon does.
 */
export function studioLocalToIso(date: string, time: string, timeZone: string): string {
  const local = DateTime.fromISO(`${date}T${time}`, { zone: timeZone });
  if (!local.isValid) throw new RangeError(`Not a date and time: ${date} ${time}`);
  return local.toISO({ suppressMilliseconds: true }) ?? "";
}

/** Where a studio day starts, as an instant (midnight at the studio). */
export function studioDayStartIso(date: string, timeZone: string): string {
  return day(date, timeZone).toISO({ suppressMilliseconds: true }) ?? "";
}

/** From midnight of `date` to midnight `days` later, studio time, for list queries. */
export function studioDaysRange(date: string, days: number, timeZone: string): { from: string; to: string } {
  const start = day(date, timeZone);
  return {
    from: start.toISO({ suppressMilliseconds: true }) ?? "",
    to: start.plus({ days }).startOf("day").toISO({ suppressMilliseconds: true }) ?? "",
  };
}

export type StudioParts = { date: string; time: string; minuteOfDay: number };

/** An instant read on the studio's wall clock. */
export function studioParts(iso: string, timeZone: string): StudioParts {
  const local = at(iso, timeZone);
  return { date: local.toFormat("yyyy-MM-dd"), time: local.toFormat("HH:mm"), minuteOfDay: local.hour * 60 + local.minute };
}

/** "10:00" */
export const formatStudioTime = (iso: string, timeZone: string) => at(iso, timeZone).toFormat("HH:mm");

/** "Mon 7 Dec", for an ISO date. */
export const formatDayShort = (date: string) => DateTime.fromISO(date, { zone: "UTC", locale }).toFormat("ccc d LLL");

/** "Monday 7 December 2026", for an ISO date. */
export const formatDayLong = (date: string) => DateTime.fromISO(date, { zone: "UTC", locale }).toFormat("cccc d LLLL yyyy");

/** "Thu 10 Dec, 14:00", for an instant. */
export const formatStudioDayTime = (iso: string, timeZone: string) => at(iso, timeZone).toFormat("ccc d LLL, HH:mm");

/** "1 Nov 2026, 00:00", for when prices or feeds took effect. */
export const formatStudioStamp = (iso: string, timeZone: string) => at(iso, timeZone).toFormat("d LLL yyyy, HH:mm");

/** "10:00–13:00", or with days when the range crosses midnight: "Mon 7 Dec 22:00 – Tue 8 Dec 02:00". */
export function formatTimeRange(startIso: string, endIso: string, timeZone: string, { withDay = false } = {}): string {
  const start = at(startIso, timeZone);
  const end = at(endIso, timeZone);
  const endsAtMidnight = end.hour === 0 && end.minute === 0 && end.minus({ days: 1 }).hasSame(start, "day");
  if (start.hasSame(end, "day") || endsAtMidnight) {
    const range = `${start.toFormat("HH:mm")}–${endsAtMidnight ? "24:00" : end.toFormat("HH:mm")}`;
    return withDay ? `${start.toFormat("ccc d LLL")} ${range}` : range;
  }
  return `${start.toFormat("ccc d LLL HH:mm")} – ${end.toFormat("ccc d LLL HH:mm")}`;
}

/** "07:30" for 450 minutes after midnight. */
export function minuteToTime(minute: number): string {
  const m = ((minute % 1440) + 1440) % 1440;
  return `${String(Math.floor(m / 60)).padStart(2, "0")}:${String(m % 60).padStart(2, "0")}`;
}

/** 450 for "07:30"; null when the text is not a time. */
export function timeToMinute(time: string): number | null {
  const match = /^(\d{2}):(\d{2})$/.exec(time);
  if (!match) return null;
  const hours = Number(match[1]);
  const minutes = Number(match[2]);
  if (hours > 24 || minutes > 59 || (hours === 24 && minutes > 0)) return null;
  return hours * 60 + minutes;
}

/**
 * The instants of a session picked as a date with a start and end time. An end at or before
 * the start runs past midnight into the next day, as late sessions do.
 */
export function sessionInstants(date: string, start: string, end: string, timeZone: string): { startsAt: string; endsAt: string; overnight: boolean } | null {
  const startMinute = timeToMinute(start);
  const endMinute = timeToMinute(end);
  if (!/^\d{4}-\d{2}-\d{2}$/.test(date) || startMinute === null || endMinute === null) return null;
  const overnight = endMinute <= startMinute;
  const endDate = overnight ? addDays(date, 1) : date;
  // "24:00" is midnight at the end of the day.
  const endsAt = endMinute === 1440 ? studioDayStartIso(addDays(date, 1), timeZone) : studioLocalToIso(endDate, end, timeZone);
  return { startsAt: studioLocalToIso(date, start, timeZone), endsAt, overnight: overnight && endMinute !== 1440 };
}

/** The studio-local date and time of a datetime-local value as an instant. */
export function studioLocalDateTimeToIso(value: string, timeZone: string): string | null {
  const local = DateTime.fromISO(value, { zone: timeZone });
  return local.isValid ? (local.toISO({ suppressMilliseconds: true }) ?? null) : null;
}
