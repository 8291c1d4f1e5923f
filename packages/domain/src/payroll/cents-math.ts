/**
 * Exact division for pay figures. Products such as cents × minutes are formed in bigint
 * so no intermediate value is ever a float or beyond Number's safe range; only the final,
 * rounded cent goes back to Number.
 */

/** numerator ÷ denominator, half a cent rounding up (both non-negative, denominator > 0). */
export function divideRoundHalfUp(numerator: bigint, denominator: bigint): number {
  if (denominator <= 0n || numerator < 0n) {
    throw new RangeError("Pay figures are divided as non-negative by positive");
  }
  const result = (2n * numerator + denominator) / (2n * denominator);
  return Number(result);
}

export function assertCents(value: number, what: string): void {
  if (!Number.isSafeInteger(value) || value < 0) {
    throw new RangeError(`${what} must be a non-negative whole number of cents`);
  }
}
