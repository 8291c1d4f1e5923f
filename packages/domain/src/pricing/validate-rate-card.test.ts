import { describe, expect, it } from "vitest";
import { billableTime } from "./billable-time.ts";
import { roomLines } from "./room-charges.ts";
import { studioDays } from "./studio-calendar.ts";
import { local, roomA, roomB, roomC, wrenfield } from "./testing/wrenfield.ts";
import type { RateCard } from "./types.ts";
import { validateRateCard } from "./validate-rate-card.ts";

const fields = (card: RateCard) => {
  const result = validateRateCard(card);
  return result.ok ? [] : result.problems.map((problem) => problem.field);
};

describe("validating a rate card", () => {
  it("accepts Wrenfield's three rooms", () => {
    expect([roomA, roomB, roomC].map(fields)).toEqual([[], [], []]);
  });

  it("refuses rates that are not whole cents above zero", () => {
    expect(fields({ ...roomA, hourlyRateCents: 95.5, dayRateCents: 0 })).toEqual(["hourlyRateCents", "dayRateCents"]);
  });

  it("refuses a minimum that is not a whole number of increments ([D] 100 min is not a multiple of 30)", () => {
    expect(fields({ ...roomA, minimumBillableMinutes: 100 })).toEqual(["minimumBillableMinutes"]);
  });

  it("refuses a minimum that costs more than the day rate ([D] 10 h × $95.00 = $950.00 > $850.00)", () => {
    expect(fields({ ...roomA, minimumBillableMinutes: 600 })).toEqual(["minimumBillableMinutes"]);
  });

  it("refuses an increment that costs more than the day rate ([D] 10 h × $95.00 > $850.00)", () => {
    expect(fields({ ...roomA, billingIncrementMinutes: 600, minimumBillableMinutes: 0 })).toEqual(["billingIncrementMinutes"]);
  });

  it("refuses a day longer than 24 hours and an after-hours window outside the day", () => {
    expect(fields({ ...roomA, dayCoversMinutes: 1500 })).toEqual(["dayCoversMinutes"]);
    expect(fields({ ...roomA, afterHours: { startMinute: 1320, endMinute: 1500 } })).toEqual(["afterHours"]);
  });

  it("refuses negative premiums and engineer rates", () => {
    expect(fields({ ...roomA, weekendPremiumBp: -1, engineerRates: { engineer: 4000, assistant: -1, perEngineerCents: { x: 1.5 } } }))
      .toEqual(["weekendPremiumBp", "engineerRates.assistant", "engineerRates.perEngineerCents.x"]);
  });

  it("refuses such increments for a reason: unchecked, a 4 h step on a $200.00 4-hour day lets 5 h 30 min cost less than 4 h 30 min ([D] docs/pricing.md)", () => {
    // The rooms' own functions, bypassing validation, to show the price the limit prevents.
    const card = { ...roomA, dayCoversMinutes: 240, dayRateCents: 20000, minimumBillableMinutes: 0, billingIncrementMinutes: 240 };
    const roomTotal = (from: string, to: string) => {
      const [start, end] = [local(from).getTime(), local(to).getTime()];
      const lines = roomLines(studioDays(start, end, card.afterHours, wrenfield.timeZone), billableTime((end - start) / 60_000, card), { card, ...wrenfield });
      return lines.reduce((sum, line) => sum + line.amountCents, 0);
    };
    expect(roomTotal("2026-12-07T19:00", "2026-12-07T23:30")).toBe(58000);
    expect(roomTotal("2026-12-07T19:00", "2026-12-08T00:30")).toBe(49500);
    expect(fields(card)).toEqual(["billingIncrementMinutes"]);
  });
});
