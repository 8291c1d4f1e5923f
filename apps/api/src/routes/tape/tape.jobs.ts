import { and, eq, isNotNull, isNull, lt, sql } from "drizzle-orm";
import { isDuplicateKeyError, tapeLowStockAlerts, tapeProducts, type Db } from "@takeup/db";
import { composeEmail } from "../../emails/layout.ts";
import type { Mailer } from "../../lib/mailer.ts";
import { logger } from "../../lib/logger.ts";
import { loadStudio } from "../studio/studio.service.ts";
import { staffRecipients } from "../bookings/recipients.ts";

/**
 * One e-mail to the managers each time a product falls below its reorder point. The product
 * carries when it went low (set on write); the alert row's unique (product, low since) key is
 * the claim, inserted in its own transaction, so two runs or two API processes send it once.
 * Mail goes out after the claim commits. Answers how many crossings it announced.
 */
export async function sendLowStockAlerts(db: Db, mailer: Mailer, now = new Date()): Promise<number> {
  const due = await db
    .select({ id: tapeProducts.id, sku: tapeProducts.sku, name: tapeProducts.name, onHand: tapeProducts.onHand, reorderPoint: tapeProducts.reorderPoint, lowSince: tapeProducts.lowStockSince })
    .from(tapeProducts)
    .leftJoin(tapeLowStockAlerts, and(eq(tapeLowStockAlerts.productId, tapeProducts.id), eq(tapeLowStockAlerts.lowSince, tapeProducts.lowStockSince)))
    .where(and(eq(tapeProducts.active, true), isNotNull(tapeProducts.lowStockSince), lt(tapeProducts.onHand, tapeProducts.reorderPoint), isNull(tapeLowStockAlerts.id), sql`${tapeProducts.lowStockSince} <= ${now}`))
    .limit(200);
  const claimed: typeof due = [];
  for (const product of due) {
    try {
      await db.transaction(async (tx) => {
        await tx.insert(tapeLowStockAlerts).values({ productId: product.id, lowSince: product.lowSince!, onHand: product.onHand, createdAt: now });
      });
      claimed.push(product);
    } catch (error) {
      if (!isDuplicateKeyError(error)) throw error;
    }
  }
  if (claimed.length === 0) return 0;
  const studio = await loadStudio(db);
  const managers = await staffRecipients(db, { roles: ["manager"] });
  for (const product of claimed) {
    for (const r of managers) {
      try {
        await mailer.send(
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
        );
      } catch (error) {
        logger.warn("low-stock e-mail not sent", { to: r.email, product: product.sku, error: error instanceof Error ? error.message : String(error) });
      }
    }
  }
  return claimed.length;
}
