import { rm } from "node:fs/promises";
import { and, asc, desc, eq, inArray } from "drizzle-orm";
import { bookings, clientAccounts, isDuplicateKeyError, projects, tapeMovements, tapeProducts, user, type Db, type DbOrTx, type TapeMovement, type TapeProduct, type Tx } from "@takeup/db";
import {
  issue,
  marginBp,
  receive,
  restock,
  salePriceCents,
  StockError,
  type CreateTapeProductInput,
  type StockState,
  type TapeAdjustmentInput,
  type TapeCountInput,
  type TapeMovementDto,
  type TapeMovementKind,
  type TapeProductDto,
  type TapeReceiptFields,
  type TapeReturnInput,
  type TapeSaleInput,
  type TapeWriteOffInput,
  type UpdateTapeProductInput,
} from "@takeup/domain";
import { HttpError, conflict, notFound } from "../../lib/http-error.ts";
import { writeAudit } from "../../lib/audit.ts";
import type { Actor } from "../../lib/actor.ts";
import type { StoredUpload } from "./receipt-upload.ts";

const productNotFound = () => notFound("That tape product");
const badField = (field: string, rule: string, message: string) => new HttpError(400, "invalid_input", message, [{ field, rule, message }]);

const isLow = (p: Pick<TapeProduct, "onHand" | "reorderPoint">) => p.onHand < p.reorderPoint;

export function toProductDto(p: TapeProduct): TapeProductDto {
  const priceCents = salePriceCents({ mode: p.priceMode, fixedPriceCents: p.fixedPriceCents, markupBp: p.markupBp }, p.averageCostCents);
  return {
    id: p.id,
    sku: p.sku,
    name: p.name,
    widthInches: Number(p.widthInches),
    lengthFt: p.lengthFt,
    reelInches: Number(p.reelInches),
    description: p.description,
    priceMode: p.priceMode,
    fixedPriceCents: p.fixedPriceCents,
    markupBp: p.markupBp,
    taxCategory: p.taxCategory,
    reorderPoint: p.reorderPoint,
    active: p.active,
    onHand: p.onHand,
    valueCents: p.valueCents,
    averageCostCents: p.averageCostCents,
    priceCents,
    marginBp: p.averageCostCents > 0 ? marginBp(priceCents, p.averageCostCents) : null,
    lowStock: isLow(p),
  };
}

export async function listProducts(db: Db): Promise<TapeProductDto[]> {
  const rows = await db.select().from(tapeProducts).orderBy(desc(tapeProducts.active), asc(tapeProducts.sku));
  return rows.map(toProductDto);
}

async function lockProduct(tx: Tx, id: number): Promise<TapeProduct> {
  const [row] = await tx.select().from(tapeProducts).where(eq(tapeProducts.id, id)).for("update");
  if (!row) throw productNotFound();
  return row;
}

const priceFields = ["priceMode", "fixedPriceCents", "markupBp"] as const;

function assertMaySetPrices(actor: Actor, input: UpdateTapeProductInput) {
  const touched = priceFields.filter((f) => input[f] !== undefined);
  if (touched.length > 0 && actor.role !== "owner") {
    throw new HttpError(403, "owner_sets_prices", "Only the owner sets tape prices and markup", touched.map((field) => ({ field, rule: "owner_only", message: "Only the owner sets this" })));
  }
}

function checkPriceRule(mode: TapeProduct["priceMode"], fixed: number | null, markup: number | null) {
  if (mode === "markup" && markup === null) throw badField("markupBp", "required", "Give the markup in basis points for a markup price");
  if (mode === "fixed" && fixed === null && markup !== null) throw badField("fixedPriceCents", "required", "Give the fixed price, or choose a markup price");
}

const skuTaken = (sku: string) => conflict("sku_exists", `Another product already has the SKU ${sku}`);

