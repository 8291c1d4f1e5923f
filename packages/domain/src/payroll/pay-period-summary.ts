import type { PayPeriod } from "./pay-periods.ts";
import { addDays } from "./studio-calendar.ts";
import type { WorkweekPay } from "./types.ts";

export interface PayPeriodStaffTotals {
  staffId: string;
  /** The workweeks paid in this period, by their first workday. */
  workweekStarts: string[];
  /** Those of them that began before the period (semi-monthly or unaligned fortnights). */
  workweeksBegunEarlier: string[];
  workedMinutes: number;
  regularMinutes: number;
  overtimeMinutes: number;
  doubleTimeMinutes: number;
  straightTimeCents: number;
  bonusCents: number;
  overtimePremiumCents: number;
  doubleTimePremiumCents: number;
  grossCents: number;
  entryIds: string[];
}

export interface PayPeriodSummary {
  period: PayPeriod;
  staff: PayPeriodStaffTotals[];
}

/**
 * Totals per employee of the workweeks that close in a pay period. Overtime is owed per
 * workweek (29 CFR 778.104) and can only be known once the week ends, so a workweek that
 * straddles two periods is paid whole in the period holding its last workday
 * (778.106 allows overtime to be paid on the next regular payday).
 */
export function summarisePayPeriod(period: PayPeriod, workweeks: readonly WorkweekPay[]): PayPeriodSummary {
  const closing = workweeks.filter((w) => {
    const lastDay = addDays(w.workweekStart, 6);
    return lastDay >= period.startDate && lastDay <= period.endDate;
  });
  const byStaff = new Map<string, WorkweekPay[]>();
  for (const week of closing) {
    const list = byStaff.get(week.staffId) ?? [];
    list.push(week);
    byStaff.set(week.staffId, list);
  }

  const sum = (weeks: readonly WorkweekPay[], pick: (w: WorkweekPay) => number) =>
    weeks.reduce((s, w) => s + pick(w), 0);
  const staff = [...byStaff.entries()]
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))
    .map(([staffId, weeks]): PayPeriodStaffTotals => {
      const ordered = [...weeks].sort((a, b) => (a.workweekStart < b.workweekStart ? -1 : 1));
      return {
        staffId,
        workweekStarts: ordered.map((w) => w.workweekStart),
        workweeksBegunEarlier: ordered.filter((w) => w.workweekStart < period.startDate).map((w) => w.workweekStart),
        workedMinutes: sum(weeks, (w) => w.workedMinutes),
        regularMinutes: sum(weeks, (w) => w.regularMinutes),
        overtimeMinutes: sum(weeks, (w) => w.overtimeMinutes),
        doubleTimeMinutes: sum(weeks, (w) => w.doubleTimeMinutes),
        straightTimeCents: sum(weeks, (w) => w.straightTimeCents),
        bonusCents: sum(weeks, (w) => w.bonusCents),
        overtimePremiumCents: sum(weeks, (w) => w.overtimePremiumCents),
        doubleTimePremiumCents: sum(weeks, (w) => w.doubleTimePremiumCents),
        grossCents: sum(weeks, (w) => w.grossCents),
        entryIds: [...new Set(ordered.flatMap((w) => w.entryIds))],
      };
    });
  return { period, staff };
}
