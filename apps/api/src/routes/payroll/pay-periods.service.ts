import { desc, eq } from "drizzle-orm";
import { alias } from "drizzle-orm/mysql-core";
import { isDuplicateKeyError, payPeriods, timeEntryEdits, user, type Db, type PayPeriodRow } from "@takeup/db";
import { payPeriodContaining, payrollCaution, straddlingWeekNote, type PayPeriodDto, type PayPeriodReviewDto } from "@takeup/domain";
import { conflict, HttpError, notFound } from "../../lib/http-error.ts";
import { writeAudit } from "../../lib/audit.ts";
import type { Actor } from "../../lib/actor.ts";
import { computePeriod, currentPayRates } from "./compute-period.ts";
import { loadPayroll, type PayrollContext } from "./payroll-settings.ts";

const approver = alias(user, "approver");
const locker = alias(user, "locker");

async function ensurePeriod(db: Db, payroll: PayrollContext, at: Date) {
  const p = payPeriodContaining(at, payroll.schedule, payroll.settings);
  try {
    await db.insert(payPeriods).values({ kind: p.kind, startDate: p.startDate, endDate: p.endDate });
  } catch (error) {
    if (!isDuplicateKeyError(error)) throw error;
  }
}

const toDto = (r: { period: PayPeriodRow; approvedByName: string | null; lockedByName: string | null }): PayPeriodDto => ({
  id: r.period.id,
  kind: r.period.kind,
  startDate: r.period.startDate,
  endDate: r.period.endDate,
  status: r.period.status,
  approvedByName: r.approvedByName,
  approvedAt: r.period.approvedAt?.toISOString() ?? null,
  lockedByName: r.lockedByName,
  lockedAt: r.period.lockedAt?.toISOString() ?? null,
});

const select = (db: Db) =>
  db
    .select({ period: payPeriods, approvedByName: approver.name, lockedByName: locker.name })
    .from(payPeriods)
    .leftJoin(approver, eq(approver.id, payPeriods.approvedByUserId))
    .leftJoin(locker, eq(locker.id, payPeriods.lockedByUserId));

/** The current period and the five before it (created on first sight), newest first. */
export async function listPayPeriods(db: Db): Promise<PayPeriodDto[]> {
  const payroll = await loadPayroll(db);
  let at = new Date();
  for (let i = 0; i < 6; i++) {
    await ensurePeriod(db, payroll, at);
    const p = payPeriodContaining(at, payroll.schedule, payroll.settings);
    at = new Date(p.start.getTime() - 3_600_000);
  }
  const rows = await select(db).where(eq(payPeriods.kind, payroll.schedule.kind)).orderBy(desc(payPeriods.startDate)).limit(26);
  return rows.map(toDto);
}

export async function getPeriodRow(db: Db, id: number) {
  const [row] = await db.select().from(payPeriods).where(eq(payPeriods.id, id));
  if (!row) throw notFound("That pay period");
  return row;
}

export async function reviewPayPeriod(db: Db, id: number): Promise<PayPeriodReviewDto> {
  const payroll = await loadPayroll(db);
  const row = await getPeriodRow(db, id);
  const computed = await computePeriod(db, payroll, row);
  const [dto] = (await select(db).where(eq(payPeriods.id, id))).map(toDto);
  const inPeriod = computed.entries.filter((e) => e.startedAt >= computed.period.start.toISOString() && e.startedAt < computed.period.end.toISOString());
  const pending = await db.select().from(timeEntryEdits).where(eq(timeEntryEdits.status, "pending"));
  const flags: PayPeriodReviewDto["flags"] = [];
  for (const e of inPeriod) {
    if (e.flags.includes("open_too_long")) flags.push({ kind: "open_too_long", staffName: e.staffName, entryId: e.id, message: `${e.staffName} has been clocked in since ${e.startedAt} and has not clocked out` });
    else if (e.endedAt === null) flags.push({ kind: "open_too_long", staffName: e.staffName, entryId: e.id, message: `${e.staffName} is still clocked in; the entry is not paid until it is closed` });
    if (e.flags.includes("self_approved")) flags.push({ kind: "self_approved", staffName: e.staffName, entryId: e.id, message: `${e.staffName} approved a correction to their own time (no other owner to ask); check it before approving the period` });
    if (e.flags.includes("missing_break")) flags.push({ kind: "missing_break", staffName: e.staffName, entryId: e.id, message: `${e.staffName} worked ${Math.floor((e.workedMinutes ?? 0) / 60)} h without a recorded break` });
  }
  for (const edit of pending) {
    const name = computed.names.get(edit.staffUserId) ?? "";
    const at = edit.proposed.startedAt;
    if (at >= computed.period.start.toISOString() && at < new Date(computed.period.end.getTime()).toISOString()) {
      flags.push({ kind: "pending_edit", staffName: name, entryId: edit.timeEntryId, message: `${name} has a correction waiting for a decision: “${edit.reason}”` });
    }
  }
  for (const e of computed.unpriced) flags.push({ kind: "no_pay_rate", staffName: e.staffName, entryId: e.id, message: `${e.staffName} has no ${e.payRateCode} pay rate in force; the entry is left out until the owner sets one` });
  const staff = computed.summary.staff.map((s) => {
    const weeks = computed.result.workweeks.filter((w) => w.staffId === s.staffId && s.workweekStarts.includes(w.workweekStart));
    const rateMap = new Map<string, { code: string; centsPerHour: number; minutes: number }>();
    // The minutes paid in this period at each rate: a straddling week's other days are paid elsewhere.
    const { startDate, endDate } = computed.period;
    for (const a of weeks.flatMap((w) => w.allocations).filter((a) => a.workday >= startDate && a.workday <= endDate)) {
      const key = `${a.rateCode}@${a.centsPerHour}`;
      const found = rateMap.get(key) ?? { code: a.rateCode, centsPerHour: a.centsPerHour, minutes: 0 };
      found.minutes += a.minutes;
      rateMap.set(key, found);
    }
    const straddlingWeeks = s.workweeks.flatMap((w) => {
      const note = straddlingWeekNote(w);
      if (note === null) return [];
      const { workweekStart, lastWorkday, begunEarlier, stillOpen, workedMinutes, overtimeMinutes, doubleTimeMinutes, weekOvertimeMinutes, weekDoubleTimeMinutes, overtimePremiumCents, doubleTimePremiumCents } = w;
      return [{ workweekStart, lastWorkday, begunEarlier, stillOpen, workedMinutes, overtimeMinutes, doubleTimeMinutes, weekOvertimeMinutes, weekDoubleTimeMinutes, overtimePremiumCents, doubleTimePremiumCents, note }];
    });
    return {
      staffUserId: s.staffId,
      name: computed.names.get(s.staffId) ?? s.staffId,
      workedMinutes: s.workedMinutes,
      regularMinutes: s.regularMinutes,
      overtimeMinutes: s.overtimeMinutes,
      doubleTimeMinutes: s.doubleTimeMinutes,
      straightTimeCents: s.straightTimeCents,
      overtimePremiumCents: s.overtimePremiumCents,
      doubleTimePremiumCents: s.doubleTimePremiumCents,
      grossCents: s.grossCents,
      // A week still open at the period's end has no regular rate yet: it is shown where the week ends.
      regularRates: weeks.filter((w) => !s.workweeksStillOpen.includes(w.workweekStart)).flatMap((w) => (w.regularRate ? [{ workweekStart: w.workweekStart, centsPerHour: w.regularRate.centsPerHour, weightedAverage: w.regularRate.weightedAverage }] : [])),
      rates: [...rateMap.values()],
      entryCount: s.entryIds.length,
      straddlingWeeks,
    };
  });
  const sum = (k: "workedMinutes" | "regularMinutes" | "overtimeMinutes" | "doubleTimeMinutes" | "grossCents") => staff.reduce((t, s) => t + s[k], 0);
  return {
    period: dto!,
    caution: payrollCaution,
    settings: { punchRounding: payroll.settings.punchRounding, overtimeRules: payroll.settings.overtimeRules, timeZone: payroll.settings.timeZone },
    staff,
    totals: { workedMinutes: sum("workedMinutes"), regularMinutes: sum("regularMinutes"), overtimeMinutes: sum("overtimeMinutes"), doubleTimeMinutes: sum("doubleTimeMinutes"), grossCents: sum("grossCents") },
    flags,
  };
}

