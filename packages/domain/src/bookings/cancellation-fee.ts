import { formatPercent } from "../shared/format-units.ts";
import { basisPointsOf } from "../shared/money.ts";

/**
 * A cancellation tier: cancelling with less than `noticeUnderHours` of notice costs `feeBp`
 * basis points of the quoted price. The owner sets the tiers; the shortest matching one wins.
 */
export type CancellationTier = { noticeUnderHours: number; feeBp: number };

export type CancellationFee = { feeCents: number; noticeMinutes: number; tier: CancellationTier | null; explanation: string };


export function cancellationFee(input: {
  quoteTotalCents: number;
  startsAt: Date;
  cancelledAt: Date;
  tiers: CancellationTier[];
}): CancellationFee {
  const noticeMinutes = Math.floor((input.startsAt.getTime() - input.cancelledAt.getTime()) / 60000);
  const tier =
    [...input.tiers]
      .sort((a, b) => a.noticeUnderHours - b.noticeUnderHours)
      .find((t) => noticeMinutes < t.noticeUnderHours * 60) ?? null;
  const feeCents = tier ? basisPointsOf(input.quoteTotalCents, tier.feeBp) : 0;
  const noticeText = noticeMinutes <= 0 ? "after the start" : `${Math.floor(noticeMinutes / 60)} h ${noticeMinutes % 60} min before the start`;
  const explanation = tier
    ? `Cancelled ${noticeText}: under ${tier.noticeUnderHours} h notice costs ${formatPercent(tier.feeBp)} of the quoted price.`
    : `Cancelled ${noticeText}: enough notice, no fee.`;
  return { feeCents, noticeMinutes, tier, explanation };
}
