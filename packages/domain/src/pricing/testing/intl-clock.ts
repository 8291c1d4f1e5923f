/**
 * An independent reading of wall-clock time straight from Intl (the IANA tz database as the
 * runtime ships it), with no luxon in the path, for checking the engine's calendar work.
 */

const formatters = new Map<string, Intl.DateTimeFormat>();

function formatter(timeZone: string): Intl.DateTimeFormat {
  let found = formatters.get(timeZone);
  if (!found) {
    found = new Intl.DateTimeFormat("en-US", {
      timeZone, hourCycle: "h23", weekday: "short", year: "numeric", month: "2-digit", day: "2-digit", hour: "2-digit", minute: "2-digit",
    });
    formatters.set(timeZone, found);
  }
  return found;
}

export interface IntlWallClock {
  date: string;
  weekday: string;
  minuteOfDay: number;
}

export function intlWallClock(ms: number, timeZone: string): IntlWallClock {
  const parts = Object.fromEntries(formatter(timeZone).formatToParts(new Date(ms)).map((part) => [part.type, part.value]));
  return {
    date: `${parts.year}-${parts.month}-${parts.day}`,
    weekday: parts.weekday ?? "",
    minuteOfDay: Number(parts.hour) * 60 + Number(parts.minute),
  };
}

/** "GMT-06:00": the offset as Intl names it. */
export function intlOffset(ms: number, timeZone: string): string {
  const parts = new Intl.DateTimeFormat("en-US", { timeZone, timeZoneName: "longOffset" }).formatToParts(new Date(ms));
  return parts.find((part) => part.type === "timeZoneName")?.value ?? "";
}

export interface IntlTally {
  minutesByDate: Map<string, number>;
  afterHoursMinutes: number;
  weekendMinutes: number;
}

/**
 * Classifies [startMs, endMs) step by step by what Intl says the wall clock reads at the start
 * of each step. Exact when the booking and the window's edges lie on the step grid and offset
 * changes fall on it too (true of every zone used with it here, on a 5-minute grid).
 */
export function intlTally(startMs: number, endMs: number, timeZone: string, window: { startMinute: number; endMinute: number }, stepMinutes = 5): IntlTally {
  const tally: IntlTally = { minutesByDate: new Map(), afterHoursMinutes: 0, weekendMinutes: 0 };
  const { startMinute, endMinute } = window;
  for (let ms = startMs; ms < endMs; ms += stepMinutes * 60_000) {
    const clock = intlWallClock(ms, timeZone);
    tally.minutesByDate.set(clock.date, (tally.minutesByDate.get(clock.date) ?? 0) + stepMinutes);
    const m = clock.minuteOfDay;
    const inWindow = startMinute === endMinute ? false : startMinute < endMinute ? m >= startMinute && m < endMinute : m >= startMinute || m < endMinute;
    if (inWindow) tally.afterHoursMinutes += stepMinutes;
    if (clock.weekday === "Sat" || clock.weekday === "Sun") tally.weekendMinutes += stepMinutes;
  }
  return tally;
}
