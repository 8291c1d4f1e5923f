/** Pay figures are whole, non-negative cents. */
export function assertCents(value: number, what: string): void {
  if (!Number.isSafeInteger(value) || value < 0) {
    throw new RangeError(`${what} must be a non-negative whole number of cents`);
  }
}
