import { and, asc, eq, inArray, sql } from "drizzle-orm";
import { tapeMovements, tapeProducts } from "@takeup/db";
import { quantityScale } from "@takeup/domain";
import { rowSource, type PricedRow } from "./row-source.ts";

/** Tape sold to a client: each sale movement is one line at the price and amount recorded with it. */
export const tapeSaleSource = rowSource("tape_sale", "Tape sale", async (db, where) => {
  const filter =
    "ids" in where
      ? inArray(tapeMovements.id, where.ids.concat(-1))
      : and(eq(tapeMovements.clientAccountId, where.clientAccountId), sql`not exists (select 1 from invoiced_sources s where s.source_kind = 'tape_sale' and s.source_id = cast(${tapeMovements.id} as char))`);
  const query = db
    .select({ movement: tapeMovements, sku: tapeProducts.sku })
    .from(tapeMovements)
    .innerJoin(tapeProducts, eq(tapeProducts.id, tapeMovements.productId))
    .where(and(eq(tapeMovements.kind, "sale"), filter))
    .orderBy(asc(tapeMovements.id));
  const found = "ids" in where ? await query.for("update") : await query;
  return found.map(({ movement, sku }): PricedRow => {
    const reels = Math.abs(movement.quantity);
    return {
      id: movement.id,
      clientAccountId: movement.clientAccountId ?? 0,
      date: movement.createdAt,
      groupLabel: `Tape: ${movement.description}`,
      line: {
        category: "tape_goods",
        description: `${movement.description} (${sku})`,
        explanation: "",
        quantityMilli: reels * quantityScale,
        unit: "reel",
        unitPriceMinor: movement.unitPriceCents ?? 0,
        fixedAmountMinor: movement.amountCents ?? 0,
      },
    };
  });
});
