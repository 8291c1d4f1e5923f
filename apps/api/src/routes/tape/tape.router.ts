import path from "node:path";
import { eq } from "drizzle-orm";
import { equipment, tapeProducts } from "@takeup/db";
import { planTape, salePriceCents, tapeReceiptFields, tapeRoutes, TapePlanError } from "@takeup/domain";
import { ApiRouter } from "../../lib/api-router.ts";
import { HttpError, notFound } from "../../lib/http-error.ts";
import { defaultUploadsDir } from "../../config.ts";
import type { Deps } from "../../deps.ts";
import { receiptUploader } from "./receipt-upload.ts";
import { adjustStock, createProduct, findReceipt, listMovements, listProducts, postCount, receiveStock, returnStock, sellStock, updateProduct, writeOffStock } from "./tape.service.ts";
import { rm } from "node:fs/promises";

export function tapeRouter(deps: Deps) {
  const { db } = deps;
  const uploadsDir = deps.config.uploadsDir ?? defaultUploadsDir();
  const readReceiptForm = receiptUploader(uploadsDir);
  return new ApiRouter("/api/tape", "Tape stock")
    .handle(tapeRoutes.listProducts, () => listProducts(db))
    .handle(tapeRoutes.createProduct, ({ actor, body }) => createProduct(db, actor, body))
    .handle(tapeRoutes.updateProduct, ({ actor, params, body }) => updateProduct(db, actor, params.id, body))
    .handle(tapeRoutes.movements, ({ params }) => listMovements(db, params.id))
    .handle(tapeRoutes.receive, async ({ actor, params, req, res }) => {
      const { fields, file } = await readReceiptForm(req, res);
      const parsed = tapeReceiptFields.safeParse(fields);
      if (!parsed.success || !file) {
        if (file) await rm(file.fullPath, { force: true });
        if (!parsed.success) throw parsed.error;
        throw new HttpError(400, "invalid_input", "Attach the supplier's receipt (PDF, PNG or JPEG)", [{ field: "file", rule: "required", message: "Attach the receipt" }]);
      }
      return receiveStock(db, actor, params.id, parsed.data, file);
    })
    .handle(tapeRoutes.sell, ({ actor, params, body }) => sellStock(db, actor, params.id, body))
    .handle(tapeRoutes.returnStock, ({ actor, params, body }) => returnStock(db, actor, params.id, body))
    .handle(tapeRoutes.adjust, ({ actor, params, body }) => adjustStock(db, actor, params.id, body))
    .handle(tapeRoutes.writeOff, ({ actor, params, body }) => writeOffStock(db, actor, params.id, body))
    .handle(tapeRoutes.count, ({ actor, body }) => postCount(db, actor, body))
    .handle(tapeRoutes.receipt, async ({ params, res }) => {
      const receipt = await findReceipt(db, params.id);
      res.attachment(receipt.fileName);
      res.type(receipt.contentType);
      res.setHeader("cache-control", "private, no-store");
      await new Promise<void>((resolve, reject) => {
        res.sendFile(path.basename(receipt.storedName), { root: uploadsDir, dotfiles: "deny" }, (error) => {
          if (!error) return resolve();
          if (res.headersSent) return resolve();
          reject(notFound("That receipt's file"));
        });
      });
    })
    .handle(tapeRoutes.plan, async ({ body }) => {
      let otherSpeedsIps: number[] | undefined;
      if (body.recorderId !== undefined) {
        const [recorder] = await db.select({ speeds: equipment.speedsIps }).from(equipment).where(eq(equipment.id, body.recorderId));
        if (!recorder) throw new HttpError(400, "invalid_input", "That recorder was not found", [{ field: "recorderId", rule: "exists", message: "No such recorder" }]);
        otherSpeedsIps = recorder.speeds ?? [];
      }
      let unitPriceCents: number | null = null;
      if (body.productId !== undefined) {
        const [product] = await db.select().from(tapeProducts).where(eq(tapeProducts.id, body.productId));
        if (!product) throw new HttpError(400, "invalid_input", "That tape product was not found", [{ field: "productId", rule: "exists", message: "No such product" }]);
        unitPriceCents = salePriceCents({ mode: product.priceMode, fixedPriceCents: product.fixedPriceCents, markupBp: product.markupBp }, product.averageCostCents);
      }
      try {
        const plan = planTape({ ...body, otherSpeedsIps });
        return { ...plan, unitPriceCents, totalPriceCents: unitPriceCents === null ? null : unitPriceCents * plan.reelsNeeded };
      } catch (error) {
        if (error instanceof TapePlanError) throw new HttpError(400, "invalid_input", error.message, [{ field: error.field, rule: "fits_on_reel", message: error.message }]);
        throw error;
      }
    });
}
