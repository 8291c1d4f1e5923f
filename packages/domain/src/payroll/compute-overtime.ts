import { allocateWorkweek } from "./allocate-minutes.ts";
import { assertCents } from "./cents-math.ts";
import { categoryTotals, dayTotals, premiums, rateLines } from "./pay-workweek.ts";
import { rateLookup } from "./pay-rates.ts";
import { splitEntry, type WorkPiece } from "./split-entries.ts";
import { assertCalendar, workweekOfWorkday, workweekStartOf } from "./studio-calendar.ts";
import type {
  EntryTrace,
  OvertimeInput,
  OvertimeResult,
  OvertimeRuleSet,
  PayrollSettings,
  PunchRounding,
  WorkweekPay,
} from "./types.ts";

const roundings: readonly PunchRounding[] = ["none", "5", "6", "15"];
const ruleSets: readonly OvertimeRuleSet[] = ["federal_weekly", "daily_weekly_seventh_day"];

function assertSettings(settings: PayrollSettings): void {
  assertCalendar(settings);
  if (!roundings.includes(settings.punchRounding)) {
    throw new RangeError(`Unknown punch rounding ${String(settings.punchRounding)}`);
  }
  if (!ruleSets.includes(settings.overtimeRules)) {
    throw new RangeError(`Unknown overtime rules ${String(settings.overtimeRules)}`);
  }
}

/** Rounding is applied first, so overlap is judged on the times that will be paid. */
function assertNoOverlap(traces: readonly EntryTrace[]): void {
  const byStaff = new Map<string, EntryTrace[]>();
  for (const t of traces) {
    if (t.roundedEnd <= t.roundedStart) continue;
    const list = byStaff.get(t.staffId) ?? [];
    list.push(t);
    byStaff.set(t.staffId, list);
  }
  for (const list of byStaff.values()) {
    list.sort((a, b) => a.roundedStart.getTime() - b.roundedStart.getTime());
    list.forEach((t, i) => {
      const before = list[i - 1];
      if (before && t.roundedStart < before.roundedEnd) {
        throw new RangeError(`Entries ${before.entryId} and ${t.entryId} overlap; one hour cannot be paid twice`);
      }
    });
  }
}

const keyOf = (staffId: string, workweekStart: string) => `${staffId}\u0000${workweekStart}`;

/**
 * Regular, overtime and double-time minutes and gross pay per employee and workweek.
 * Pure: every figure is traceable through `allocations` to the entries it came from.
 * The rules are studio settings; local law and a licensed payroll provider decide.
 */
export function computeOvertime(input: OvertimeInput): OvertimeResult {
  const { settings } = input;
  assertSettings(settings);
  const rateOf = rateLookup(input.payRates);

  const seenIds = new Set<string>();
  const traces: EntryTrace[] = [];
  const weeks = new Map<string, { staffId: string; workweekStart: string; pieces: WorkPiece[]; bonusCents: number }>();
  const weekFor = (staffId: string, workday: string) => {
    const workweekStart = workweekStartOf(workday, settings);
    const key = keyOf(staffId, workweekStart);
    const week = weeks.get(key) ?? { staffId, workweekStart, pieces: [], bonusCents: 0 };
    weeks.set(key, week);
    return week;
  };

  for (const entry of input.entries) {
    if (seenIds.has(entry.id)) throw new RangeError(`Entry id ${entry.id} appears twice`);
    seenIds.add(entry.id);
    const { trace, pieces } = splitEntry(entry, settings, rateOf);
    traces.push(trace);
    for (const piece of pieces) {
      if (!Number.isInteger(piece.minutes)) {
        throw new RangeError(`${settings.timeZone} has an offset that is not whole minutes`);
      }
      weekFor(piece.staffId, piece.workday).pieces.push(piece);
    }
  }
  assertNoOverlap(traces);

  for (const bonus of input.bonuses ?? []) {
    assertCents(bonus.cents, `Bonus for ${bonus.staffId}`);
    weekFor(bonus.staffId, bonus.workday).bonusCents += bonus.cents;
  }

  const workweeks: WorkweekPay[] = [...weeks.values()].map((week) => {
    const pieces = [...week.pieces].sort((a, b) => a.start.getTime() - b.start.getTime());
    const { allocations, seventhDayRuleApplied } = allocateWorkweek(pieces, week.workweekStart, settings.overtimeRules);
    const totals = categoryTotals(allocations);
    const lines = rateLines(allocations);
    const straightTimeCents = lines.reduce((s, l) => s + l.straightTimeCents, 0);
    const pay = premiums({
      straightTimeCents,
      bonusCents: week.bonusCents,
      ...totals,
      distinctRates: new Set(lines.map((l) => l.centsPerHour)).size,
      roundRegularRateToCent: settings.roundRegularRateToCent ?? false,
    });
    const { start, end } = workweekOfWorkday(week.workweekStart, settings);
    return {
      staffId: week.staffId,
      workweekStart: week.workweekStart,
      start,
      end,
      ...totals,
      seventhDayRuleApplied,
      days: dayTotals(allocations),
      allocations,
      rateLines: lines,
      straightTimeCents,
      bonusCents: week.bonusCents,
      ...pay,
      grossCents: straightTimeCents + week.bonusCents + pay.overtimePremiumCents + pay.doubleTimePremiumCents,
      entryIds: [...new Set(allocations.map((a) => a.entryId))],
    };
  });
  // Code-unit order, not locale order, so the same input always lists in the same order.
  const order = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);
  workweeks.sort((a, b) => order(a.staffId, b.staffId) || order(a.workweekStart, b.workweekStart));
  return { entries: traces, workweeks };
}
