import { and, asc, eq, inArray, sql } from "drizzle-orm";
import { reels, storageCharges } from "@takeup/db";
import { quantityScale } from "@takeup/domain";
import { rowSource, type PricedRow } from "./row-source.ts";

/** Vault storage: each recorded reel-month is one line at the fee recorded with it. */
export const storageSource = rowSource("storage", "Storage charge", async (db, where) => {
  const filter =
    "ids" in where
      ? inArray(storageCharges.id, where.ids.concat(-1))
      : and(eq(storageCharges.clientAccountId, where.clientAccountId), sql`not exists (select 1 from invoiced_sources s where s.source_kind = 'storage' and s.source_id = cast(${storageCharges.id} as char))`);
  const query = db
    .select({ charge: storageCharges, labelId: reels.labelId })
    .from(storageCharges)
    .innerJoin(reels, eq(reels.id, storageCharges.reelId))
    .where(filter)
    .orderBy(asc(storageCharges.month), asc(storageCharges.id));
  const found = "ids" in where ? await query.for("update") : await query;
  return found.map(
    ({ charge, labelId }): PricedRow => ({
      id: charge.id,
      clientAccountId: charge.clientAccountId,
      date: charge.createdAt,
      groupLabel: `Vault storage, ${charge.month}`,
      line: {
        category: "storage",
        description: `Storage of reel ${labelId}, ${charge.month}`,
        explanation: "",
        quantityMilli: quantityScale,
        unit: "month",
        unitPriceMinor: charge.amountCents,
        fixedAmountMinor: charge.amountCents,
      },
    }),
  );
});
