import { describe, expect, it } from "vitest";
import { roundHalfUpDiv } from "../shared/money.ts";
import { centsForMinutes, premiumCentsForMinutes, roundRunningTotal } from "./money-math.ts";

describe("money arithmetic", () => {
  it("rounds half a cent up and anything less down ([P] common practice: round half up, per line)", () => {
    expect(roundHalfUpDiv(11875n, 10n)).toBe(1188);
    expect(roundHalfUpDiv(11874n, 10n)).toBe(1187);
    expect(roundHalfUpDiv(4n, 10n)).toBe(0);
  });

  it("prices 30 minutes at $95.00/h as $47.50 ([D] 9500 × 30 ÷ 60)", () => {
    expect(centsForMinutes(30, 9500)).toBe(4750);
  });

  it("prices a 25% premium on 30 minutes at $95.00/h as $11.88 ([D] 9500 × 0.25 ÷ 2 = 1187.5 cents, half up)", () => {
    expect(premiumCentsForMinutes(30, 9500, 2500)).toBe(1188);
  });

  it("stays exact where floating point would not: two weeks at $99,999.99/h with a 100% premium ([D] 20160 × 9999999 × 10000 ÷ 600000)", () => {
    expect(premiumCentsForMinutes(20160, 9_999_999, 10_000)).toBe(3_359_999_664);
  });

  it("splits a running total so the rounded parts add up to the rounded whole ([D] three thirds of a cent make one cent)", () => {
    const parts = roundRunningTotal([1n, 1n, 1n], 3n);
    expect(parts.reduce((sum, part) => sum + part, 0)).toBe(1);
    expect(parts.every((part) => part >= 0)).toBe(true);
  });

  it("refuses a negative amount rather than rounding it the wrong way", () => {
    expect(() => roundHalfUpDiv(-1n, 2n)).toThrow(RangeError);
  });
});
