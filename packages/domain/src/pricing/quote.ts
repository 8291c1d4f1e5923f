import { minorUnits } from "../shared/currency.ts";
import { isValidTimeZone } from "../shared/time-zone.ts";
import { billableTime } from "./billable-time.ts";
import { engineerLines } from "./engineer-charges.ts";
import { lockoutLines, lockoutSpan } from "./lockout.ts";
import { premiumLines } from "./premium-charges.ts";
import { PricingError, type PricingProblem } from "./pricing-problem.ts";
import { roomLines } from "./room-charges.ts";
import { studioDays } from "./studio-calendar.ts";
import type { Booking, Quote, RateCard, Studio } from "./types.ts";
import { maxBookingMinutes, validateBooking } from "./validate-booking.ts";
import { validateRateCard } from "./validate-rate-card.ts";

function studioProblems(studio: Studio): PricingProblem[] {
  const problems: PricingProblem[] = [];
  if (!isValidTimeZone(studio.timeZone)) {
    problems.push({ code: "invalid_time_zone", field: "timeZone", message: `${studio.timeZone} is not a time zone in the IANA database.` });
  }
  try {
    minorUnits(studio.currency);
  } catch {
    problems.push({ code: "unknown_currency", field: "currency", message: `${studio.currency} is not a currency we know.` });
  }
  return problems;
}

/**
 * Prices a booking on one rate-card version: room time by studio day (hourly, or the day rate
 * where that is cheaper), the minimum, after-hours and weekend premiums, and engineer time.
 * Pure: the same inputs always give the same quote. Throws PricingError on invalid input.
 */
export function quote(rateCard: RateCard, booking: Booking, studio: Studio): Quote {
  const bookingCheck = validateBooking(booking);
  const cardCheck = validateRateCard(rateCard);
  const problems = [
    ...(bookingCheck.ok ? [] : bookingCheck.problems),
    ...(cardCheck.ok ? [] : cardCheck.problems),
    ...studioProblems(studio),
  ];
  if (!bookingCheck.ok || problems.length > 0) throw new PricingError(problems);

  const { timeZone, currency } = studio;
  if (booking.lockout) return lockoutQuote(rateCard, booking, studio);
  const time = billableTime(bookingCheck.value.elapsedMinutes, rateCard);
  const days = studioDays(booking.startsAt.getTime(), booking.endsAt.getTime(), rateCard.afterHours, timeZone);
  const pricing = { card: rateCard, currency, timeZone };
  const lines = [
    ...roomLines(days, time, pricing),
    ...premiumLines(days, pricing),
    ...engineerLines(booking.engineers, time, rateCard, currency),
  ];
  return {
    rateCardId: rateCard.id,
    rateCardLabel: rateCard.label,
    currency,
    timeZone,
    elapsedMinutes: time.elapsedMinutes,
    billableMinutes: time.billableMinutes,
    lines,
    totalCents: lines.reduce((sum, line) => sum + line.amountCents, 0),
  };
}

/** A lockout: whole studio days, one day's price each (docs/pricing.md, "Lockouts"). */
function lockoutQuote(rateCard: RateCard, booking: Booking, studio: Studio): Quote {
  const { timeZone, currency } = studio;
  const span = lockoutSpan(booking.startsAt, booking.endsAt, timeZone);
  const elapsedMinutes = (span.endsAt.getTime() - span.startsAt.getTime()) / 60_000;
  if (elapsedMinutes > maxBookingMinutes) {
    throw new PricingError([{ code: "max_length", field: "endsAt", message: `A lockout can last at most ${maxBookingMinutes / 1440} studio days.` }]);
  }
  const days = studioDays(span.startsAt.getTime(), span.endsAt.getTime(), rateCard.afterHours, timeZone);
  const lines = lockoutLines(days, booking.engineers, { card: rateCard, currency, timeZone });
  return {
    rateCardId: rateCard.id,
    rateCardLabel: rateCard.label,
    currency,
    timeZone,
    elapsedMinutes,
    billableMinutes: elapsedMinutes,
    lines,
    totalCents: lines.reduce((sum, line) => sum + line.amountCents, 0),
    lockout: true,
  };
}
