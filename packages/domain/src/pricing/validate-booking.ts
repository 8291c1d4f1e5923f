import type { PricingProblem, Validation } from "./pricing-problem.ts";
import type { Booking } from "./types.ts";

/**
 * Two weeks: the longest lockout we expect to quote in one go. Anything longer is far more
 * likely a mistyped date than a real booking, and the bound keeps a quote's work small.
 */
export const maxBookingMinutes = 14 * 24 * 60;

const minuteMs = 60_000;

function isValidInstant(value: unknown): value is Date {
  return value instanceof Date && Number.isFinite(value.getTime());
}

function engineerProblems(booking: Booking): PricingProblem[] {
  const problems: PricingProblem[] = [];
  const seen = new Set<string>();
  booking.engineers.forEach((engineer, index) => {
    if (seen.has(engineer.id)) {
      // Billing one person twice for the same hours is always a data-entry slip.
      problems.push({ code: "duplicate_engineer", field: `engineers[${index}].id`, message: `${engineer.name} is assigned twice.` });
    }
    seen.add(engineer.id);
    const override = engineer.rateCentsOverride;
    if (override !== undefined && !(Number.isSafeInteger(override) && override >= 0)) {
      problems.push({ code: "invalid_engineer_rate", field: `engineers[${index}].rateCentsOverride`, message: `${engineer.name}'s rate must be a whole, non-negative number of cents per hour.` });
    }
  });
  return problems;
}

/** Checks a booking on its own (no rate card needed); on success gives its elapsed minutes. */
export function validateBooking(booking: Booking): Validation<{ elapsedMinutes: number }> {
  const problems: PricingProblem[] = [];
  const { startsAt, endsAt } = booking;
  if (!isValidInstant(startsAt)) problems.push({ code: "invalid_instant", field: "startsAt", message: "The start is not a valid date and time." });
  if (!isValidInstant(endsAt)) problems.push({ code: "invalid_instant", field: "endsAt", message: "The end is not a valid date and time." });
  problems.push(...engineerProblems(booking));
  if (problems.length > 0) return { ok: false, problems };

  const startMs = startsAt.getTime();
  const endMs = endsAt.getTime();
  // Bookings are made on a minute grid; seconds would only come from a bug upstream.
  if (startMs % minuteMs !== 0 || endMs % minuteMs !== 0) {
    return { ok: false, problems: [{ code: "not_whole_minutes", field: "startsAt", message: "A booking starts and ends on whole minutes." }] };
  }
  if (endMs <= startMs) {
    return { ok: false, problems: [{ code: "after_start", field: "endsAt", message: "The end must be after the start" }] };
  }
  const elapsedMinutes = (endMs - startMs) / minuteMs;
  if (elapsedMinutes > maxBookingMinutes) {
    return { ok: false, problems: [{ code: "max_length", field: "endsAt", message: `A booking lasts at most ${maxBookingMinutes / 1440} days; book longer stays as several bookings` }] };
  }
  return { ok: true, value: { elapsedMinutes } };
}
