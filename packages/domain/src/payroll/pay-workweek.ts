import { roundHalfUpDiv } from "../shared/money.ts";
import type { Allocation, RateLine, RegularRate, WorkdayTotals } from "./types.ts";

function unique(values: readonly string[]): string[] {
  return [...new Set(values)];
}

function minutesIn(allocations: readonly Allocation[], category: Allocation["category"]): number {
  return allocations.filter((a) => a.category === category).reduce((s, a) => s + a.minutes, 0);
}

export function categoryTotals(allocations: readonly Allocation[]) {
  const regularMinutes = minutesIn(allocations, "regular");
  const overtimeMinutes = minutesIn(allocations, "overtime");
  const doubleTimeMinutes = minutesIn(allocations, "double_time");
  return {
    workedMinutes: regularMinutes + overtimeMinutes + doubleTimeMinutes,
    regularMinutes,
    overtimeMinutes,
    doubleTimeMinutes,
  };
}

export function dayTotals(allocations: readonly Allocation[]): WorkdayTotals[] {
  const days = unique(allocations.map((a) => a.workday)).sort();
  return days.map((workday) => {
    const ofDay = allocations.filter((a) => a.workday === workday);
    return { workday, ...categoryTotals(ofDay), entryIds: unique(ofDay.map((a) => a.entryId)) };
  });
}

/**
 * Straight-time pay, one line per rate worked. Each line is rounded once, half up, and the
 * regular rate is then built from these paid lines, so anyone can redo it from the payslip.
 */
export function rateLines(allocations: readonly Allocation[]): RateLine[] {
  const keys = unique(allocations.map((a) => `${a.rateCode}\u0000${a.centsPerHour}`));
  return keys.map((key) => {
    const ofRate = allocations.filter((a) => `${a.rateCode}\u0000${a.centsPerHour}` === key);
    const first = ofRate[0];
    const minutes = ofRate.reduce((s, a) => s + a.minutes, 0);
    const centsPerHour = first?.centsPerHour ?? 0;
    return {
      rateCode: first?.rateCode ?? "",
      centsPerHour,
      minutes,
      straightTimeCents: roundHalfUpDiv(BigInt(minutes) * BigInt(centsPerHour), 60n),
      entryIds: unique(ofRate.map((a) => a.entryId)),
    };
  });
}

export interface Premiums {
  regularRate: RegularRate | null;
  overtimePremiumCents: number;
  doubleTimePremiumCents: number;
}

/**
 * Overtime pay on top of straight time (29 CFR 778.107, 778.110, 778.115): each overtime
 * hour earns half the regular rate again, each double-time hour the whole regular rate
 * again, where regular rate = (straight-time pay + bonus) ÷ all hours worked.
 */
export function premiums(input: {
  straightTimeCents: number;
  bonusCents: number;
  workedMinutes: number;
  overtimeMinutes: number;
  doubleTimeMinutes: number;
  distinctRates: number;
  roundRegularRateToCent: boolean;
}): Premiums {
  const { workedMinutes, overtimeMinutes, doubleTimeMinutes } = input;
  if (workedMinutes === 0) return { regularRate: null, overtimePremiumCents: 0, doubleTimePremiumCents: 0 };
  const totalCents = input.straightTimeCents + input.bonusCents;
  const total = BigInt(totalCents);
  const worked = BigInt(workedMinutes);
  const roundedRate = roundHalfUpDiv(total * 60n, worked);
  const regularRate: RegularRate = {
    totalCents,
    workedMinutes,
    centsPerHour: roundedRate,
    premiumBasis: input.roundRegularRateToCent ? "rounded_to_cent" : "exact",
    weightedAverage: input.distinctRates > 1,
  };
  if (input.roundRegularRateToCent) {
    const rate = BigInt(roundedRate);
    return {
      regularRate,
      overtimePremiumCents: roundHalfUpDiv(rate * BigInt(overtimeMinutes), 120n),
      doubleTimePremiumCents: roundHalfUpDiv(rate * BigInt(doubleTimeMinutes), 60n),
    };
  }
  // rate × minutes ÷ 60 with rate = total × 60 ÷ worked: the sixties cancel, nothing rounds early.
  return {
    regularRate,
    overtimePremiumCents: roundHalfUpDiv(total * BigInt(overtimeMinutes), 2n * worked),
    doubleTimePremiumCents: roundHalfUpDiv(total * BigInt(doubleTimeMinutes), worked),
  };
}
