import { describe, expect, it } from "vitest";
import { billableTime, roundUpToIncrement } from "./billable-time.ts";
import { roomA } from "./testing/wrenfield.ts";

describe("billable time", () => {
  it("rounds 2 h 10 min up to 2 h 30 min in 30-minute steps ([P] common practice: bill started increments)", () => {
    expect(roundUpToIncrement(130, 30)).toBe(150);
  });

  it("leaves a whole number of increments as it is ([D] 180 is six 30-minute steps)", () => {
    expect(roundUpToIncrement(180, 30)).toBe(180);
  });

  it("raises 2 h 30 min to Room A's 3 h minimum, keeping rounding and top-up apart ([D] Wrenfield rate card)", () => {
    expect(billableTime(130, roomA)).toEqual({ elapsedMinutes: 130, roundedMinutes: 150, billableMinutes: 180, roundingMinutes: 20, topUpMinutes: 30 });
  });

  it("adds nothing to a booking longer than the minimum on the increment grid ([D] Wrenfield rate card)", () => {
    expect(billableTime(600, roomA)).toEqual({ elapsedMinutes: 600, roundedMinutes: 600, billableMinutes: 600, roundingMinutes: 0, topUpMinutes: 0 });
  });
});