function productValues(input: UpdateTapeProductInput) {
  return {
    sku: input.sku,
    name: input.name,
    widthInches: input.widthInches === undefined ? undefined : (String(input.widthInches) as TapeProduct["widthInches"]),
    lengthFt: input.lengthFt,
    reelInches: input.reelInches === undefined ? undefined : (String(input.reelInches) as TapeProduct["reelInches"]),
    description: input.description === undefined ? undefined : input.description.trim() || null,
    priceMode: input.priceMode,
    fixedPriceCents: input.fixedPriceCents,
    markupBp: input.markupBp,
    reorderPoint: input.reorderPoint,
    active: input.active,
  };
}

/** Low since now when stock has just dropped below the reorder point; cleared when it is back. */
function lowStockSince(before: TapeProduct | null, after: Pick<TapeProduct, "onHand" | "reorderPoint">, now: Date): Date | null {
  if (!isLow(after)) return null;
  return before?.lowStockSince ?? now;
}

export async function createProduct(db: Db, actor: Actor, input: CreateTapeProductInput): Promise<TapeProductDto> {
  assertMaySetPrices(actor, input);
  const mode = input.priceMode ?? "fixed";
  checkPriceRule(mode, input.fixedPriceCents ?? null, input.markupBp ?? null);
  try {
    return await db.transaction(async (tx) => {
      const values = productValues(input);
      const [created] = await tx
        .insert(tapeProducts)
        .values({
          ...values,
          sku: input.sku,
          name: input.name,
          widthInches: values.widthInches!,
          lengthFt: input.lengthFt,
          reelInches: values.reelInches!,
          priceMode: mode,
          fixedPriceCents: input.fixedPriceCents ?? null,
          markupBp: input.markupBp ?? null,
          lowStockSince: lowStockSince(null, { onHand: 0, reorderPoint: input.reorderPoint ?? 0 }, new Date()),
        })
        .$returningId();
      const after = toProductDto((await tx.select().from(tapeProducts).where(eq(tapeProducts.id, created!.id)))[0]!);
      await writeAudit(tx, actor, "tape_product.created", { type: "tape_product", id: after.id }, { after });
      return after;
    });
  } catch (error) {
    if (isDuplicateKeyError(error)) throw skuTaken(input.sku);
    throw error;
  }
}

export async function updateProduct(db: Db, actor: Actor, id: number, input: UpdateTapeProductInput): Promise<TapeProductDto> {
  assertMaySetPrices(actor, input);
  try {
    return await db.transaction(async (tx) => {
      const before = await lockProduct(tx, id);
      const mode = input.priceMode ?? before.priceMode;
      const fixed = input.fixedPriceCents !== undefined ? input.fixedPriceCents : before.fixedPriceCents;
      const markup = input.markupBp !== undefined ? input.markupBp : before.markupBp;
      checkPriceRule(mode, fixed, markup);
      const values = productValues(input);
      const reorderPoint = input.reorderPoint ?? before.reorderPoint;
      await tx
        .update(tapeProducts)
        .set({ ...values, lowStockSince: lowStockSince(before, { onHand: before.onHand, reorderPoint }, new Date()) })
        .where(eq(tapeProducts.id, id));
      const [row] = await tx.select().from(tapeProducts).where(eq(tapeProducts.id, id));
      const after = toProductDto(row!);
      await writeAudit(tx, actor, "tape_product.updated", { type: "tape_product", id }, { before: toProductDto(before), after });
      return after;
    });
  } catch (error) {
    if (isDuplicateKeyError(error) && input.sku) throw skuTaken(input.sku);
    throw error;
  }
}

// Movements ----------------------------------------------------------------------------------

const movementColumns = {
  m: tapeMovements,
  clientName: clientAccounts.name,
  projectName: projects.name,
  createdBy: user.name,
};

type MovementRow = { m: TapeMovement; clientName: string | null; projectName: string | null; createdBy: string | null };

