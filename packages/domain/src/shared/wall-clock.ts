import { DateTime } from "luxon";

/**
 * Luxon views of instants in the studio's zone. Luxon reads the IANA tz database through Intl,
 * so these answers follow the same data the tests check against.
 */

export const minuteMs = 60_000;

export function localAt(ms: number, timeZone: string): DateTime {
  const local = DateTime.fromMillis(ms, { zone: timeZone, locale: "en-US" });
  if (!local.isValid) throw new RangeError(`Cannot read ${ms} in time zone ${timeZone}`);
  return local;
}

export function minuteOfDay(local: DateTime): number {
  return local.hour * 60 + local.minute;
}

export function isoDate(local: DateTime): string {
  return local.toFormat("yyyy-MM-dd");
}

/** The start of the next studio day: luxon also copes with zones whose midnight is skipped. */
export function nextDayStart(dayStart: DateTime): DateTime {
  return dayStart.plus({ days: 1 }).startOf("day");
}

/**
 * Instants in [fromMs, toMs] (both on whole minutes) where the UTC offset changes, found by
 * halving: zones change offset at most once or twice a day, so comparing the ends of each half
 * finds every change within a studio day.
 */
export function offsetChanges(fromMs: number, toMs: number, timeZone: string): number[] {
  const offsetAt = (ms: number) => localAt(ms, timeZone).offset;
  const search = (lo: number, hi: number): number[] => {
    if (offsetAt(lo) === offsetAt(hi)) return [];
    if (hi - lo <= minuteMs) return [hi];
    const mid = lo + Math.floor((hi - lo) / 2 / minuteMs) * minuteMs;
    return [...search(lo, mid), ...search(mid, hi)];
  };
  return search(fromMs, toMs);
}

/**
 * The instants during one studio day whose wall clock reads `minute` (minutes after midnight):
 * none in a spring-forward gap, two in a fall-back hour. Each offset the day uses is tried,
 * and only candidates that read back as that wall time are kept.
 */
export function wallClockInstants(dayStart: DateTime, minute: number, offsetsMinutes: readonly number[], timeZone: string): number[] {
  const wallAsUtc = Date.UTC(dayStart.year, dayStart.month - 1, dayStart.day, 0, minute);
  const found = new Set<number>();
  for (const offset of offsetsMinutes) {
    const candidate = wallAsUtc - offset * minuteMs;
    const local = localAt(candidate, timeZone);
    // Compare calendar dates as text: luxon's hasSame re-reads local time and can pick the
    // other side of a repeated hour.
    if (isoDate(local) === isoDate(dayStart) && minuteOfDay(local) === minute) found.add(candidate);
  }
  return [...found];
}

/** The UTC offsets (minutes) in force at any moment of one studio day, and just before it. */
export function offsetsDuring(dayStart: DateTime, dayEnd: DateTime, timeZone: string, changes = offsetChanges(dayStart.toMillis(), dayEnd.toMillis(), timeZone)): number[] {
  // The hour before midnight counts too: where a change lands on midnight, luxon may have read
  // midnight with the later offset, and the earlier reading of the day's first hour needs the other.
  const before = localAt(dayStart.toMillis() - 3_600_000, timeZone).offset;
  return [...new Set([before, dayStart.offset, ...changes.map((ms) => localAt(ms, timeZone).offset)])];
}

/**
 * The first instant of a local date (`YYYY-MM-DD`) whose wall clock reads `minute`: in a
 * fall-back hour, which reads twice, the earlier of the two. Null when the wall time is
 * skipped (a spring-forward gap). Unlike luxon's `fromObject`, the answer never depends on
 * the date the program runs: luxon guesses the offset of a repeated hour from today's.
 */
export function earliestWallClockInstant(date: string, minute: number, timeZone: string): number | null {
  const dayStart = DateTime.fromISO(date, { zone: timeZone }).startOf("day");
  if (!dayStart.isValid) throw new RangeError(`Cannot read ${date} in time zone ${timeZone}`);
  const instants = wallClockInstants(dayStart, minute, offsetsDuring(dayStart, nextDayStart(dayStart), timeZone), timeZone);
  return instants.length === 0 ? null : Math.min(...instants);
}
