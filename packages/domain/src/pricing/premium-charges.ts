import type { CalendarPiece, StudioDay } from "./studio-calendar.ts";
import { product, roundHalfUpDiv } from "../shared/money.ts";
import { premiumCentsForMinutes } from "./money-math.ts";
import type { QuoteLine, QuoteLineKind, RateCard } from "./types.ts";
import { formatDuration, formatPercent } from "../shared/format-units.ts";
import { describeSpans, formatRate, formatWindow } from "./wording.ts";

interface Pricing {
  card: RateCard;
  currency: string;
  timeZone: string;
}

interface Premium {
  kind: QuoteLineKind;
  name: string;
  where: string;
  bp: number;
  applies: (piece: CalendarPiece) => boolean;
}

/**
 * Premiums are charged on the hourly value of the booked minutes they cover, even on a day
 * billed at the day rate, and they add up rather than compound (a Saturday night hour
 * carries 25% + 15%). Charging them on a share of the day rate instead would let a longer day
 * cost less, because the share of each minute shrinks as the day grows (docs/pricing.md).
 * Minutes added by rounding or the minimum were never booked at any hour, so they carry none.
 */
function premiumLine(premium: Premium, days: readonly StudioDay[], { card, currency, timeZone }: Pricing): QuoteLine[] {
  const minutes = days.flatMap((day) => day.pieces).filter(premium.applies).reduce((sum, piece) => sum + piece.minutes, 0);
  if (minutes === 0 || premium.bp === 0) return [];
  const hourly = card.hourlyRateCents;
  return [{
    kind: premium.kind,
    label: `${premium.name} (+${formatPercent(premium.bp)})`,
    quantity: minutes,
    unit: "hour",
    unitAmountCents: roundHalfUpDiv(product(hourly, premium.bp), 10_000n),
    amountCents: premiumCentsForMinutes(minutes, hourly, premium.bp),
    minutes,
    explanation: `${formatPercent(premium.bp)} of the hourly rate (${formatRate(hourly, currency)}) on ${formatDuration(minutes)} ${premium.where}: ${describeSpans(days, premium.applies, timeZone)}.`,
  }];
}

export function premiumLines(days: readonly StudioDay[], pricing: Pricing): QuoteLine[] {
  const { card } = pricing;
  const premiums: Premium[] = [
    { kind: "after_hours_premium", name: "After-hours premium", where: `after hours (${formatWindow(card.afterHours)})`, bp: card.afterHoursPremiumBp, applies: (piece) => piece.afterHours },
    { kind: "weekend_premium", name: "Weekend premium", where: "on a Saturday or Sunday", bp: card.weekendPremiumBp, applies: (piece) => piece.weekend },
  ];
  return premiums.flatMap((premium) => premiumLine(premium, days, pricing));
}
