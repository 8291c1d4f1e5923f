import { describe, expect, it } from "vitest";
import { bpToPercent, fromMinorUnits, parseNumberList, percentToBp, toMinorUnits } from "./units.ts";

describe("form units", () => {
  it("turns typed amounts into whole minor units of the currency and back", () => {
    expect(toMinorUnits("85.50", "USD")).toBe(8550);
    expect(toMinorUnits("1,250", "USD")).toBe(125000);
    expect(toMinorUnits("0.1", "USD")).toBe(10);
    expect(toMinorUnits("1500", "JPY")).toBe(1500);
    expect(toMinorUnits("eighty", "USD")).toBeNull();
    expect(fromMinorUnits(8550, "USD")).toBe("85.50");
  });

  it("turns percent into basis points without floating-point crumbs", () => {
    expect(percentToBp(12.5)).toBe(1250);
    expect(percentToBp(0.07)).toBe(7);
    expect(percentToBp(33.33)).toBe(3333);
    expect(bpToPercent(2500)).toBe(25);
  });

  it("reads tape speeds written as a comma list", () => {
    expect(parseNumberList("15, 30")).toEqual([15, 30]);
    expect(parseNumberList("7.5,15")).toEqual([7.5, 15]);
    expect(parseNumberList("")).toEqual([]);
    expect(parseNumberList("15, fast")).toBeNull();
  });
});
