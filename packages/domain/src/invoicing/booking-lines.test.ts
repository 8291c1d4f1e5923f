import { describe, expect, it } from "vitest";
import type { Quote } from "../pricing/types.ts";
import { bookingLines } from "./booking-lines.ts";

const quote: Quote = {
  rateCardId: "1",
  rateCardLabel: "Room A v1",
  currency: "USD",
  timeZone: "America/Chicago",
  elapsedMinutes: 100,
  billableMinutes: 120,
  totalCents: 20_000 + 9_000,
  lines: [
    { kind: "room_hourly", label: "Room time", quantity: 100, unit: "hour", unitAmountCents: 6_000, amountCents: 10_000, minutes: 100, explanation: "100 min at $60.00/h" },
    { kind: "minimum_top_up", label: "Minimum", quantity: 20, unit: "hour", unitAmountCents: 6_000, amountCents: 10_000 - 8_000, minutes: 20, explanation: "Top-up" },
    { kind: "engineer", label: "Engineer", quantity: 120, unit: "hour", unitAmountCents: 4_500, amountCents: 9_000, minutes: 120, explanation: "120 min" },
  ],
};
const bookedEndsAt = new Date("2026-03-03T20:00:00Z");
const base = { quote, bookedEndsAt, hourlyRateCents: 6_000, billingIncrementMinutes: 15, sessionLabel: "Room A, 3 Mar" };

describe("a wrapped session's invoice lines", () => {
  it("carry the quote's own amounts and split room time from engineer time", () => {
    const lines = bookingLines({ ...base, basis: "booked", wrappedAt: new Date("2026-03-03T21:00:00Z") });
    expect(lines.map((l) => [l.category, l.fixedAmountMinor])).toEqual([
      ["room", 10_000],
      ["room", 2_000],
      ["engineer", 9_000],
    ]);
  });

  it("add the overrun at the hourly rate in billing steps when billed on actual time ([D] 20 min over → 30 min at $60/h = $30)", () => {
    const lines = bookingLines({ ...base, basis: "actual", wrappedAt: new Date("2026-03-03T20:20:00Z") });
    expect(lines.at(-1)).toMatchObject({ category: "room", fixedAmountMinor: 3_000, description: "Room A, 3 Mar: overrun" });
  });

  it("add no overrun for a lockout, which has the room all day", () => {
    const lines = bookingLines({ ...base, quote: { ...quote, lockout: true }, basis: "actual", wrappedAt: new Date("2026-03-03T23:00:00Z") });
    expect(lines).toHaveLength(3);
  });
});
