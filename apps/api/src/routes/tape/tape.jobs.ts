import { and, eq, isNotNull, isNull, lt, sql } from "drizzle-orm";
import { isDuplicateKeyError, tapeLowStockAlerts, tapeProducts, type Db } from "@takeup/db";
import { composeEmail } from "../../emails/layout.ts";
import { enqueueEmail } from "../../lib/outbox.ts";
import { loadStudio } from "../studio/studio.service.ts";
import { staffRecipients } from "../bookings/recipients.ts";

/**
 * One e-mail to the managers each time a product falls below its reorder point. The product
 * carries when it went low (set on write); the alert row's unique (product, low since) key is
 * the claim, inserted in its own transaction, so two runs or two API processes send it once.
 * The managers' e-mails are queued in the claim's transaction (decision 017). Answers how many
 * crossings it announced.
 */
export async function queueLowStockAlerts(db: Db, now = new Date()): Promise<number> {
  const due = await db
    .select({ id: tapeProducts.id, sku: tapeProducts.sku, name: tapeProducts.name, onHand: tapeProducts.onHand, reorderPoint: tapeProducts.reorderPoint, lowSince: tapeProducts.lowStockSince })
    .from(tapeProducts)
    .leftJoin(tapeLowStockAlerts, and(eq(tapeLowStockAlerts.productId, tapeProducts.id), eq(tapeLowStockAlerts.lowSince, tapeProducts.lowStockSince)))
    .where(and(eq(tapeProducts.active, true), isNotNull(tapeProducts.lowStockSince), lt(tapeProducts.onHand, tapeProducts.reorderPoint), isNull(tapeLowStockAlerts.id), sql`${tapeProducts.lowStockSince} <= ${now}`))
    .limit(200);
  if (due.length === 0) return 0;
  const studio = await loadStudio(db);
  const managers = await staffRecipients(db, { roles: ["manager"] });
  let claimed = 0;
  for (const product of due) {
    try {
      await db.transaction(async (tx) => {
        await tx.insert(tapeLowStockAlerts).values({ productId: product.id, lowSince: product.lowSince!, onHand: product.onHand, createdAt: now });
        for (const r of managers) {
          await enqueueEmail(
            tx,
            `tape-low-stock:${product.id}:${product.lowSince!.getTime()}:${r.email.toLowerCase()}`,
            composeEmail({
              template: "tape_low_stock",
              to: r.email,
              studioName: studio.name,
              subject: `Low tape stock: ${product.name}`,
              greeting: `Hello ${r.name},`,
              paragraphs: [
                `${product.name} (${product.sku}) is down to ${product.onHand} on hand, below its reorder point of ${product.reorderPoint}.`,
                "You will not hear about it again until stock is back at or above the reorder point and falls below it once more.",
              ],
            }),
            now,
          );
        }
      });
      claimed++;
    } catch (error) {
      if (!isDuplicateKeyError(error)) throw error;
    }
  }
  return claimed;
}
