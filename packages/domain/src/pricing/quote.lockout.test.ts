import fc from "fast-check";
import { DateTime } from "luxon";
import { describe, expect, it } from "vitest";
import { lockoutSpan } from "./lockout.ts";
import { quote } from "./quote.ts";
import { generatedRateCardArb, midnightMsArb } from "./testing/arbitraries.ts";
import { summary } from "./testing/summary.ts";
import { booking, houseEngineer, local, roomA, wrenfield } from "./testing/wrenfield.ts";
import type { AssignedEngineer, Booking, QuoteLineKind, RateCard } from "./types.ts";

// Worked examples of docs/pricing.md, "Lockouts". Room A: $95.00/h, $850.00 a day (10 h),
// after hours 22:00–08:00 +25%, weekends +15%. A lockout day is [P] studio practice (REFERENCES.md:
// "a lockout gives one client the room for the day"); the prices are [D] from the rate card.
const lockout = (from: string, to: string, card: RateCard = roomA, engineers: AssignedEngineer[] = []) =>
  quote(card, { ...booking(from, to, engineers), lockout: true }, wrenfield);

describe("lockouts: whole studio days at one day's price", () => {
  it("quotes Mon 10:00 – Wed 20:00 as three day-rate lines of $850.00, $2,550.00 in all, not $5,685.00 by the hour ([D] 3 × $850.00)", () => {
    const result = lockout("2026-12-07T10:00", "2026-12-09T20:00");
    expect(summary(result)).toEqual([["room_day", 1, 85000], ["room_day", 1, 85000], ["room_day", 1, 85000]]);
    expect(result.lines.map((line) => [line.label, line.date])).toEqual([
      ["Lockout day — Mon 7 Dec", "2026-12-07"],
      ["Lockout day — Tue 8 Dec", "2026-12-08"],
      ["Lockout day — Wed 9 Dec", "2026-12-09"],
    ]);
    expect(result.totalCents).toBe(255000);
    expect(result.lockout).toBe(true);
    expect(result.lines[0]?.explanation).toBe(
      "Mon 7 Dec: lockout, the room is the client's for the whole studio day (24 h, midnight to midnight America/Chicago), at the day rate, $850.00; no hourly time beyond the day and no after-hours premium inside a lockout.",
    );
  });

  it("covers whole studio days: Mon 10:00 – Wed 20:00 holds the room from Mon 00:00 to Thu 00:00 in the studio's zone ([D] our rule)", () => {
    const span = lockoutSpan(local("2026-12-07T10:00"), local("2026-12-09T20:00"), wrenfield.timeZone);
    expect([span.startsAt, span.endsAt]).toEqual([local("2026-12-07T00:00"), local("2026-12-10T00:00")]);
    // A lockout that ends at midnight ends with the day before it.
    const toMidnight = lockoutSpan(local("2026-12-07T00:00"), local("2026-12-09T00:00"), wrenfield.timeZone);
    expect(toMidnight.endsAt).toEqual(local("2026-12-09T00:00"));
    expect(lockout("2026-12-07T00:00", "2026-12-09T00:00").totalCents).toBe(170000);
  });

  it("uses the card's own lockout day rate when the owner sets one: three days at $700.00 = $2,100.00 ([D])", () => {
    const result = lockout("2026-12-07T10:00", "2026-12-09T20:00", { ...roomA, lockoutDayRateCents: 70000 });
    expect(summary(result)).toEqual([["room_day", 1, 70000], ["room_day", 1, 70000], ["room_day", 1, 70000]]);
    expect(result.lines[0]?.explanation).toContain("at the lockout day rate, $700.00");
  });

  it("adds no weekend premium to a weekend lockout unless the card says so: Sat–Sun is $1,700.00, or $1,955.00 with it ([D] 2 × ($850.00 + 15%))", () => {
    const plain = lockout("2026-12-12T09:00", "2026-12-13T21:00");
    expect(summary(plain)).toEqual([["room_day", 1, 85000], ["room_day", 1, 85000]]);
    expect(plain.lines[0]?.explanation).toContain("No weekend premium on a lockout day (rate card setting).");
    const withPremium = lockout("2026-12-12T09:00", "2026-12-13T21:00", { ...roomA, lockoutWeekendPremium: true });
    expect(summary(withPremium)).toEqual([["room_day", 1, 85000], ["room_day", 1, 85000], ["weekend_premium", 2, 25500]]);
    expect(withPremium.totalCents).toBe(195500);
  });

  it("charges one day's price for the 25-hour day the clocks go back and the 23-hour day they go forward (IANA America/Chicago) [D]", () => {
    const autumn = lockout("2026-11-01T12:00", "2026-11-01T13:00");
    expect([autumn.lines[0]?.minutes, autumn.totalCents]).toEqual([1500, 85000]);
    const spring = lockout("2026-03-08T12:00", "2026-03-08T13:00");
    expect([spring.lines[0]?.minutes, spring.totalCents]).toEqual([1380, 85000]);
  });

  it("bills an engineer a working day (the card's 10 h) on each lockout day: 3 × 10 h × $40.00 = $1,200.00 ([D] our rule)", () => {
    const result = lockout("2026-12-07T10:00", "2026-12-09T20:00", roomA, [houseEngineer]);
    expect(summary(result).at(-1)).toEqual(["engineer", 1800, 120000]);
    expect(result.totalCents).toBe(375000);
  });

  it("refuses a lockout longer than fourteen studio days, naming the field", () => {
    expect(() => lockout("2026-12-01T12:00", "2026-12-15T12:00")).toThrow(/at most 14 studio days/);
  });
});

