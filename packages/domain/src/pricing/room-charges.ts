import { formatMoney } from "../shared/currency.ts";
import type { BillableTime } from "./billable-time.ts";
import { product } from "../shared/money.ts";
import { centsForMinutes, roundRunningTotal } from "./money-math.ts";
import type { StudioDay } from "./studio-calendar.ts";
import type { QuoteLine, RateCard } from "./types.ts";
import { formatDuration } from "../shared/format-units.ts";
import { clockChangeNote, dayLabel, formatRate } from "./wording.ts";

/** A room line before its amount is known: hourly lines are rounded together at the end. */
type DraftLine = Omit<QuoteLine, "amountCents"> & { hourlyMinutes?: number };

interface Pricing {
  card: RateCard;
  currency: string;
  timeZone: string;
}

function billedPhrase(day: StudioDay, billed: number, card: RateCard): string {
  if (billed === day.minutes) return formatDuration(billed);
  return `${formatDuration(billed)} (${formatDuration(day.minutes)} booked; the booking rounds up to the next ${formatDuration(card.billingIncrementMinutes)})`;
}

function cappedDayLines(day: StudioDay, billed: number, { card, currency, timeZone }: Pricing): DraftLine[] {
  const label = dayLabel(day, timeZone);
  const covered = Math.min(billed, card.dayCoversMinutes);
  const beyond = billed - covered;
  const rate = formatRate(card.hourlyRateCents, currency);
  const dayRate = `${formatMoney(card.dayRateCents, currency)}, cheaper than ${formatDuration(covered)} × ${formatMoney(card.hourlyRateCents, currency)} = ${formatMoney(centsForMinutes(covered, card.hourlyRateCents), currency)}`;
  const explanation = beyond === 0
    ? `${label}: ${billedPhrase(day, billed, card)} at the day rate (${dayRate}).${clockChangeNote(day, timeZone)}`
    : `${label}: ${billedPhrase(day, billed, card)} — first ${formatDuration(covered)} at the day rate (${dayRate}), ${formatDuration(beyond)} beyond the day at ${rate}.${clockChangeNote(day, timeZone)}`;
  const lines: DraftLine[] = [
    { kind: "room_day", label: `Day rate — ${label}`, quantity: 1, unit: "day", unitAmountCents: card.dayRateCents, minutes: covered, date: day.date, explanation },
  ];
  if (beyond > 0) {
    lines.push({
      kind: "room_hourly", label: `Room time beyond the day — ${label}`, quantity: beyond, unit: "hour", unitAmountCents: card.hourlyRateCents,
      minutes: beyond, date: day.date, hourlyMinutes: beyond,
      explanation: `${label}: ${formatDuration(beyond)} beyond the ${formatDuration(card.dayCoversMinutes)} the day rate covers, at ${rate}.`,
    });
  }
  return lines;
}

function hourlyDayLine(day: StudioDay, billed: number, { card, currency, timeZone }: Pricing): DraftLine {
  const label = dayLabel(day, timeZone);
  const covered = Math.min(billed, card.dayCoversMinutes);
  const sameAsDay = product(covered, card.hourlyRateCents) === product(60, card.dayRateCents);
  const comparison = billed > card.dayCoversMinutes
    ? `the ${formatMoney(card.dayRateCents, currency)} day rate for ${formatDuration(card.dayCoversMinutes)} is no cheaper`
    : `${sameAsDay ? "the same as" : "cheaper than"} the ${formatMoney(card.dayRateCents, currency)} day rate`;
  return {
    kind: "room_hourly", label: `Room time — ${label}`, quantity: billed, unit: "hour", unitAmountCents: card.hourlyRateCents,
    minutes: billed, date: day.date, hourlyMinutes: billed,
    explanation: `${label}: ${billedPhrase(day, billed, card)} at ${formatRate(card.hourlyRateCents, currency)} (${comparison}).${clockChangeNote(day, timeZone)}`,
  };
}

function topUpLine(time: BillableTime, { card, currency }: Pricing): DraftLine {
  return {
    kind: "minimum_top_up", label: "Minimum booking top-up", quantity: time.topUpMinutes, unit: "hour", unitAmountCents: card.hourlyRateCents,
    minutes: time.topUpMinutes, hourlyMinutes: time.topUpMinutes,
    explanation: `The minimum booking is ${formatDuration(card.minimumBillableMinutes)}: ${formatDuration(time.roundedMinutes)} ${time.roundingMinutes > 0 ? "after rounding" : "booked"}, so ${formatDuration(time.topUpMinutes)} added at ${formatRate(card.hourlyRateCents, currency)}.`,
  };
}

/**
 * Room time, one studio day at a time. The minutes a day covers cost the lower of their hourly
 * price and the day rate; minutes beyond that are hourly. Rounding minutes go to the last day;
 * the minimum gets a line of its own (it never meets the day rate: a validated minimum costs
 * no more than a day). Hourly lines are rounded as a running total, so the room time always
 * costs the rounded exact price however the booking falls across days.
 */
export function roomLines(days: readonly StudioDay[], time: BillableTime, pricing: Pricing): QuoteLine[] {
  const { card } = pricing;
  const drafts = days.flatMap((day, index) => {
    const billed = day.minutes + (index === days.length - 1 ? time.roundingMinutes : 0);
    const covered = Math.min(billed, card.dayCoversMinutes);
    const capped = product(covered, card.hourlyRateCents) > product(60, card.dayRateCents);
    return capped ? cappedDayLines(day, billed, pricing) : [hourlyDayLine(day, billed, pricing)];
  });
  if (time.topUpMinutes > 0) drafts.push(topUpLine(time, pricing));

  const hourlyNumerators = drafts.flatMap((draft) => (draft.hourlyMinutes === undefined ? [] : [product(draft.hourlyMinutes, card.hourlyRateCents)]));
  const hourlyAmounts = roundRunningTotal(hourlyNumerators, 60n);
  let next = 0;
  return drafts.map(({ hourlyMinutes, ...line }) => {
    const amountCents = hourlyMinutes === undefined ? line.unitAmountCents * line.quantity : (hourlyAmounts[next++] ?? 0);
    return { ...line, amountCents };
  });
}
