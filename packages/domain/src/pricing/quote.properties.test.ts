import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { quote } from "./quote.ts";
import { bookingArb, engineersArb, fiveMinutesMs, midnightMsArb, rateCardArb, wholeCentRateCardArb } from "./testing/arbitraries.ts";
import { intlTally } from "./testing/intl-clock.ts";
import { wrenfield } from "./testing/wrenfield.ts";
import type { Booking, Quote, QuoteLineKind, RateCard } from "./types.ts";
import { maxBookingMinutes } from "./validate-booking.ts";
import { engineerRateCents } from "./engineer-charges.ts";

const day = 288; // five-minute steps
const roomKinds: QuoteLineKind[] = ["room_day", "room_hourly", "minimum_top_up"];
const minutesOf = (result: Quote, kinds: QuoteLineKind[]) => result.lines.filter((line) => kinds.includes(line.kind)).reduce((sum, line) => sum + line.minutes, 0);
// Independent of the engine's own helpers: exact BigInt arithmetic, rounded half up.
const halfUp = (numerator: bigint, divisor: bigint) => Number((2n * numerator + divisor) / (2n * divisor));

describe("properties of every quote", () => {
  it("never lowers the price when a booking grows at its end ([D] follows from the per-day cap and the rate-card limits)", () => {
    fc.assert(
      fc.property(rateCardArb, bookingArb(3 * day), fc.integer({ min: 1, max: 2 * day }), (card, booking, extraSteps) => {
        const longer = { ...booking, endsAt: new Date(booking.endsAt.getTime() + extraSteps * fiveMinutesMs) };
        const before = quote(card, booking, wrenfield);
        const after = quote(card, longer, wrenfield);
        expect(after.totalCents).toBeGreaterThanOrEqual(before.totalCents);
        expect(after.billableMinutes).toBeGreaterThanOrEqual(before.billableMinutes);
      }),
      { numRuns: 200 },
    );
  });

  it("never costs more than the billable minutes all at the hourly rate, plus premiums on the hourly value of the booked minutes Intl counts, plus engineer time ([D] upper bound; IANA tz via Intl)", () => {
    fc.assert(
      fc.property(rateCardArb, bookingArb(3 * day), (card, booking) => {
        const result = quote(card, booking, wrenfield);
        const startMs = booking.startsAt.getTime();
        const endMs = booking.endsAt.getTime();
        const elapsed = (endMs - startMs) / 60_000;
        const rounded = Math.ceil(elapsed / card.billingIncrementMinutes) * card.billingIncrementMinutes;
        const billable = Math.max(rounded, card.minimumBillableMinutes);
        const intl = intlTally(startMs, endMs, wrenfield.timeZone, card.afterHours);
        const hourly = BigInt(card.hourlyRateCents);
        const bound =
          halfUp(BigInt(billable) * hourly, 60n) +
          halfUp(BigInt(intl.afterHoursMinutes) * hourly * BigInt(card.afterHoursPremiumBp), 600_000n) +
          halfUp(BigInt(intl.weekendMinutes) * hourly * BigInt(card.weekendPremiumBp), 600_000n) +
          booking.engineers.reduce((sum, engineer) => sum + halfUp(BigInt(rounded) * BigInt(engineerRateCents(engineer, card)), 60n), 0);
        expect(result.billableMinutes).toBe(billable);
        expect(result.totalCents).toBeLessThanOrEqual(bound);
      }),
      { numRuns: 150 },
    );
  });

  it("adds up: the total is the sum of the lines, every figure is a whole number of at least zero, and the room lines cover exactly the billable minutes", () => {
    fc.assert(
      fc.property(rateCardArb, bookingArb(maxBookingMinutes / 5), (card, booking) => {
        const result = quote(card, booking, wrenfield);
        expect(result.totalCents).toBe(result.lines.reduce((sum, line) => sum + line.amountCents, 0));
        for (const line of result.lines) {
          for (const figure of [line.quantity, line.unitAmountCents, line.amountCents, line.minutes]) {
            expect(Number.isSafeInteger(figure) && figure >= 0).toBe(true);
          }
        }
        expect(minutesOf(result, roomKinds)).toBe(result.billableMinutes);
        expect(result.lines.filter((line) => line.kind === "engineer")).toHaveLength(booking.engineers.length);
      }),
      { numRuns: 100 },
    );
  });
});

/**
 * Splitting at local midnight. When both parts are whole numbers of increments and at least
 * the minimum, neither rounding nor the minimum adds anything, and the day cap is decided per
 * studio day in both cases, so the split must not change what is billed. Exactly asserted:
 * the room lines (kind, date, minutes) are the parts' room lines in order; premium and engineer
 * minutes add up; and the totals agree to the cent where no line needs rounding, or to within
 * one cent per rounded group (room time, each premium, each engineer) where lines are rounded
 * once in the whole booking and once in each part.
 */
describe("splitting a booking at local midnight", () => {
  const splitCase = (cardArb: fc.Arbitrary<RateCard>) =>
    fc.tuple(cardArb, midnightMsArb, fc.integer({ min: 1, max: 96 }), fc.integer({ min: 1, max: 96 }), engineersArb).map(([card, midnightMs, stepsBefore, stepsAfter, engineers]) => {
      // Each part: a whole number of increments, at least the minimum, up to two days.
      const part = (steps: number) => Math.max(card.minimumBillableMinutes, Math.ceil((steps * 30) / card.billingIncrementMinutes) * card.billingIncrementMinutes);
      const startMs = midnightMs - part(stepsBefore) * 60_000;
      const endMs = midnightMs + part(stepsAfter) * 60_000;
      const make = (from: number, to: number): Booking => ({ startsAt: new Date(from), endsAt: new Date(to), engineers });
      return { card, whole: make(startMs, endMs), first: make(startMs, midnightMs), second: make(midnightMs, endMs) };
    });

  const compare = (card: RateCard, wholeBooking: Booking, firstBooking: Booking, secondBooking: Booking) => {
    const [whole, first, second] = [wholeBooking, firstBooking, secondBooking].map((booking) => quote(card, booking, wrenfield)) as [Quote, Quote, Quote];
    const roomShape = (result: Quote) => result.lines.filter((line) => roomKinds.includes(line.kind)).map((line) => [line.kind, line.date, line.minutes]);
    expect(roomShape(whole)).toEqual([...roomShape(first), ...roomShape(second)]);
    expect(whole.billableMinutes).toBe(first.billableMinutes + second.billableMinutes);
    for (const kind of ["after_hours_premium", "weekend_premium", "engineer"] as const) {
      expect(minutesOf(whole, [kind])).toBe(minutesOf(first, [kind]) + minutesOf(second, [kind]));
    }
    return { whole, difference: whole.totalCents - first.totalCents - second.totalCents };
  };

  it("changes nothing, to the cent, when rates make every line whole cents ([D] per-day cap; increments and minimum add nothing)", () => {
    fc.assert(
      fc.property(splitCase(wholeCentRateCardArb), ({ card, whole, first, second }) => {
        expect(compare(card, whole, first, second).difference).toBe(0);
      }),
      { numRuns: 150 },
    );
  });

  it("changes nothing but per-line rounding with any rates: at most one cent per rounded group ([D] each group is rounded once per quote)", () => {
    fc.assert(
      fc.property(splitCase(rateCardArb), ({ card, whole, first, second }) => {
        const { difference } = compare(card, whole, first, second);
        expect(Math.abs(difference)).toBeLessThanOrEqual(3 + whole.engineers.length);
      }),
      { numRuns: 150 },
    );
  });
});