function toMovementDto(r: MovementRow): TapeMovementDto {
  const m = r.m;
  return {
    id: m.id,
    productId: m.productId,
    kind: m.kind,
    quantity: m.quantity,
    unitCostCents: m.unitCostCents,
    valueChangeCents: m.valueChangeCents,
    costOfGoodsCents: m.costOfGoodsCents,
    unitPriceCents: m.unitPriceCents,
    amountCents: m.amountCents,
    description: m.description,
    clientAccountId: m.clientAccountId,
    clientName: r.clientName,
    projectId: m.projectId,
    projectName: r.projectName,
    bookingId: m.bookingId,
    supplier: m.supplier,
    receivedOn: m.receivedOn,
    receipt: m.receiptStoredName ? { fileName: m.receiptOriginalName ?? "receipt", contentType: m.receiptContentType ?? "application/octet-stream", bytes: m.receiptBytes ?? 0 } : null,
    reason: m.reason,
    onHandAfter: m.onHandAfter,
    averageCostAfterCents: m.averageCostAfterCents,
    createdBy: r.createdBy ?? "",
    createdAt: m.createdAt.toISOString(),
  };
}

function movementQuery(db: DbOrTx) {
  return db
    .select(movementColumns)
    .from(tapeMovements)
    .leftJoin(clientAccounts, eq(clientAccounts.id, tapeMovements.clientAccountId))
    .leftJoin(projects, eq(projects.id, tapeMovements.projectId))
    .leftJoin(user, eq(user.id, tapeMovements.createdByUserId));
}

async function movementDto(db: DbOrTx, id: number) {
  const [row] = await movementQuery(db).where(eq(tapeMovements.id, id));
  return toMovementDto(row!);
}

export async function listMovements(db: Db, productId: number): Promise<TapeMovementDto[]> {
  const [product] = await db.select({ id: tapeProducts.id }).from(tapeProducts).where(eq(tapeProducts.id, productId));
  if (!product) throw productNotFound();
  const rows = await movementQuery(db).where(eq(tapeMovements.productId, productId)).orderBy(desc(tapeMovements.id)).limit(500);
  return rows.map(toMovementDto);
}

type MovementExtras = Partial<Omit<typeof tapeMovements.$inferInsert, "productId" | "kind" | "quantity" | "onHandAfter" | "averageCostAfterCents" | "createdByUserId">> & {
  unitCostCents: number;
  valueChangeCents: number;
  description: string;
};

const stateOf = (p: TapeProduct): StockState => ({ onHand: p.onHand, valueCents: p.valueCents, averageCostCents: p.averageCostCents });

/** Writes one movement and the product's new on hand, value and average, with the audit entry. */
async function record(tx: Tx, actor: Actor, product: TapeProduct, kind: TapeMovementKind, quantity: number, next: StockState, extras: MovementExtras, now: Date) {
  await tx
    .update(tapeProducts)
    .set({ onHand: next.onHand, valueCents: next.valueCents, averageCostCents: next.averageCostCents, lowStockSince: lowStockSince(product, { onHand: next.onHand, reorderPoint: product.reorderPoint }, now) })
    .where(eq(tapeProducts.id, product.id));
  const [created] = await tx
    .insert(tapeMovements)
    .values({ ...extras, productId: product.id, kind, quantity, onHandAfter: next.onHand, averageCostAfterCents: next.averageCostCents, createdByUserId: actor.userId, createdAt: now })
    .$returningId();
  const dto = await movementDto(tx, created!.id);
  await writeAudit(tx, actor, `tape.${kind}`, { type: "tape_movement", id: dto.id }, { before: stateOf(product), after: dto });
  return dto;
}

function stockConflict(error: unknown, product: TapeProduct): never {
  if (error instanceof StockError && error.code === "insufficient_stock") {
    throw new HttpError(409, "insufficient_stock", `${error.message} of ${product.name} (${product.sku})`, [
      { field: "quantity", rule: "at_most_on_hand", message: error.message },
    ]);
  }
  throw error;
}

