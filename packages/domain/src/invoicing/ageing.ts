import { product, roundHalfUpDiv } from "../shared/money.ts";

/**
 * Accounts-receivable ageing by days past due, as of any date. The buckets are our choice; the
 * bucket-and-sum method (and applying a rate per bucket) is the one of OpenStax, Principles of
 * Accounting Vol. 1, §9.2.
 */
export const ageingBuckets = ["current", "days_1_30", "days_31_60", "days_61_90", "over_90"] as const;
export type AgeingBucket = (typeof ageingBuckets)[number];

export const ageingBucketLabels: Record<AgeingBucket, string> = {
  current: "Current",
  days_1_30: "1–30 days",
  days_31_60: "31–60 days",
  days_61_90: "61–90 days",
  over_90: "Over 90 days",
};

const dayMs = 86_400_000;
const isoDay = /^(\d{4})-(\d{2})-(\d{2})$/;

export function parseIsoDay(date: string): number {
  const match = isoDay.exec(date);
  if (!match) throw new RangeError(`Not a YYYY-MM-DD date: ${date}`);
  const ms = Date.UTC(Number(match[1]), Number(match[2]) - 1, Number(match[3]));
  if (new Date(ms).toISOString().slice(0, 10) !== date) throw new RangeError(`No such date: ${date}`);
  return ms;
}

export function addIsoDays(date: string, days: number): string {
  return new Date(parseIsoDay(date) + days * dayMs).toISOString().slice(0, 10);
}

/** Whole days from `dueOn` to `asOf` (negative before the due date). */
export function daysPastDue(dueOn: string, asOf: string): number {
  return Math.round((parseIsoDay(asOf) - parseIsoDay(dueOn)) / dayMs);
}

export function ageingBucketOf(days: number): AgeingBucket {
  if (days <= 0) return "current";
  if (days <= 30) return "days_1_30";
  if (days <= 60) return "days_31_60";
  if (days <= 90) return "days_61_90";
  return "over_90";
}

export interface OpenItem {
  dueOn: string;
  balanceMinor: number;
}

export type AgeingTotals = Record<AgeingBucket, number> & { totalMinor: number };

/** Sums open balances into the buckets as of a date. Items with nothing owed are left out. */
export function ageReceivables(items: readonly OpenItem[], asOf: string): AgeingTotals {
  const totals: AgeingTotals = { current: 0, days_1_30: 0, days_31_60: 0, days_61_90: 0, over_90: 0, totalMinor: 0 };
  for (const item of items) {
    if (item.balanceMinor === 0) continue;
    totals[ageingBucketOf(daysPastDue(item.dueOn, asOf))] += item.balanceMinor;
    totals.totalMinor += item.balanceMinor;
  }
  return totals;
}

/** A rate (basis points) applied to each bucket's sum, each product rounded half up, then added. */
export function bucketEstimate(rows: readonly { amountMinor: number; bp: number }[]): { rows: number[]; totalMinor: number } {
  const estimates = rows.map((row) => roundHalfUpDiv(product(row.amountMinor, row.bp), 10_000n));
  return { rows: estimates, totalMinor: estimates.reduce((a, b) => a + b, 0) };
}
