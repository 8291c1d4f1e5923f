import type { PricingProblem, Validation } from "./pricing-problem.ts";
import type { RateCard } from "./types.ts";

const minutesPerDay = 1440;

function isWholeAtLeast(value: number, least: number): boolean {
  return Number.isSafeInteger(value) && value >= least;
}

function problem(field: string, message: string): PricingProblem {
  return { code: "invalid_rate_card", field, message };
}

function amountProblems(card: RateCard): PricingProblem[] {
  const problems: PricingProblem[] = [];
  if (!isWholeAtLeast(card.hourlyRateCents, 1)) problems.push(problem("hourlyRateCents", "The hourly rate must be a whole number of cents above zero."));
  if (!isWholeAtLeast(card.dayRateCents, 1)) problems.push(problem("dayRateCents", "The day rate must be a whole number of cents above zero."));
  if (!isWholeAtLeast(card.afterHoursPremiumBp, 0)) problems.push(problem("afterHoursPremiumBp", "The after-hours premium must be whole basis points, zero or more."));
  if (!isWholeAtLeast(card.weekendPremiumBp, 0)) problems.push(problem("weekendPremiumBp", "The weekend premium must be whole basis points, zero or more."));
  if (card.lockoutDayRateCents != null && !isWholeAtLeast(card.lockoutDayRateCents, 1)) {
    problems.push(problem("lockoutDayRateCents", "The lockout day rate must be a whole number of cents above zero, or left empty to use the day rate."));
  }
  const { engineer, assistant, perEngineerCents = {} } = card.engineerRates;
  if (!isWholeAtLeast(engineer, 0)) problems.push(problem("engineerRates.engineer", "The engineer rate must be whole cents, zero or more."));
  if (!isWholeAtLeast(assistant, 0)) problems.push(problem("engineerRates.assistant", "The assistant rate must be whole cents, zero or more."));
  for (const [id, rate] of Object.entries(perEngineerCents)) {
    if (!isWholeAtLeast(rate, 0)) problems.push(problem(`engineerRates.perEngineerCents.${id}`, "An engineer's rate must be whole cents, zero or more."));
  }
  return problems;
}

function windowProblems(card: RateCard): PricingProblem[] {
  const { startMinute, endMinute } = card.afterHours;
  const inDay = (minute: number) => Number.isSafeInteger(minute) && minute >= 0 && minute <= minutesPerDay;
  return inDay(startMinute) && inDay(endMinute)
    ? []
    : [problem("afterHours", "The after-hours window runs between minutes 0 and 1440 of the local day.")];
}

/**
 * The limits on the minimum and the increment are what keep "a longer booking never costs
 * less" true: a minimum or an increment worth more than the day rate, moved across midnight
 * by a longer booking, could land on a day where it is cheaper (see docs/pricing.md).
 */
function timeProblems(card: RateCard): PricingProblem[] {
  const problems: PricingProblem[] = [];
  const { dayCoversMinutes: day, billingIncrementMinutes: increment, minimumBillableMinutes: minimum } = card;
  if (!(isWholeAtLeast(day, 1) && day <= minutesPerDay)) {
    return [problem("dayCoversMinutes", "A day rate covers between 1 minute and 24 hours.")];
  }
  if (!(isWholeAtLeast(increment, 1) && increment <= day)) {
    problems.push(problem("billingIncrementMinutes", "The billing increment is at least 1 minute and no longer than the day."));
  }
  if (!(isWholeAtLeast(minimum, 0) && minimum <= day)) {
    problems.push(problem("minimumBillableMinutes", "The minimum is zero or more minutes and no longer than the day."));
  } else if (isWholeAtLeast(increment, 1) && minimum % increment !== 0) {
    problems.push(problem("minimumBillableMinutes", "The minimum is a whole number of billing increments."));
  }
  if (problems.length > 0 || amountProblems(card).length > 0) return problems;
  const costsMoreThanDay = (minutes: number) => minutes * card.hourlyRateCents > 60 * card.dayRateCents;
  if (costsMoreThanDay(minimum)) problems.push(problem("minimumBillableMinutes", "The minimum, at the hourly rate, must not cost more than the day rate."));
  if (costsMoreThanDay(increment)) problems.push(problem("billingIncrementMinutes", "One increment, at the hourly rate, must not cost more than the day rate."));
  return problems;
}

export function validateRateCard(card: RateCard): Validation<RateCard> {
  const problems = [...amountProblems(card), ...windowProblems(card), ...timeProblems(card)];
  return problems.length === 0 ? { ok: true, value: card } : { ok: false, problems };
}
