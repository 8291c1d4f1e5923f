import { describe, expect, it } from "vitest";
import { cancellationFee } from "./cancellation-fee.ts";

const tiers = [
  { noticeUnderHours: 168, feeBp: 2500 },
  { noticeUnderHours: 48, feeBp: 5000 },
];
const startsAt = new Date("2026-12-10T16:00:00Z");
const hoursBefore = (h: number) => new Date(startsAt.getTime() - h * 3600_000);

describe("cancellation fee by notice given [P] common practice: tiers set by the studio", () => {
  it("charges 50% with under 48 hours' notice", () => {
    expect(cancellationFee({ quoteTotalCents: 85000, startsAt, cancelledAt: hoursBefore(47), tiers }).feeCents).toBe(42500);
  });

  it("charges the 25% tier between 48 hours and a week", () => {
    expect(cancellationFee({ quoteTotalCents: 85000, startsAt, cancelledAt: hoursBefore(48), tiers }).feeCents).toBe(21250);
  });

  it("charges nothing with a week's notice or more", () => {
    const fee = cancellationFee({ quoteTotalCents: 85000, startsAt, cancelledAt: hoursBefore(168), tiers });
    expect(fee.feeCents).toBe(0);
    expect(fee.explanation).toContain("no fee");
  });

  it("rounds a fractional fee half up to the cent", () => {
    expect(cancellationFee({ quoteTotalCents: 101, startsAt, cancelledAt: hoursBefore(1), tiers }).feeCents).toBe(51);
  });

  it("uses the shortest tier after the start has passed", () => {
    expect(cancellationFee({ quoteTotalCents: 1000, startsAt, cancelledAt: hoursBefore(-1), tiers }).feeCents).toBe(500);
  });
});
