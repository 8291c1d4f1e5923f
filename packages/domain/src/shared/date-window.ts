// How far from today bookings, quotes and time may be dated (docs/date-window.md). Constants, not
// studio settings: the bounds only keep typing slips (0999, 2036 for 2026) out of the calendar and the payroll.

const minute = 60_000;
const day = 24 * 60 * minute;

export const dateWindow = {
  /** A booking or quote may start at most this many years before today (back-filling the diary)… */
  bookingYearsBack: 2,
  /** …and end at most this many years after it. */
  bookingYearsAhead: 3,
  /** Time can be corrected or added at most this many days back (older time sits in closed periods). */
  timeDaysBack: 400,
  /** Time not yet worked cannot be recorded; a few minutes' slack covers clocks that differ. */
  timeMinutesAhead: 15,
  /** A session can be started (and clocked into) from this long before its booked start… */
  startEarlyMinutes: 60,
  /** …until this long after its booked end (a session started late and marked afterwards). */
  startLateMinutes: 6 * 60,
} as const;

export type DateProblem = { field: string; rule: "date_window"; message: string };

const yearsFrom = (now: Date, years: number) => {
  const at = new Date(now);
  at.setUTCFullYear(at.getUTCFullYear() + years);
  return at;
};

const day10 = (at: Date) => at.toISOString().slice(0, 10);

/** A booking's or quote's instant outside [today − 2 years, today + 3 years], or null when it fits. */
export function bookingDateProblem(field: string, at: Date, now: Date = new Date()): DateProblem | null {
  const earliest = yearsFrom(now, -dateWindow.bookingYearsBack);
  const latest = yearsFrom(now, dateWindow.bookingYearsAhead);
  if (at >= earliest && at <= latest) return null;
  return { field, rule: "date_window", message: `Use a date between ${day10(earliest)} and ${day10(latest)} (at most ${dateWindow.bookingYearsBack} years back and ${dateWindow.bookingYearsAhead} years ahead)` };
}

/** A time entry's instant in the future or more than 400 days back, or null when it fits. */
export function timeDateProblem(field: string, at: Date, now: Date = new Date()): DateProblem | null {
  if (at.getTime() > now.getTime() + dateWindow.timeMinutesAhead * minute) {
    return { field, rule: "date_window", message: "Time not yet worked cannot be recorded; use a time before now" };
  }
  const earliest = new Date(now.getTime() - dateWindow.timeDaysBack * day);
  if (at < earliest) return { field, rule: "date_window", message: `Use a time after ${day10(earliest)} (at most ${dateWindow.timeDaysBack} days back)` };
  return null;
}

/** Whether a session booked for [startsAt, endsAt) can be started or clocked into at `now`. */
export function nearBookedTime(startsAt: Date, endsAt: Date, now: Date = new Date(), lateMinutes: number = dateWindow.startLateMinutes): boolean {
  return now.getTime() >= startsAt.getTime() - dateWindow.startEarlyMinutes * minute && now.getTime() <= endsAt.getTime() + lateMinutes * minute;
}
