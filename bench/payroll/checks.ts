// Hours must be conserved at every level, or the timings mean nothing: each failed check throws.
import type { OvertimeResult, PayPeriodSummary } from "@takeup/domain";

type Figures = { workedMinutes: number; regularMinutes: number; overtimeMinutes: number; doubleTimeMinutes: number; grossCents: number };

export type PeriodTotals = Figures & {
  staff: number;
  workweeks: number;
  seventhDayWeeks: number;
  entriesComputed: number;
  entriesPaid: number;
  /** Entries cut at a workday boundary (night sessions past midnight). */
  entriesPastMidnight: number;
};

function totalsOf(rows: readonly Figures[]): Figures {
  const total = (pick: (f: Figures) => number) => rows.reduce((s, f) => s + pick(f), 0);
  return {
    workedMinutes: total((f) => f.workedMinutes),
    regularMinutes: total((f) => f.regularMinutes),
    overtimeMinutes: total((f) => f.overtimeMinutes),
    doubleTimeMinutes: total((f) => f.doubleTimeMinutes),
    grossCents: total((f) => f.grossCents),
  };
}

function fail(message: string): never {
  throw new Error(`payroll check failed: ${message}`);
}

export function checkConservation(result: OvertimeResult, summary: PayPeriodSummary): PeriodTotals {
  const allocated = new Map<string, number>();
  const workdays = new Map<string, Set<string>>();
  for (const w of result.workweeks) {
    const where = `${w.staffId}, week of ${w.workweekStart}`;
    if (w.regularMinutes + w.overtimeMinutes + w.doubleTimeMinutes !== w.workedMinutes) fail(`${where}: regular + overtime + double time ≠ worked`);
    if (w.allocations.reduce((s, a) => s + a.minutes, 0) !== w.workedMinutes) fail(`${where}: allocations do not add up to the minutes worked`);
    if (w.days.reduce((s, d) => s + d.workedMinutes, 0) !== w.workedMinutes) fail(`${where}: days do not add up to the week`);
    if (w.straightTimeCents + w.bonusCents + w.overtimePremiumCents + w.doubleTimePremiumCents !== w.grossCents) fail(`${where}: gross pay is not the sum of its parts`);
    for (const a of w.allocations) {
      allocated.set(a.entryId, (allocated.get(a.entryId) ?? 0) + a.minutes);
      const days = workdays.get(a.entryId) ?? new Set<string>();
      days.add(a.workday);
      workdays.set(a.entryId, days);
    }
  }
  for (const t of result.entries) {
    if ((allocated.get(t.entryId) ?? 0) !== t.workedMinutes) fail(`entry ${t.entryId}: its allocations do not add up to its ${t.workedMinutes} minutes`);
  }
  const closing = new Set(summary.staff.flatMap((s) => s.workweekStarts.map((start) => `${s.staffId} ${start}`)));
  const weeks = result.workweeks.filter((w) => closing.has(`${w.staffId} ${w.workweekStart}`));
  const totals = totalsOf(summary.staff);
  const fromWeeks = totalsOf(weeks);
  for (const key of Object.keys(totals) as (keyof typeof totals)[]) {
    if (totals[key] !== fromWeeks[key]) fail(`the period's ${key} (${totals[key]}) is not its workweeks' (${fromWeeks[key]})`);
  }
  for (const s of summary.staff) {
    if (s.regularMinutes + s.overtimeMinutes + s.doubleTimeMinutes !== s.workedMinutes) fail(`${s.staffId}: the period's regular + overtime + double time ≠ worked`);
  }
  const paid = new Set(summary.staff.flatMap((s) => s.entryIds));
  const unpaid = result.entries.filter((t) => t.workedMinutes > 0 && !paid.has(t.entryId));
  if (unpaid.length) fail(`${unpaid.length} entries with time worked are in no workweek of the period (e.g. ${unpaid[0]!.entryId})`);
  return {
    staff: summary.staff.length,
    workweeks: weeks.length,
    seventhDayWeeks: weeks.filter((w) => w.seventhDayRuleApplied).length,
    entriesComputed: result.entries.length,
    entriesPaid: paid.size,
    entriesPastMidnight: [...workdays.values()].filter((d) => d.size > 1).length,
    ...totals,
  };
}

/** Two computations of the same entries under the same rules must agree to the minute and the cent. */
export function checkSameTotals(a: PeriodTotals, b: PeriodTotals, what: string) {
  for (const key of ["staff", "entriesPaid", "workedMinutes", "regularMinutes", "overtimeMinutes", "doubleTimeMinutes", "grossCents"] as const) {
    if (a[key] !== b[key]) fail(`${what}: ${key} ${a[key]} ≠ ${b[key]}`);
  }
}
