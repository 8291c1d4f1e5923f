import { formatMoney } from "../shared/currency.ts";
import { localAt, nextDayStart } from "../shared/wall-clock.ts";
import { billableTime } from "./billable-time.ts";
import { engineerLines } from "./engineer-charges.ts";
import { product, roundHalfUpDiv } from "../shared/money.ts";
import { roomLines } from "./room-charges.ts";
import type { StudioDay } from "./studio-calendar.ts";
import type { AssignedEngineer, QuoteLine, RateCard } from "./types.ts";
import { formatDuration, formatPercent } from "../shared/format-units.ts";
import { dayLabel } from "./wording.ts";

/**
 * Lockouts: the room is one client's around the clock, for whole studio days (local days in
 * the studio's zone), each at one day's price. See docs/pricing.md, "Lockouts".
 */

/** The whole studio days a lockout from `startsAt` to `endsAt` covers: from the first day's start to the last day's end. */
export function lockoutSpan(startsAt: Date, endsAt: Date, timeZone: string): { startsAt: Date; endsAt: Date } {
  const first = localAt(startsAt.getTime(), timeZone).startOf("day");
  // The last day is the one holding the last booked minute: a lockout ending at midnight ends that day.
  const last = localAt(endsAt.getTime() - 60_000, timeZone).startOf("day");
  return { startsAt: first.toJSDate(), endsAt: nextDayStart(last).toJSDate() };
}

interface Pricing {
  card: RateCard;
  currency: string;
  timeZone: string;
}

/** What the whole day would cost booked by the hour with the day cap (room time only). */
function hourlyPriceOfDay(day: StudioDay, pricing: Pricing): number {
  const time = billableTime(day.minutes, { ...pricing.card, billingIncrementMinutes: 1, minimumBillableMinutes: 0 });
  return roomLines([day], time, pricing).reduce((sum, line) => sum + line.amountCents, 0);
}

const isWeekend = (day: StudioDay) => day.pieces.some((piece) => piece.weekend);

/**
 * One line per studio day at the lockout day rate (the day rate unless the card sets its own):
 * no hourly time beyond the day, no minimum and no after-hours premium inside a lockout. A
 * day is never charged more than the same whole day booked by the hour with the day cap
 * (only ever the case for a very short day rate on a card with a low hourly rate). Weekend
 * days carry the weekend premium on the day's price when the card says so.
 */
export function lockoutLines(days: readonly StudioDay[], engineers: readonly AssignedEngineer[], pricing: Pricing): QuoteLine[] {
  const { card, currency, timeZone } = pricing;
  const rate = card.lockoutDayRateCents ?? card.dayRateCents;
  const rateName = card.lockoutDayRateCents == null ? "the day rate" : "the lockout day rate";
  const priced = days.map((day) => ({ day, hourly: hourlyPriceOfDay(day, pricing) }));
  const roomDays: QuoteLine[] = priced.map(({ day, hourly }) => {
    const label = dayLabel(day, timeZone);
    const price = Math.min(rate, hourly);
    const basis = price === rate
      ? `at ${rateName}, ${formatMoney(rate, currency)}`
      : `at ${formatMoney(price, currency)}, what the day costs by the hour with the day cap, under ${rateName} of ${formatMoney(rate, currency)}`;
    const weekendNote = isWeekend(day) && card.weekendPremiumBp > 0 && !card.lockoutWeekendPremium ? " No weekend premium on a lockout day (rate card setting)." : "";
    return {
      kind: "room_day",
      label: `Lockout day — ${label}`,
      quantity: 1,
      unit: "day",
      unitAmountCents: price,
      amountCents: price,
      minutes: day.minutes,
      date: day.date,
      explanation: `${label}: lockout, the room is the client's for the whole studio day (${formatDuration(day.minutes)}, midnight to midnight ${timeZone}), ${basis}; no hourly time beyond the day and no after-hours premium inside a lockout.${weekendNote}`,
    };
  });

  const lines = [...roomDays];
  const weekendDays = roomDays.filter((line, index) => isWeekend(priced[index]!.day));
  if (card.lockoutWeekendPremium && card.weekendPremiumBp > 0 && weekendDays.length > 0) {
    const amounts = weekendDays.map((line) => roundHalfUpDiv(product(line.amountCents, card.weekendPremiumBp), 10_000n));
    lines.push({
      kind: "weekend_premium",
      label: `Weekend premium (+${formatPercent(card.weekendPremiumBp)})`,
      quantity: weekendDays.length,
      unit: "day",
      unitAmountCents: roundHalfUpDiv(product(rate, card.weekendPremiumBp), 10_000n),
      amountCents: amounts.reduce((sum, amount) => sum + amount, 0),
      minutes: weekendDays.reduce((sum, line) => sum + line.minutes, 0),
      explanation: `${formatPercent(card.weekendPremiumBp)} of each lockout day's price on a Saturday or Sunday (rate card setting): ${weekendDays.map((line) => line.label.replace("Lockout day — ", "")).join(", ")}.`,
    });
  }

  // Engineers work a day's hours on each lockout day, not around the clock.
  const engineerMinutes = days.length * card.dayCoversMinutes;
  const engineerTime = { elapsedMinutes: engineerMinutes, roundedMinutes: engineerMinutes, billableMinutes: engineerMinutes, roundingMinutes: 0, topUpMinutes: 0 };
  const engineerDays = engineerLines(engineers, engineerTime, card, currency).map((line) => ({
    ...line,
    explanation: `${line.explanation.replace(/\.$/, "")}: ${formatDuration(card.dayCoversMinutes)} (a working day on the rate card) on each of the ${days.length} lockout day${days.length === 1 ? "" : "s"}.`,
  }));
  return [...lines, ...engineerDays];
}
