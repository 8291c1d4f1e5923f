import { and, asc, desc, eq, lte, sql } from "drizzle-orm";
import { engineerRates, rateCardVersions, rooms, type DbOrTx, type RateCardVersion } from "@takeup/db";
import type { CreateRateCardVersionInput, RateCard, RateCardVersionDto } from "@takeup/domain";
import { rateCardFromVersion, validateRateCard } from "@takeup/domain";
import { HttpError } from "../../lib/http-error.ts";

export const toRateCardDto = ({ createdByUserId: _by, ...v }: RateCardVersion): RateCardVersionDto => ({
  ...v,
  effectiveFrom: v.effectiveFrom.toISOString(),
  createdAt: v.createdAt.toISOString(),
});

/** The version in force at `at`: the latest effective-from not after it (ties: the newer version). */
export async function rateCardInForce(db: DbOrTx, roomId: number, at: Date): Promise<RateCardVersion | null> {
  const [row] = await db
    .select()
    .from(rateCardVersions)
    .where(and(eq(rateCardVersions.roomId, roomId), lte(rateCardVersions.effectiveFrom, at)))
    .orderBy(desc(rateCardVersions.effectiveFrom), desc(rateCardVersions.version))
    .limit(1);
  return row ?? null;
}

export async function listRateCards(db: DbOrTx, roomId: number): Promise<RateCardVersionDto[]> {
  const rows = await db.select().from(rateCardVersions).where(eq(rateCardVersions.roomId, roomId)).orderBy(desc(rateCardVersions.version));
  return rows.map(toRateCardDto);
}

type EngineerRateTable = RateCard["engineerRates"];

/** Engineer rates billed to clients, in force at `at`: per grade, and per engineer where set. */
export async function engineerRatesInForce(db: DbOrTx, at: Date): Promise<{ rates: EngineerRateTable; missing: ("engineer" | "assistant")[] }> {
  const rows = await db
    .select()
    .from(engineerRates)
    .where(lte(engineerRates.effectiveFrom, at))
    .orderBy(asc(engineerRates.effectiveFrom), asc(engineerRates.id));
  const grade: Partial<Record<"engineer" | "assistant", number>> = {};
  const perEngineerCents: Record<string, number> = {};
  // Later rows win: the list is in effective order.
  for (const row of rows) {
    if (row.staffUserId) perEngineerCents[row.staffUserId] = row.hourlyRateCents;
    else grade[row.grade] = row.hourlyRateCents;
  }
  const missing = (["engineer", "assistant"] as const).filter((g) => grade[g] === undefined);
  return { rates: { engineer: grade.engineer ?? 0, assistant: grade.assistant ?? 0, perEngineerCents }, missing };
}

/** Adds a new version (never edits an old one), refusing a card the pricing engine would reject. */
export async function insertRateCardVersion(tx: DbOrTx, roomId: number, input: CreateRateCardVersionInput, createdByUserId: string | null) {
  const [last] = await tx
    .select({ version: sql<number>`coalesce(max(${rateCardVersions.version}), 0)` })
    .from(rateCardVersions)
    .where(eq(rateCardVersions.roomId, roomId));
  const values = {
    roomId,
    version: Number(last?.version ?? 0) + 1,
    effectiveFrom: input.effectiveFrom ? new Date(input.effectiveFrom) : new Date(),
    hourlyRateCents: input.hourlyRateCents,
    dayRateCents: input.dayRateCents,
    dayCoversMinutes: input.dayCoversMinutes,
    minimumBillableMinutes: input.minimumBillableMinutes,
    billingIncrementMinutes: input.billingIncrementMinutes,
    afterHoursStartMinute: input.afterHoursStartMinute,
    afterHoursEndMinute: input.afterHoursEndMinute,
    afterHoursPremiumBp: input.afterHoursPremiumBp,
    weekendPremiumBp: input.weekendPremiumBp,
    lockoutDayRateCents: input.lockoutDayRateCents ?? null,
    lockoutWeekendPremium: input.lockoutWeekendPremium ?? false,
    note: input.note?.trim() || null,
    createdByUserId,
  };
  const check = validateRateCard(rateCardFromVersion("", { ...values, id: 0 }, { engineer: 0, assistant: 0 }, "UTC"));
  if (!check.ok) {
    throw new HttpError(
      422,
      "invalid_rate_card",
      check.problems.map((p) => p.message).join(" "),
      check.problems.map((p) => ({ field: p.field, rule: p.code, message: p.message })),
    );
  }
  const [created] = await tx.insert(rateCardVersions).values(values).$returningId();
  const [row] = await tx.select().from(rateCardVersions).where(eq(rateCardVersions.id, created!.id));
  return row!;
}

export const roomsWithCurrentCard = async (db: DbOrTx) => {
  const now = new Date();
  const list = await db.select().from(rooms).orderBy(asc(rooms.position), asc(rooms.name));
  const versions = await db
    .select()
    .from(rateCardVersions)
    .where(lte(rateCardVersions.effectiveFrom, now))
    .orderBy(asc(rateCardVersions.effectiveFrom), asc(rateCardVersions.version));
  const current = new Map<number, RateCardVersion>();
  for (const v of versions) current.set(v.roomId, v);
  return list.map((room) => ({ room, current: current.get(room.id) ?? null }));
};
