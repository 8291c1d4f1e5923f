import { roundHalfUpDiv } from "../shared/money.ts";
import type { PayPeriod } from "./pay-periods.ts";
import { addDays } from "./studio-calendar.ts";
import type { Allocation, WorkweekPay } from "./types.ts";

/** One workweek's share of a pay period. */
export interface PeriodWorkweek {
  workweekStart: string;
  /** The week's last workday. */
  lastWorkday: string;
  /** The week began before the period: its overtime, known only now, is paid here. */
  begunEarlier: boolean;
  /** The week is still open at the period's end: its overtime is paid in the period holding its last day. */
  stillOpen: boolean;
  /** Minutes worked on the period's own workdays, by category as the week's rules allocate them. */
  workedMinutes: number;
  regularMinutes: number;
  overtimeMinutes: number;
  doubleTimeMinutes: number;
  /** Straight time for the hours worked in this period (overtime hours at their own rate too). */
  straightTimeCents: number;
  /** The whole week's overtime and double-time minutes, whose premiums are paid where the week ends. */
  weekOvertimeMinutes: number;
  weekDoubleTimeMinutes: number;
  /** Paid here only when the week ends in this period; 0 otherwise. */
  bonusCents: number;
  overtimePremiumCents: number;
  doubleTimePremiumCents: number;
  grossCents: number;
  entryIds: string[];
}

export interface PayPeriodStaffTotals {
  staffId: string;
  /** The workweeks with pay in this period, by their first workday. */
  workweekStarts: string[];
  /** Those of them that began before the period (their overtime is paid here). */
  workweeksBegunEarlier: string[];
  /** Those of them still open at the period's end (their overtime is paid in a later period). */
  workweeksStillOpen: string[];
  workweeks: PeriodWorkweek[];
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

/** Straight time of some allocations: minutes at each rate, one half-up rounding per rate (as the week's rate lines). */
function straightTime(allocations: readonly Allocation[]): number {
  const minutesByRate = new Map<string, { centsPerHour: number; minutes: number }>();
  for (const a of allocations) {
    const key = `${a.rateCode}\u0000${a.centsPerHour}`;
    const line = minutesByRate.get(key) ?? { centsPerHour: a.centsPerHour, minutes: 0 };
    line.minutes += a.minutes;
    minutesByRate.set(key, line);
  }
  return [...minutesByRate.values()].reduce((sum, l) => sum + roundHalfUpDiv(BigInt(l.minutes) * BigInt(l.centsPerHour), 60n), 0);
}

const minutesOf = (allocations: readonly Allocation[], category?: Allocation["category"]) =>
  allocations.filter((a) => category === undefined || a.category === category).reduce((s, a) => s + a.minutes, 0);

function shareOf(period: PayPeriod, week: WorkweekPay): PeriodWorkweek | null {
  const lastWorkday = addDays(week.workweekStart, 6);
  const endsHere = lastWorkday >= period.startDate && lastWorkday <= period.endDate;
  const inPeriod = week.allocations.filter((a) => a.workday >= period.startDate && a.workday <= period.endDate);
  const bonusCents = endsHere ? week.bonusCents : 0;
  const overtimePremiumCents = endsHere ? week.overtimePremiumCents : 0;
  const doubleTimePremiumCents = endsHere ? week.doubleTimePremiumCents : 0;
  if (inPeriod.length === 0 && bonusCents + overtimePremiumCents + doubleTimePremiumCents === 0) return null;
  // The period holding the week's end pays what is left of its straight time, so the parts
  // paid in each period always add up to the week's own (rounded) straight time.
  const straightTimeCents = endsHere
    ? week.straightTimeCents - straightTime(week.allocations.filter((a) => a.workday < period.startDate))
    : straightTime(inPeriod);
  return {
    workweekStart: week.workweekStart,
    lastWorkday,
    begunEarlier: week.workweekStart < period.startDate,
    stillOpen: lastWorkday > period.endDate,
    workedMinutes: minutesOf(inPeriod),
    regularMinutes: minutesOf(inPeriod, "regular"),
    overtimeMinutes: minutesOf(inPeriod, "overtime"),
    doubleTimeMinutes: minutesOf(inPeriod, "double_time"),
    straightTimeCents,
    weekOvertimeMinutes: week.overtimeMinutes,
    weekDoubleTimeMinutes: week.doubleTimeMinutes,
    bonusCents,
    overtimePremiumCents,
    doubleTimePremiumCents,
    grossCents: straightTimeCents + bonusCents + overtimePremiumCents + doubleTimePremiumCents,
    entryIds: [...new Set((endsHere ? week.allocations : inPeriod).map((a) => a.entryId))],
  };
}

/**
 * What each employee is paid in a pay period. Straight time is due for the hours worked in
 * the period, so each hour's straight time is paid in the period it was worked in. Overtime
 * is owed per workweek (29 CFR 778.104) and is only known once the week ends, so the
 * overtime and double-time premiums (and a weekly bonus, which changes the regular rate)
 * are paid in the period holding the week's last workday: 29 CFR 778.106 lets only the
 * overtime wait for that payday.
 */
export function summarisePayPeriod(period: PayPeriod, workweeks: readonly WorkweekPay[]): PayPeriodSummary {
  const byStaff = new Map<string, PeriodWorkweek[]>();
  for (const week of workweeks) {
    const share = shareOf(period, week);
    if (!share) continue;
    const list = byStaff.get(week.staffId) ?? [];
    list.push(share);
    byStaff.set(week.staffId, list);
  }

  const sum = (weeks: readonly PeriodWorkweek[], pick: (w: PeriodWorkweek) => number) => weeks.reduce((s, w) => s + pick(w), 0);
  const staff = [...byStaff.entries()]
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))
    .map(([staffId, weeks]): PayPeriodStaffTotals => {
      const ordered = [...weeks].sort((a, b) => (a.workweekStart < b.workweekStart ? -1 : 1));
      return {
        staffId,
        workweekStarts: ordered.map((w) => w.workweekStart),
        workweeksBegunEarlier: ordered.filter((w) => w.begunEarlier).map((w) => w.workweekStart),
        workweeksStillOpen: ordered.filter((w) => w.stillOpen).map((w) => w.workweekStart),
        workweeks: ordered,
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

const hoursText = (minutes: number) => `${Number((minutes / 60).toFixed(2))} h`;

/**
 * What the review and the export say about a week that straddles the period's edge, or null
 * for a week wholly inside it.
 */
export function straddlingWeekNote(week: PeriodWorkweek): string | null {
  if (week.stillOpen) {
    const known = week.overtimeMinutes + week.doubleTimeMinutes;
    return `The week of ${week.workweekStart} is still open at the period's end (its last day is ${week.lastWorkday}): the straight time worked so far is paid in this period; its overtime${known > 0 ? ` (${hoursText(known)} so far)` : ", if any,"} is paid in the period holding ${week.lastWorkday} (29 CFR 778.106).`;
  }
  if (week.begunEarlier) {
    const premium = week.weekOvertimeMinutes + week.weekDoubleTimeMinutes;
    return `The week of ${week.workweekStart} began in the previous period: ${premium > 0 ? `its overtime premium for ${hoursText(premium)} is paid here` : "it had no overtime"}, with the straight time for the hours worked in this period; its earlier hours were paid in the previous period (29 CFR 778.106).`;
  }
  return null;
}
