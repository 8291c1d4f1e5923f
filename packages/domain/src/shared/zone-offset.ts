import { DateTime } from "luxon";

/**
 * A zone's UTC offset at an instant, looked up once per quarter hour and zone. Payroll reads
 * the offset for every punch and every workday boundary; asking luxon each time cost more
 * than all the rest of the rules engine (docs/benchmarks.md, payroll).
 *
 * Exact, not approximate: a quarter hour whose two ends have different offsets (a change
 * falls inside it) is never cached, and each instant in it is asked of luxon.
 */
const bucketMs = 15 * 60_000;
const maxCached = 200_000;
/** Per zone, the offset of each quarter hour seen (keyed by the quarter hour's number since 1970). */
const cache = new Map<string, Map<number, number>>();
let cached = 0;

function luxonOffset(ms: number, timeZone: string): number {
  const local = DateTime.fromMillis(ms, { zone: timeZone });
  if (!local.isValid) throw new RangeError(`Cannot read ${new Date(ms).toISOString()} in ${timeZone}`);
  return local.offset;
}

/** Minutes to add to UTC for local wall time (−360 for Chicago in winter). */
export function offsetMinutesAt(ms: number, timeZone: string): number {
  const bucket = Math.floor(ms / bucketMs);
  let zone = cache.get(timeZone);
  const known = zone?.get(bucket);
  if (known !== undefined) return known;
  const first = luxonOffset(bucket * bucketMs, timeZone);
  if (luxonOffset((bucket + 1) * bucketMs - 1, timeZone) !== first) return luxonOffset(ms, timeZone);
  if (cached >= maxCached) {
    cache.clear();
    cached = 0;
  }
  if (!zone) cache.set(timeZone, (zone = new Map()));
  zone.set(bucket, first);
  cached++;
  return first;
}

/** Local wall time as a UTC-based Date: read it only with the getUTC… methods. */
export function wallClock(ms: number, timeZone: string): Date {
  return new Date(ms + offsetMinutesAt(ms, timeZone) * 60_000);
}

const pad = (n: number) => String(n).padStart(2, "0");

/** "2026-12-07 09:58": studio wall time to the minute (seconds dropped), as the exports write it. */
export function localDateTime(ms: number, timeZone: string): string {
  const wall = wallClock(ms, timeZone);
  return `${wall.getUTCFullYear()}-${pad(wall.getUTCMonth() + 1)}-${pad(wall.getUTCDate())} ${pad(wall.getUTCHours())}:${pad(wall.getUTCMinutes())}`;
}