type Move = "approve" | "lock" | "reopen" | "unlock";
const moves: Record<Move, { from: PayPeriodRow["status"]; to: PayPeriodRow["status"] }> = {
  approve: { from: "open", to: "approved" },
  lock: { from: "approved", to: "locked" },
  reopen: { from: "approved", to: "open" },
  unlock: { from: "locked", to: "open" },
};

/** open → approved → locked; an approved period can be reopened, a locked one only unlocked by the owner (audited). */
export async function movePayPeriod(db: Db, actor: Actor, id: number, move: Move, reason?: string): Promise<PayPeriodDto> {
  await db.transaction(async (tx) => {
    const [row] = await tx.select().from(payPeriods).where(eq(payPeriods.id, id)).for("update");
    if (!row) throw notFound("That pay period");
    const rule = moves[move];
    if (row.status !== rule.from) throw conflict("invalid_transition", `A pay period that is ${row.status} cannot be ${move === "approve" ? "approved" : move === "lock" ? "locked" : move === "reopen" ? "reopened" : "unlocked"}`);
    if (move === "approve") {
      const payroll = await loadPayroll(tx);
      const pending = await tx.select().from(timeEntryEdits).where(eq(timeEntryEdits.status, "pending"));
      const inPeriod = pending.filter((e) => payPeriodContaining(new Date(e.proposed.startedAt), payroll.schedule, payroll.settings).startDate === row.startDate);
      if (inPeriod.length > 0) throw new HttpError(409, "edits_pending", `Decide the ${inPeriod.length} pending correction${inPeriod.length > 1 ? "s" : ""} in this period before approving it`);
    }
    const now = new Date();
    const changes: Partial<PayPeriodRow> = { status: rule.to };
    if (move === "approve") Object.assign(changes, { approvedByUserId: actor.userId, approvedAt: now });
    if (move === "lock") {
      const payroll = await loadPayroll(tx);
      Object.assign(changes, { lockedByUserId: actor.userId, lockedAt: now, lockedSettings: payroll.settings, lockedPayRates: await currentPayRates(tx) });
    }
    if (move === "unlock" || move === "reopen") Object.assign(changes, { lockedByUserId: null, lockedAt: null, approvedByUserId: null, approvedAt: null, lockedSettings: null, lockedPayRates: null });
    await tx.update(payPeriods).set(changes).where(eq(payPeriods.id, id));
    await writeAudit(tx, actor, `pay_period.${move === "approve" ? "approved" : move === "lock" ? "locked" : move === "reopen" ? "reopened" : "unlocked"}`, { type: "pay_period", id }, {
      before: { status: row.status },
      after: { status: rule.to, ...(reason ? { reason } : {}) },
    });
  });
  const [dto] = (await select(db).where(eq(payPeriods.id, id))).map(toDto);
  return dto!;
}

export const periodFileName = (row: PayPeriodRow, ext: string) => `takeup-payroll-${row.startDate}_${row.endDate}.${ext}`;
