/**
 * Pricing's sums over the shared exact arithmetic (`shared/money.ts`): per-minute charges,
 * premiums and running totals that add up.
 */
import { product, roundHalfUpDiv } from "../shared/money.ts";

/**
 * Rounds a run of exact amounts (numerators over one divisor) so the rounded parts add up to
 * the rounded whole: part i is round(prefix sum to i) − round(prefix sum before i). Each part
 * is within a cent of its own rounding, and the sum of the parts never depends on how the
 * whole was cut into parts.
 */
export function roundRunningTotal(numerators: readonly bigint[], divisor: bigint): number[] {
  let runningNumerator = 0n;
  let roundedSoFar = 0;
  return numerators.map((numerator) => {
    runningNumerator += numerator;
    const roundedTotal = roundHalfUpDiv(runningNumerator, divisor);
    const part = roundedTotal - roundedSoFar;
    roundedSoFar = roundedTotal;
    return part;
  });
}

/** Integer cents for a number of minutes at a per-hour amount, rounded half up. */
export function centsForMinutes(minutes: number, centsPerHour: number): number {
  return roundHalfUpDiv(product(minutes, centsPerHour), 60n);
}

/** A premium of `bp` basis points on `minutes` at a per-hour amount, rounded half up. */
export function premiumCentsForMinutes(minutes: number, centsPerHour: number, bp: number): number {
  return roundHalfUpDiv(product(minutes, centsPerHour, bp), 600_000n);
}
