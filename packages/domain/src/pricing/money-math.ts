/**
 * Exact integer arithmetic for money. Products of minutes, rates and basis points can pass
 * 2^53 on long bookings at high rates, so they are formed in BigInt and only the rounded
 * result comes back as a number.
 */

/** numerator ÷ divisor, rounded half up (both non-negative integers, divisor above zero). */
export function roundHalfUpDiv(numerator: bigint, divisor: bigint): number {
  if (numerator < 0n || divisor <= 0n) throw new RangeError("roundHalfUpDiv takes a non-negative numerator and a positive divisor");
  const rounded = (2n * numerator + divisor) / (2n * divisor);
  const result = Number(rounded);
  if (!Number.isSafeInteger(result)) throw new RangeError("Amount is too large to represent exactly");
  return result;
}

export function product(...factors: number[]): bigint {
  return factors.reduce((acc, factor) => {
    if (!Number.isSafeInteger(factor)) throw new RangeError(`Not an integer: ${factor}`);
    return acc * BigInt(factor);
  }, 1n);
}

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
