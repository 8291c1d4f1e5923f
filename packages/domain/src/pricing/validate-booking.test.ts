import { describe, expect, it } from "vitest";
import { PricingError } from "./pricing-problem.ts";
import { quote } from "./quote.ts";
import { assistant, booking, houseEngineer, local, roomA, wrenfield } from "./testing/wrenfield.ts";
import { maxBookingMinutes, validateBooking } from "./validate-booking.ts";

const codes = (result: ReturnType<typeof validateBooking>) => (result.ok ? [] : result.problems.map((problem) => problem.code));

describe("validating a booking", () => {
  it("accepts a 3-hour session and reports its elapsed minutes", () => {
    expect(validateBooking(booking("2026-12-07T10:00", "2026-12-07T13:00"))).toEqual({ ok: true, value: { elapsedMinutes: 180 } });
  });

  it("refuses a booking that ends when it starts or before", () => {
    expect(codes(validateBooking(booking("2026-12-07T10:00", "2026-12-07T10:00")))).toEqual(["after_start"]);
    expect(codes(validateBooking(booking("2026-12-07T10:00", "2026-12-07T09:00")))).toEqual(["after_start"]);
  });

  it("allows two weeks exactly and refuses a minute more ([D] maxBookingMinutes = 14 × 24 × 60)", () => {
    expect(maxBookingMinutes).toBe(20_160);
    const start = local("2026-12-07T00:00");
    const at = (minutes: number) => ({ startsAt: start, endsAt: new Date(start.getTime() + minutes * 60_000), engineers: [] });
    expect(validateBooking(at(maxBookingMinutes)).ok).toBe(true);
    expect(codes(validateBooking(at(maxBookingMinutes + 1)))).toEqual(["max_length"]);
  });

  it("refuses instants that are not valid dates", () => {
    expect(codes(validateBooking({ startsAt: new Date(Number.NaN), endsAt: local("2026-12-07T10:00"), engineers: [] }))).toEqual(["invalid_instant"]);
  });

  it("refuses times with seconds, which only a bug upstream would send", () => {
    const start = local("2026-12-07T10:00");
    expect(codes(validateBooking({ startsAt: start, endsAt: new Date(start.getTime() + 90_500), engineers: [] }))).toEqual(["not_whole_minutes"]);
  });

  it("refuses the same engineer twice and a negative or fractional agreed rate", () => {
    const result = validateBooking(booking("2026-12-07T10:00", "2026-12-07T13:00", [houseEngineer, houseEngineer, { ...assistant, rateCentsOverride: 25.5 }]));
    expect(codes(result)).toEqual(["duplicate_engineer", "invalid_engineer_rate"]);
  });
});

describe("quote refuses what it cannot price", () => {
  it("throws a PricingError listing every problem with the booking and the studio", () => {
    const bad = booking("2026-12-07T10:00", "2026-12-07T09:00");
    try {
      quote(roomA, bad, { timeZone: "Mars/Olympus_Mons", currency: "XXZ" });
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(PricingError);
      expect((error as PricingError).problems.map((problem) => problem.code)).toEqual(["after_start", "invalid_time_zone", "unknown_currency"]);
    }
  });

  it("throws a PricingError for a rate card that fails validation", () => {
    expect(() => quote({ ...roomA, billingIncrementMinutes: 0 }, booking("2026-12-07T10:00", "2026-12-07T13:00"), wrenfield)).toThrow(PricingError);
  });
});
