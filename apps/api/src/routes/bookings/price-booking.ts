import { inArray } from "drizzle-orm";
import { staffProfiles, type DbOrTx, type RateCardVersion, type Room } from "@takeup/db";
import { basisPointsOf, PricingError, quote, rateCardFromVersion, type Quote, type StudioDto } from "@takeup/domain";
import { HttpError } from "../../lib/http-error.ts";
import { engineerRatesInForce, rateCardInForce } from "../rooms/rate-cards.service.ts";

export type PricedBooking = { version: RateCardVersion; quote: Quote; depositRequiredCents: number };


/**
 * Prices a booking on the rate-card version in force at its start (or on `version`, when the
 * booking already has one: a booking keeps the version it was first quoted on).
 */
export async function priceBooking(
  db: DbOrTx,
  input: { room: Room; startsAt: Date; endsAt: Date; engineerIds: string[]; studio: StudioDto; version?: RateCardVersion; lockout?: boolean },
): Promise<PricedBooking> {
  const version = input.version ?? (await rateCardInForce(db, input.room.id, input.startsAt));
  if (!version) {
    throw new HttpError(422, "no_rate_card", `${input.room.name} has no rate card in force on that date; the owner sets one under Rooms and rates`);
  }
  const engineers = input.engineerIds.length
    ? await db.select().from(staffProfiles).where(inArray(staffProfiles.userId, input.engineerIds))
    : [];
  const unknown = input.engineerIds.filter((id) => !engineers.some((e) => e.userId === id && e.role === "engineer" && e.active));
  if (unknown.length > 0) {
    throw new HttpError(422, "unknown_engineer", "Only active engineers can be assigned", [{ field: "engineerIds", rule: "engineer", message: "Choose active engineers" }]);
  }
  const { rates, missing } = await engineerRatesInForce(db, input.startsAt);
  const grades = engineers.map((e) => e.engineerGrade ?? "engineer");
  const unpriced = missing.filter((g) => grades.includes(g) && engineers.some((e) => (e.engineerGrade ?? "engineer") === g && rates.perEngineerCents?.[e.userId] === undefined));
  if (unpriced.length > 0) {
    throw new HttpError(422, "no_engineer_rate", `No ${unpriced.join(" or ")} rate is set for that date; the owner sets one under Rooms and rates`);
  }
  try {
    const result = quote(
      rateCardFromVersion(input.room.name, version, rates, input.studio.timeZone),
      {
        startsAt: input.startsAt,
        endsAt: input.endsAt,
        engineers: engineers.map((e) => ({ id: e.userId, name: e.displayName, grade: e.engineerGrade ?? "engineer" })),
        lockout: input.lockout ?? false,
      },
      { timeZone: input.studio.timeZone, currency: input.studio.currency },
    );
    return { version, quote: result, depositRequiredCents: basisPointsOf(result.totalCents, input.studio.depositBp) };
  } catch (error) {
    if (error instanceof PricingError) {
      throw new HttpError(
        400,
        "invalid_booking",
        error.problems.map((p) => p.message).join(" "),
        error.problems.map((p) => ({ field: p.field, rule: p.code, message: p.message })),
      );
    }
    throw error;
  }
}
