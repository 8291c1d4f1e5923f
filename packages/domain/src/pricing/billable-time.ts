import type { RateCard } from "./types.ts";

export interface BillableTime {
  elapsedMinutes: number;
  /** Elapsed minutes rounded up to the billing increment. */
  roundedMinutes: number;
  /** Rounded minutes raised to the minimum: what the room is billed for. */
  billableMinutes: number;
  /** Minutes added by rounding (billed as room time on the booking's last studio day). */
  roundingMinutes: number;
  /** Minutes added by the minimum (billed on a line of their own). */
  topUpMinutes: number;
}

export function roundUpToIncrement(minutes: number, incrementMinutes: number): number {
  return Math.ceil(minutes / incrementMinutes) * incrementMinutes;
}

/**
 * Rounding and the minimum apply once to the whole booking, not per studio day: a session that
 * crosses midnight is one session to the client, and per-day rounding would bill an overnight
 * session up to two extra increments for the same time.
 */
export function billableTime(elapsedMinutes: number, rateCard: RateCard): BillableTime {
  const roundedMinutes = roundUpToIncrement(elapsedMinutes, rateCard.billingIncrementMinutes);
  const billableMinutes = Math.max(roundedMinutes, rateCard.minimumBillableMinutes);
  return {
    elapsedMinutes,
    roundedMinutes,
    billableMinutes,
    roundingMinutes: roundedMinutes - elapsedMinutes,
    topUpMinutes: billableMinutes - roundedMinutes,
  };
}