const roomKinds: QuoteLineKind[] = ["room_day", "room_hourly", "minimum_top_up", "after_hours_premium", "weekend_premium"];
const roomCost = (result: ReturnType<typeof quote>) => result.lines.filter((line) => roomKinds.includes(line.kind)).reduce((sum, line) => sum + line.amountCents, 0);
const lockoutCardArb = fc
  .tuple(generatedRateCardArb, fc.option(fc.integer({ min: 1, max: 2_000_000 }), { nil: null }), fc.boolean())
  .map(([card, lockoutDayRateCents, lockoutWeekendPremium]): RateCard => ({ ...card, lockoutDayRateCents, lockoutWeekendPremium }));
const daysFrom = (midnightMs: number, days: number): Booking => {
  const start = DateTime.fromMillis(midnightMs, { zone: wrenfield.timeZone });
  return { startsAt: start.toJSDate(), endsAt: start.plus({ days }).toJSDate(), engineers: [] };
};

describe("properties of lockouts", () => {
  it("never costs more than the same whole days booked by the hour with the day cap and its premiums ([D] follows from the rule)", () => {
    fc.assert(
      fc.property(lockoutCardArb, midnightMsArb, fc.integer({ min: 1, max: 5 }), (card, midnightMs, days) => {
        const span = daysFrom(midnightMs, days);
        expect(roomCost(quote(card, { ...span, lockout: true }, wrenfield))).toBeLessThanOrEqual(roomCost(quote(card, span, wrenfield)));
      }),
      { numRuns: 100 },
    );
  });

  it("adds exactly one day's price when a lockout grows by a day: the price of that day locked out alone ([D] per-day pricing)", () => {
    fc.assert(
      fc.property(lockoutCardArb, midnightMsArb, fc.integer({ min: 1, max: 5 }), (card, midnightMs, days) => {
        const span = daysFrom(midnightMs, days);
        const longer = daysFrom(midnightMs, days + 1);
        const extraDay = { ...daysFrom(DateTime.fromMillis(midnightMs, { zone: wrenfield.timeZone }).plus({ days }).toMillis(), 1), lockout: true };
        const grown = quote(card, { ...longer, lockout: true }, wrenfield).totalCents - quote(card, { ...span, lockout: true }, wrenfield).totalCents;
        expect(grown).toBe(quote(card, extraDay, wrenfield).totalCents);
        expect(grown).toBeGreaterThan(0);
      }),
      { numRuns: 100 },
    );
  });
});
