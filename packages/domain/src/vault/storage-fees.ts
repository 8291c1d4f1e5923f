/**
 * Storage fees for reels the studio keeps (docs/tape.md, "Vault"). The free period and the monthly
 * fee are the owner's settings. Dates are studio-local calendar dates (YYYY-MM-DD), months YYYY-MM.
 *
 * - The free period is `freeDays` whole days after the day of the project's last session
 *   (a reel without a session counts from the day it was recorded).
 * - Fees start the day after the free period; every calendar month that contains at least one
 *   fee day while the reel is in the studio's keeping is charged one whole monthly fee, once the
 *   month has begun. A reel released to its owner is not charged after the month it left.
 * - The client is told once, one calendar month before fees start.
 */
export type StorageFeeRule = { freeDays: number; monthlyFeeCents: number };

const dayMs = 86_400_000;
const toUtc = (date: string) => {
  const [y, m, d] = date.split("-").map(Number) as [number, number, number];
  return Date.UTC(y, m - 1, d);
};
const fromUtc = (ms: number) => new Date(ms).toISOString().slice(0, 10);

export const addDays = (date: string, days: number) => fromUtc(toUtc(date) + days * dayMs);
export const monthOf = (date: string) => date.slice(0, 7);

/** The same day a month earlier, or that month's last day when it is shorter (31 March → 28/29 Feb). */
export function monthBefore(date: string): string {
  const [y, m, d] = date.split("-").map(Number) as [number, number, number];
  const lastDay = new Date(Date.UTC(y, m - 1, 0)).getUTCDate();
  return fromUtc(Date.UTC(y, m - 2, Math.min(d, lastDay)));
}

function nextMonth(month: string): string {
  const [y, m] = month.split("-").map(Number) as [number, number];
  return m === 12 ? `${y + 1}-01` : `${y}-${String(m + 1).padStart(2, "0")}`;
}

/** The first day fees are due: the day after the last free day. */
export function feeStartDate(lastSessionDate: string, freeDays: number): string {
  return addDays(lastSessionDate, freeDays + 1);
}

/** The day the client is told that fees are coming. */
export function feeNoticeDate(feeStart: string): string {
  return monthBefore(feeStart);
}

/**
 * The months (YYYY-MM) chargeable as of `asOf` for a reel whose fees start on `feeStart`;
 * `releasedOn` is the day it left the building, if it has.
 */
export function chargeableMonths(input: { feeStart: string; asOf: string; releasedOn?: string | null }): string[] {
  const lastKept = input.releasedOn && input.releasedOn < input.asOf ? input.releasedOn : input.asOf;
  if (input.feeStart > lastKept) return [];
  const months: string[] = [];
  for (let month = monthOf(input.feeStart); month <= monthOf(lastKept); month = nextMonth(month)) months.push(month);
  return months;
}
