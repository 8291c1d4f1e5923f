import { and, asc, desc, eq } from "drizzle-orm";
import { engineerRates, isDuplicateKeyError, staffProfiles } from "@takeup/db";
import { engineerRateRoutes } from "@takeup/domain";
import { ApiRouter } from "../../lib/api-router.ts";
import { HttpError, notFound } from "../../lib/http-error.ts";
import { writeAudit } from "../../lib/audit.ts";
import type { Deps } from "../../deps.ts";

const duplicate = (effectiveFrom: Date) =>
  new HttpError(409, "duplicate_engineer_rate", `There is already a rate for this grade or engineer from ${effectiveFrom.toISOString()}; correct that rate instead of adding another`, [
    { field: "effectiveFrom", rule: "unique", message: "One rate per grade (or engineer) and start" },
  ]);

/** Runs an insert or update, answering 409 when the unique (grade, engineer, start) key refuses it. */
async function uniqueRate<T>(effectiveFrom: Date, write: () => Promise<T>): Promise<T> {
  try {
    return await write();
  } catch (error) {
    if (isDuplicateKeyError(error)) throw duplicate(effectiveFrom);
    throw error;
  }
}

export function engineerRatesRouter({ db }: Deps) {
  const list = async () => {
    const rows = await db
      .select({ rate: engineerRates, staffName: staffProfiles.displayName })
      .from(engineerRates)
      .leftJoin(staffProfiles, eq(staffProfiles.userId, engineerRates.staffUserId))
      .orderBy(desc(engineerRates.effectiveFrom), desc(engineerRates.id));
    return rows.map(({ rate, staffName }) => ({
      id: rate.id,
      grade: rate.grade,
      staffUserId: rate.staffUserId,
      staffName: staffName ?? null,
      hourlyRateCents: rate.hourlyRateCents,
      effectiveFrom: rate.effectiveFrom.toISOString(),
    }));
  };
  return new ApiRouter("/api/engineer-rates", "Rooms and rates")
    .handle(engineerRateRoutes.list, list)
    .handle(engineerRateRoutes.create, async ({ actor, body }) => {
      const id = await db.transaction(async (tx) => {
        if (body.staffUserId) {
          const [staff] = await tx.select().from(staffProfiles).where(and(eq(staffProfiles.userId, body.staffUserId), eq(staffProfiles.role, "engineer")));
          if (!staff) throw new HttpError(422, "not_an_engineer", "That person is not an engineer", [{ field: "staffUserId", rule: "engineer", message: "Choose an engineer" }]);
        }
        const values = {
          grade: body.grade,
          staffUserId: body.staffUserId ?? null,
          hourlyRateCents: body.hourlyRateCents,
          effectiveFrom: body.effectiveFrom ? new Date(body.effectiveFrom) : new Date(),
          createdByUserId: actor.userId,
        };
        const [created] = await uniqueRate(values.effectiveFrom, () => tx.insert(engineerRates).values(values).$returningId());
        await writeAudit(tx, actor, "engineer_rate.added", { type: "engineer_rate", id: created!.id }, { after: values });
        return created!.id;
      });
      return (await list()).find((r) => r.id === id)!;
    })
    .handle(engineerRateRoutes.correct, async ({ actor, params, body }) => {
      await db.transaction(async (tx) => {
        const [rate] = await tx.select().from(engineerRates).where(eq(engineerRates.id, params.id)).for("update");
        if (!rate) throw notFound("That engineer rate");
        const changes = { hourlyRateCents: body.hourlyRateCents ?? rate.hourlyRateCents, effectiveFrom: body.effectiveFrom ? new Date(body.effectiveFrom) : rate.effectiveFrom };
        await uniqueRate(changes.effectiveFrom, () => tx.update(engineerRates).set(changes).where(eq(engineerRates.id, params.id)));
        await writeAudit(tx, actor, "engineer_rate.corrected", { type: "engineer_rate", id: params.id }, {
          before: { hourlyRateCents: rate.hourlyRateCents, effectiveFrom: rate.effectiveFrom },
          after: { ...changes, reason: body.reason },
        });
      });
      return (await list()).find((r) => r.id === params.id)!;
    });
}

export function engineersRouter({ db }: Deps) {
  return new ApiRouter("/api/engineers", "Rooms and rates").handle(engineerRateRoutes.engineers, async () => {
    const rows = await db
      .select()
      .from(staffProfiles)
      .where(and(eq(staffProfiles.role, "engineer"), eq(staffProfiles.active, true)))
      .orderBy(asc(staffProfiles.displayName));
    return rows.map((r) => ({ userId: r.userId, name: r.displayName, grade: r.engineerGrade ?? "engineer" }));
  });
}
