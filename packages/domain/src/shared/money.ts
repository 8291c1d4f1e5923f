/**
 * Exact integer arithmetic for money, shared by pricing, payroll and bookings. Products of
 * minutes, rates and basis points can pass 2^53 on long bookings at high rates, so they are
 * formed in BigInt and only the rounded result comes back as a number.
 */

/** numerator ÷ divisor, rounded half up (both non-negative integers, divisor above zero). */
export function roundHalfUpDiv(numerator: bigint, divisor: bigint): number {
  if (numerator < 0n || divisor <= 0n) throw new RangeError("roundHalfUpDiv takes a non-negative numerator and a positive divisor");
  const rounded = (2n * numerator + divisor) / (2n * divisor);
  const result = Number(rounded);
  if (!Number.isSafeInteger(result)) throw new RangeError("Amount is too large to represent exactly");
  return result;
}

/** The exact product of whole numbers, as a BigInt. */
export function product(...factors: number[]): bigint {
  return factors.reduce((acc, factor) => {
    if (!Number.isSafeInteger(factor)) throw new RangeError(`Not an integer: ${factor}`);
    return acc * BigInt(factor);
  }, 1n);
}

/** `bp` basis points (1/100 of a percent) of an amount in minor units, rounded half up: deposits, fees. */
export const basisPointsOf = (amountCents: number, bp: number): number => roundHalfUpDiv(product(amountCents, bp), 10_000n);
