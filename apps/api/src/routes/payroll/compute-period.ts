import { and, asc, gte, lt, isNotNull } from "drizzle-orm";
import { payRates, staffProfiles, timeEntries, type DbOrTx, type PayPeriodRow } from "@takeup/db";
import {
  computeOvertime,
  payPeriodForWorkday,
  summarisePayPeriod,
  workdayOf,
  type OvertimeResult,
  type PayPeriod,
  type PayPeriodSummary,
  type PayRate,
  type TimeEntry,
  type TimeEntryDto,
} from "@takeup/domain";
import { HttpError } from "../../lib/http-error.ts";
import { loadEntryDtos } from "../time-clock/entry-dto.ts";
import type { PayrollContext } from "./payroll-settings.ts";

const day = 86_400_000;

export async function currentPayRates(db: DbOrTx): Promise<PayRate[]> {
  const rows = await db.select().from(payRates).where(isNotNull(payRates.id)).orderBy(asc(payRates.effectiveFrom));
  return rows.map((r) => ({ staffId: r.staffUserId, rateCode: r.code, centsPerHour: r.hourlyRateCents, effectiveFrom: r.effectiveFrom }));
}

export type ComputedPeriod = {
  period: PayPeriod;
  summary: PayPeriodSummary;
  result: OvertimeResult;
  /** Every entry the period's workweeks touch, including open ones (not paid until closed). */
  entries: TimeEntryDto[];
  names: Map<string, string>;
  unpriced: TimeEntryDto[];
};

/**
 * Runs the rules engine over every closed entry of the workweeks the period touches. A
 * workweek straddling two periods pays its straight time in the period each hour was worked
 * in and its overtime in the period holding its last day (29 CFR 778.106, docs/payroll-rules.md).
 */
export async function computePeriod(db: DbOrTx, payroll: PayrollContext, row: PayPeriodRow): Promise<ComputedPeriod> {
  const period = payPeriodForWorkday(row.startDate, payroll.schedule, payroll.settings);
  const from = new Date(period.start.getTime() - 8 * day);
  const entries = await loadEntryDtos(db, and(gte(timeEntries.startedAt, from), lt(timeEntries.startedAt, period.end)), payroll.dto.openEntryLimitHours);
  // A locked period is computed with the settings and rates it was locked with.
  const settings = row.status === "locked" && row.lockedSettings ? row.lockedSettings : payroll.settings;
  const rates = row.status === "locked" && row.lockedPayRates ? row.lockedPayRates : await currentPayRates(db);
  // The earliest date each person's rate code applies from: an entry before it has no rate.
  const firstRateDay = new Map<string, string>();
  for (const r of rates) {
    const key = `${r.staffId}|${r.rateCode}`;
    const known = firstRateDay.get(key);
    if (known === undefined || r.effectiveFrom < known) firstRateDay.set(key, r.effectiveFrom);
  }
  const hasRate = (e: TimeEntryDto) => {
    const from = firstRateDay.get(`${e.staffUserId}|${e.payRateCode}`);
    return from !== undefined && from <= workdayOf(new Date(e.startedAt), settings);
  };
  const closed = entries.filter((e) => e.endedAt !== null);
  const priced: TimeEntryDto[] = [];
  const unpriced: TimeEntryDto[] = [];
  for (const e of closed) (hasRate(e) ? priced : unpriced).push(e);
  const engineInput: TimeEntry[] = priced.map((e) => ({
      id: String(e.id),
      staffId: e.staffUserId,
      start: new Date(e.startedAt),
      end: new Date(e.endedAt!),
      unpaidBreaks: e.breaks.map((b) => ({ start: new Date(b.startedAt), end: new Date(b.endedAt ?? e.endedAt!) })),
      rateCode: e.payRateCode,
    }));
  let result: OvertimeResult;
  try {
    result = computeOvertime({ entries: engineInput, payRates: rates, settings });
  } catch (error) {
    if (error instanceof RangeError) throw new HttpError(422, "payroll_unresolvable", `The period's time cannot be computed: ${error.message}`);
    throw error;
  }
  const summary = summarisePayPeriod(period, result.workweeks);
  const staff = await db.select({ userId: staffProfiles.userId, name: staffProfiles.displayName }).from(staffProfiles);
  return { period, summary, result, entries, names: new Map(staff.map((s) => [s.userId, s.name])), unpriced };
}