const label = (p: TapeProduct) => `${p.name} (${p.sku})`.slice(0, 200);

export async function receiveStock(db: Db, actor: Actor, productId: number, fields: TapeReceiptFields, file: StoredUpload): Promise<TapeMovementDto> {
  try {
    return await db.transaction(async (tx) => {
      const product = await lockProduct(tx, productId);
      const next = receive(stateOf(product), fields.quantity, fields.unitCostCents);
      return record(tx, actor, product, "receipt", fields.quantity, next, {
        unitCostCents: fields.unitCostCents,
        valueChangeCents: fields.quantity * fields.unitCostCents,
        description: label(product),
        supplier: fields.supplier,
        receivedOn: fields.receivedOn,
        receiptOriginalName: file.originalName,
        receiptStoredName: file.storedName,
        receiptContentType: file.contentType,
        receiptBytes: file.bytes,
      }, new Date());
    });
  } catch (error) {
    // Nothing was recorded, so the file is nobody's: no orphans on disk.
    await rm(file.fullPath, { force: true });
    throw error;
  }
}

/** The client must exist; a project or booking must be that client's (a booking fills in its project). */
async function checkCustomer(tx: Tx, input: { clientAccountId: number; projectId?: number; bookingId?: number }) {
  const [client] = await tx.select({ id: clientAccounts.id }).from(clientAccounts).where(eq(clientAccounts.id, input.clientAccountId));
  if (!client) throw badField("clientAccountId", "exists", "That client account was not found");
  let projectId = input.projectId ?? null;
  if (projectId !== null) {
    const [project] = await tx.select({ clientAccountId: projects.clientAccountId }).from(projects).where(eq(projects.id, projectId));
    if (!project || project.clientAccountId !== input.clientAccountId) throw badField("projectId", "belongs_to_client", "That project is not one of this client's");
  }
  if (input.bookingId !== undefined) {
    const [booking] = await tx.select({ clientAccountId: bookings.clientAccountId, projectId: bookings.projectId }).from(bookings).where(eq(bookings.id, input.bookingId));
    if (!booking || booking.clientAccountId !== input.clientAccountId) throw badField("bookingId", "belongs_to_client", "That booking is not one of this client's");
    if (projectId !== null && booking.projectId !== null && booking.projectId !== projectId) throw badField("bookingId", "belongs_to_project", "That booking is for another project");
    projectId = projectId ?? booking.projectId;
  }
  return { clientAccountId: input.clientAccountId, projectId, bookingId: input.bookingId ?? null };
}

export async function sellStock(db: Db, actor: Actor, productId: number, input: TapeSaleInput): Promise<TapeMovementDto> {
  return db.transaction(async (tx) => {
    const product = await lockProduct(tx, productId);
    if (!product.active) throw conflict("product_inactive", `${product.name} is no longer sold; reactivate it first`);
    const customer = await checkCustomer(tx, input);
    const unitPriceCents = input.unitPriceCents ?? salePriceCents({ mode: product.priceMode, fixedPriceCents: product.fixedPriceCents, markupBp: product.markupBp }, product.averageCostCents);
    if (unitPriceCents === null) throw conflict("no_price", `${product.name} has no price yet: enter a unit price for this sale`);
    let out: ReturnType<typeof issue>;
    try {
      out = issue(stateOf(product), input.quantity);
    } catch (error) {
      stockConflict(error, product);
    }
    return record(tx, actor, product, "sale", -input.quantity, out.state, {
      ...customer,
      unitCostCents: Math.round(out.costOfGoodsCents / input.quantity),
      valueChangeCents: -out.costOfGoodsCents,
      costOfGoodsCents: out.costOfGoodsCents,
      unitPriceCents,
      amountCents: input.quantity * unitPriceCents,
      description: `Tape: ${label(product)}`.slice(0, 200),
    }, new Date());
  });
}

