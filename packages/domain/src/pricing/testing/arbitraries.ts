import fc from "fast-check";
import { DateTime } from "luxon";
import type { AssignedEngineer, Booking, RateCard } from "../types.ts";
import { assistant, houseEngineer, roomA, roomB, roomC, wrenfield } from "./wrenfield.ts";

export const fiveMinutesMs = 300_000;

// A guest rate of $52.80 is 88¢ a minute, so any whole number of minutes bills whole cents (the whole-cent split property relies on it).
const guestEngineer: AssignedEngineer = { id: "eng-3", name: "Ines Marlowe", grade: "engineer", rateCentsOverride: 5280 };

export const engineersArb: fc.Arbitrary<AssignedEngineer[]> = fc.subarray([houseEngineer, assistant, guestEngineer]);

/** Any rate card validation accepts, with the window's edges on a 5-minute grid (so Intl can count it in 5-minute steps). */
export const generatedRateCardArb: fc.Arbitrary<RateCard> = fc
  .record({
    hourlyRateCents: fc.integer({ min: 500, max: 40_000 }),
    dayCoversMinutes: fc.constantFrom(240, 480, 600, 720, 1440),
    billingIncrementMinutes: fc.constantFrom(1, 5, 10, 15, 30, 60),
    minimumSteps: fc.integer({ min: 0, max: 12 }),
    dayRateShare: fc.double({ min: 0, max: 1.3, noNaN: true }),
    windowStart: fc.integer({ min: 0, max: 288 }),
    windowEnd: fc.integer({ min: 0, max: 288 }),
    afterHoursPremiumBp: fc.integer({ min: 0, max: 10_000 }),
    weekendPremiumBp: fc.integer({ min: 0, max: 10_000 }),
    engineer: fc.integer({ min: 0, max: 10_000 }),
    assistantRate: fc.integer({ min: 0, max: 10_000 }),
  })
  .map((r): RateCard => {
    const minimum = Math.min(r.minimumSteps * r.billingIncrementMinutes, r.dayCoversMinutes);
    const minimumBillableMinutes = minimum - (minimum % r.billingIncrementMinutes);
    // The day rate lies between what the minimum (or one increment) costs and a bit over a whole day hourly.
    const floor = Math.ceil((Math.max(minimumBillableMinutes, r.billingIncrementMinutes) * r.hourlyRateCents) / 60);
    const fullDay = Math.ceil((r.dayCoversMinutes * r.hourlyRateCents) / 60);
    return {
      id: "generated", label: "Generated rate card",
      hourlyRateCents: r.hourlyRateCents,
      dayRateCents: Math.max(1, floor, Math.round(r.dayRateShare * fullDay)),
      dayCoversMinutes: r.dayCoversMinutes,
      minimumBillableMinutes,
      billingIncrementMinutes: r.billingIncrementMinutes,
      afterHours: { startMinute: r.windowStart * 5, endMinute: r.windowEnd * 5 },
      afterHoursPremiumBp: r.afterHoursPremiumBp,
      weekendPremiumBp: r.weekendPremiumBp,
      engineerRates: { engineer: r.engineer, assistant: r.assistantRate },
    };
  });

export const rateCardArb: fc.Arbitrary<RateCard> = fc.oneof(fc.constantFrom(roomA, roomB, roomC), generatedRateCardArb);

/**
 * Rate cards whose per-minute amounts are whole cents (hourly rates in $60 steps, whole-percent
 * premiums, engineer rates in 60-cent steps), so no line ever needs rounding.
 */
export const wholeCentRateCardArb: fc.Arbitrary<RateCard> = fc
  .tuple(generatedRateCardArb, fc.integer({ min: 1, max: 4 }), fc.integer({ min: 0, max: 100 }), fc.integer({ min: 0, max: 100 }), fc.integer({ min: 0, max: 150 }), fc.integer({ min: 0, max: 150 }))
  .map(([card, hourlySteps, afterHoursPercent, weekendPercent, engineerSteps, assistantSteps]): RateCard => {
    const hourlyRateCents = hourlySteps * 6000;
    const floor = Math.ceil((Math.max(card.minimumBillableMinutes, card.billingIncrementMinutes) * hourlyRateCents) / 60);
    return {
      ...card,
      hourlyRateCents,
      dayRateCents: Math.max(floor, Math.round((card.dayCoversMinutes * hourlyRateCents) / 60 * 0.85)),
      afterHoursPremiumBp: afterHoursPercent * 100,
      weekendPremiumBp: weekendPercent * 100,
      engineerRates: { engineer: engineerSteps * 60, assistant: assistantSteps * 60 },
    };
  });

const chicagoMidnight = (isoDate: string) => DateTime.fromISO(isoDate, { zone: wrenfield.timeZone }).toMillis();

/** Starts on a 5-minute grid through 2026, most of them in the weeks of the clock changes. */
export const startMsArb: fc.Arbitrary<number> = fc.oneof(
  fc.integer({ min: 0, max: 7 * 288 }).map((step) => chicagoMidnight("2026-03-04") + step * fiveMinutesMs),
  fc.integer({ min: 0, max: 7 * 288 }).map((step) => chicagoMidnight("2026-10-28") + step * fiveMinutesMs),
  fc.integer({ min: 0, max: 364 * 288 }).map((step) => chicagoMidnight("2026-01-01") + step * fiveMinutesMs),
);

export function bookingArb(maxSteps: number): fc.Arbitrary<Booking> {
  return fc.tuple(startMsArb, fc.integer({ min: 1, max: maxSteps }), engineersArb).map(([startMs, steps, engineers]) => ({
    startsAt: new Date(startMs),
    endsAt: new Date(startMs + steps * fiveMinutesMs),
    engineers,
  }));
}

/** A Wrenfield local midnight somewhere in 2026, including the two clock-change days. */
export const midnightMsArb: fc.Arbitrary<number> = fc.oneof(
  fc.constantFrom("2026-03-08", "2026-03-09", "2026-11-01", "2026-11-02", "2026-12-12", "2026-12-14").map(chicagoMidnight),
  fc.integer({ min: 0, max: 364 }).map((day) => DateTime.fromISO("2026-01-01", { zone: wrenfield.timeZone }).plus({ days: day }).toMillis()),
);
