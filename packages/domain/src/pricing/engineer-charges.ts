import type { BillableTime } from "./billable-time.ts";
import { centsForMinutes } from "./money-math.ts";
import type { AssignedEngineer, QuoteLine, RateCard } from "./types.ts";
import { formatDuration } from "../shared/format-units.ts";
import { formatRate } from "./wording.ts";

const gradeNames = { engineer: "engineer", assistant: "assistant engineer" } as const;

/** A rate agreed for this booking wins, then the rate card's rate for the person, then the grade's. */
export function engineerRateCents(engineer: AssignedEngineer, card: RateCard): number {
  return engineer.rateCentsOverride ?? card.engineerRates.perEngineerCents?.[engineer.id] ?? card.engineerRates[engineer.grade];
}

/**
 * Each engineer is billed for the booked time rounded up to the increment. The room's minimum
 * is not applied: it pays for the room standing idle around a short session, while the
 * engineer bills the time they work. Engineer time is never capped by the day rate, and
 * premiums belong to the room, not to engineer time.
 */
export function engineerLines(engineers: readonly AssignedEngineer[], time: BillableTime, card: RateCard, currency: string): QuoteLine[] {
  const minutes = time.roundedMinutes;
  const rounding = time.roundingMinutes > 0 ? ` (${formatDuration(time.elapsedMinutes)} booked, rounded up to the next ${formatDuration(card.billingIncrementMinutes)})` : "";
  return engineers.map((engineer) => {
    const rate = engineerRateCents(engineer, card);
    const grade = gradeNames[engineer.grade];
    return {
      kind: "engineer",
      label: `${grade.charAt(0).toUpperCase()}${grade.slice(1)}: ${engineer.name}`,
      quantity: minutes,
      unit: "hour",
      unitAmountCents: rate,
      amountCents: centsForMinutes(minutes, rate),
      minutes,
      engineerId: engineer.id,
      explanation: `${engineer.name} (${grade}): ${formatDuration(minutes)}${rounding} at ${formatRate(rate, currency)}.`,
    };
  });
}