export async function returnStock(db: Db, actor: Actor, productId: number, input: TapeReturnInput): Promise<TapeMovementDto> {
  return db.transaction(async (tx) => {
    const product = await lockProduct(tx, productId);
    const customer = await checkCustomer(tx, input);
    const back = restock(stateOf(product), input.quantity);
    return record(tx, actor, product, "return", input.quantity, back.state, {
      ...customer,
      unitCostCents: Math.round(back.costCents / input.quantity),
      valueChangeCents: back.costCents,
      description: `Returned: ${label(product)}`.slice(0, 200),
      reason: input.reason ?? null,
    }, new Date());
  });
}

async function adjustLocked(tx: Tx, actor: Actor, product: TapeProduct, quantity: number, reason: string, kind: "adjustment" | "write_off", now: Date) {
  if (quantity > 0) {
    const back = restock(stateOf(product), quantity);
    return record(tx, actor, product, kind, quantity, back.state, { unitCostCents: Math.round(back.costCents / quantity), valueChangeCents: back.costCents, description: label(product), reason }, now);
  }
  let out: ReturnType<typeof issue>;
  try {
    out = issue(stateOf(product), -quantity);
  } catch (error) {
    stockConflict(error, product);
  }
  return record(tx, actor, product, kind, quantity, out.state, { unitCostCents: Math.round(out.costOfGoodsCents / -quantity), valueChangeCents: -out.costOfGoodsCents, description: label(product), reason }, now);
}

export async function adjustStock(db: Db, actor: Actor, productId: number, input: TapeAdjustmentInput) {
  return db.transaction(async (tx) => adjustLocked(tx, actor, await lockProduct(tx, productId), input.quantity, input.reason, "adjustment", new Date()));
}

export async function writeOffStock(db: Db, actor: Actor, productId: number, input: TapeWriteOffInput) {
  return db.transaction(async (tx) => adjustLocked(tx, actor, await lockProduct(tx, productId), -input.quantity, input.reason, "write_off", new Date()));
}

/** A count sheet: every product counted is locked (in id order), then one adjustment per difference. */
export async function postCount(db: Db, actor: Actor, input: TapeCountInput) {
  const ids = input.lines.map((l) => l.productId);
  const duplicate = ids.findIndex((id, i) => ids.indexOf(id) !== i);
  if (duplicate >= 0) throw badField(`lines.${duplicate}.productId`, "unique", "Each product appears once on a count sheet");
  return db.transaction(async (tx) => {
    const locked = await tx.select().from(tapeProducts).where(inArray(tapeProducts.id, ids)).orderBy(asc(tapeProducts.id)).for("update");
    const byId = new Map(locked.map((p) => [p.id, p]));
    const missing = input.lines.findIndex((l) => !byId.has(l.productId));
    if (missing >= 0) throw new HttpError(404, "not_found", `Product ${input.lines[missing]!.productId} on line ${missing + 1} was not found`, [{ field: `lines.${missing}.productId`, rule: "exists", message: "No such product" }]);
    const now = new Date();
    const adjustments: TapeMovementDto[] = [];
    for (const line of input.lines) {
      const product = byId.get(line.productId)!;
      const difference = line.counted - product.onHand;
      if (difference === 0) continue;
      adjustments.push(await adjustLocked(tx, actor, product, difference, `Count: ${input.reason}`.slice(0, 500), "adjustment", now));
    }
    return { adjustments };
  });
}

export async function findReceipt(db: Db, movementId: number) {
  const [row] = await db
    .select({ stored: tapeMovements.receiptStoredName, name: tapeMovements.receiptOriginalName, type: tapeMovements.receiptContentType })
    .from(tapeMovements)
    .where(and(eq(tapeMovements.id, movementId), eq(tapeMovements.kind, "receipt")));
  if (!row?.stored) throw notFound("That receipt");
  return { storedName: row.stored, fileName: row.name ?? "receipt", contentType: row.type ?? "application/octet-stream" };
}
