import { describe, expect, it } from "vitest";
import { formatMoney, minorUnits } from "./currency.ts";

describe("currency minor units", () => {
  it.each([
    ["USD", 2], ["EUR", 2], ["GBP", 2],
    ["JPY", 0], ["KRW", 0], ["ISK", 0], ["CLP", 0],
    ["BHD", 3], ["KWD", 3], ["JOD", 3], ["OMR", 3], ["IQD", 3],
    ["CLF", 4],
  ])("gives %s %i minor units (ISO 4217 list one, 2024-06-25)", (code, units) => {
    expect(minorUnits(code)).toBe(units);
  });

  it("keeps ISO's figure for IQD where CLDR (and so Intl) says 0 (ISO 4217 list one)", () => {
    expect(minorUnits("IQD")).toBe(3);
  });

  it("refuses a code it does not know rather than guessing", () => {
    expect(() => minorUnits("XXZ")).toThrow(RangeError);
  });
});

describe("formatMoney", () => {
  it("shows cents as dollars with two decimals", () => {
    expect(formatMoney(85000, "USD")).toBe("$850.00");
  });

  it("shows yen with no decimals", () => {
    expect(formatMoney(1200, "JPY")).toBe("¥1,200");
  });

  it("refuses fractional minor units", () => {
    expect(() => formatMoney(10.5, "USD")).toThrow(RangeError);
  });
});
