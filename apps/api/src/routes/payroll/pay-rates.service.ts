import { asc, eq } from "drizzle-orm";
import { isDuplicateKeyError, payPeriods, payRates, staffProfiles, type Db, type DbOrTx, type PayRateRow } from "@takeup/db";
import { addCalendarDays, type CorrectPayRateInput, type CreatePayRateInput, type PayRate, type PayRateDto } from "@takeup/domain";
import { HttpError, notFound } from "../../lib/http-error.ts";
import { writeAudit } from "../../lib/audit.ts";
import type { Actor } from "../../lib/actor.ts";

type LockedPeriod = { startDate: string; endDate: string; rates: PayRate[] };

async function lockedPeriods(db: DbOrTx): Promise<LockedPeriod[]> {
  const rows = await db.select().from(payPeriods).where(eq(payPeriods.status, "locked"));
  return rows.map((r) => ({ startDate: r.startDate, endDate: r.endDate, rates: r.lockedPayRates ?? [] }));
}

/**
 * The first locked period computed with this rate: its snapshot holds the rate, and the rate was in
 * force (until the next one for the same person and code) in a workweek the period pays — which can
 * begin up to six days before the period does (docs/payroll-rules.md).
 */
function lockedPeriodUsing(rate: Pick<PayRateRow, "staffUserId" | "code" | "effectiveFrom">, periods: LockedPeriod[]): LockedPeriod | null {
  for (const p of periods) {
    const same = p.rates.filter((r) => r.staffId === rate.staffUserId && r.rateCode === rate.code);
    if (!same.some((r) => r.effectiveFrom === rate.effectiveFrom)) continue;
    const next = same.map((r) => r.effectiveFrom).filter((d) => d > rate.effectiveFrom).sort()[0];
    const windowStart = addCalendarDays(p.startDate, -6);
    if (rate.effectiveFrom <= p.endDate && (next === undefined || next > windowStart)) return p;
  }
  return null;
}

export async function listPayRates(db: DbOrTx): Promise<PayRateDto[]> {
  const [rows, periods] = await Promise.all([
    db
      .select({ rate: payRates, staffName: staffProfiles.displayName })
      .from(payRates)
      .innerJoin(staffProfiles, eq(staffProfiles.userId, payRates.staffUserId))
      .orderBy(asc(staffProfiles.displayName), asc(payRates.code), asc(payRates.effectiveFrom)),
    lockedPeriods(db),
  ]);
  return rows.map(({ rate, staffName }) => ({
    id: rate.id,
    staffUserId: rate.staffUserId,
    staffName,
    code: rate.code,
    hourlyRateCents: rate.hourlyRateCents,
    effectiveFrom: rate.effectiveFrom,
    usedByLockedPeriod: lockedPeriodUsing(rate, periods) !== null,
  }));
}

const duplicate = (staffName: string, code: string, effectiveFrom: string) =>
  new HttpError(409, "duplicate_pay_rate", `${staffName} already has ${/^[aeiou]/.test(code) ? "an" : "a"} ${code} rate from ${effectiveFrom}; correct that rate instead of adding another`, [
    { field: "effectiveFrom", rule: "unique", message: "One rate per person, code and date" },
  ]);

async function staffName(db: DbOrTx, userId: string) {
  const [staff] = await db.select().from(staffProfiles).where(eq(staffProfiles.userId, userId));
  if (!staff) throw notFound("That member of staff");
  return staff.displayName;
}

export async function createPayRate(db: Db, actor: Actor, body: CreatePayRateInput): Promise<PayRateDto> {
  const id = await db.transaction(async (tx) => {
    const name = await staffName(tx, body.staffUserId);
    try {
      const [created] = await tx.insert(payRates).values({ ...body, createdByUserId: actor.userId }).$returningId();
      await writeAudit(tx, actor, "pay_rate.added", { type: "pay_rate", id: created!.id }, { after: body });
      return created!.id;
    } catch (error) {
      if (isDuplicateKeyError(error)) throw duplicate(name, body.code, body.effectiveFrom);
      throw error;
    }
  });
  return (await listPayRates(db)).find((r) => r.id === id)!;
}

/** Replaces a mistaken amount or date; refused (423) once a locked period was computed with the rate. */
export async function correctPayRate(db: Db, actor: Actor, id: number, body: CorrectPayRateInput): Promise<PayRateDto> {
  await db.transaction(async (tx) => {
    const [rate] = await tx.select().from(payRates).where(eq(payRates.id, id)).for("update");
    if (!rate) throw notFound("That pay rate");
    // A period locked meanwhile keeps its own snapshot of the rates (decision 007), old or new.
    const used = lockedPeriodUsing(rate, await lockedPeriods(tx));
    if (used) {
      throw new HttpError(423, "rate_used_by_locked_period", `The locked pay period ${used.startDate} to ${used.endDate} was computed with this rate; add a new rate from a later date instead`);
    }
    const changes = { hourlyRateCents: body.hourlyRateCents ?? rate.hourlyRateCents, effectiveFrom: body.effectiveFrom ?? rate.effectiveFrom };
    try {
      await tx.update(payRates).set(changes).where(eq(payRates.id, id));
    } catch (error) {
      if (isDuplicateKeyError(error)) throw duplicate(await staffName(tx, rate.staffUserId), rate.code, changes.effectiveFrom);
      throw error;
    }
    await writeAudit(tx, actor, "pay_rate.corrected", { type: "pay_rate", id }, {
      before: { hourlyRateCents: rate.hourlyRateCents, effectiveFrom: rate.effectiveFrom },
      after: { ...changes, reason: body.reason },
    });
  });
  return (await listPayRates(db)).find((r) => r.id === id)!;
}
