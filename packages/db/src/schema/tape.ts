import { bigint, boolean, date, index, int, mysqlEnum, mysqlTable, text, unique, varchar } from "drizzle-orm/mysql-core";
import { createdAt, id, refId, updatedAt, utc } from "./columns.ts";
import { user } from "./auth.ts";
import { clientAccounts } from "./people.ts";
import { bookings, projects } from "./bookings.ts";
import { priceModes, reelSizes, tapeMovementKinds, tapeTaxCategories, tapeWidths } from "@takeup/domain";

/**
 * A tape product the studio stocks and sells. On hand, stock value and average cost are kept
 * current by every movement (in the movement's transaction), so the stock screen never sums history.
 */
export const tapeProducts = mysqlTable("tape_products", {
  id: id(),
  sku: varchar("sku", { length: 40 }).notNull().unique(),
  name: varchar("name", { length: 120 }).notNull(),
  widthInches: mysqlEnum("width_inches", tapeWidths).notNull(),
  lengthFt: int("length_ft", { unsigned: true }).notNull(),
  reelInches: mysqlEnum("reel_inches", reelSizes).notNull(),
  description: text("description"),
  priceMode: mysqlEnum("price_mode", priceModes).notNull(),
  fixedPriceCents: int("fixed_price_cents", { unsigned: true }),
  markupBp: int("markup_bp", { unsigned: true }),
  taxCategory: mysqlEnum("tax_category", tapeTaxCategories).notNull().default("goods"),
  reorderPoint: int("reorder_point", { unsigned: true }).notNull().default(0),
  active: boolean("active").notNull().default(true),
  onHand: int("on_hand", { unsigned: true }).notNull().default(0),
  valueCents: bigint("value_cents", { mode: "number", unsigned: true }).notNull().default(0),
  averageCostCents: int("average_cost_cents", { unsigned: true }).notNull().default(0),
  /** Set when on hand fell below the reorder point, cleared when it is back: one alert per crossing. */
  lowStockSince: utc("low_stock_since"),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
});

/** Every change to stock, never edited or deleted: a wrong one is reversed by another. */
export const tapeMovements = mysqlTable(
  "tape_movements",
  {
    id: id(),
    productId: refId("product_id")
      .notNull()
      .references(() => tapeProducts.id),
    kind: mysqlEnum("kind", tapeMovementKinds).notNull(),
    /** Signed: receipts and returns add, sales and write-offs take away; adjustments either. */
    quantity: int("quantity").notNull(),
    /** Receipts: the supplier's unit cost; otherwise the average the stock moved at (rounded). */
    unitCostCents: int("unit_cost_cents", { unsigned: true }).notNull(),
    /** Signed change to the stock's value. */
    valueChangeCents: bigint("value_change_cents", { mode: "number" }).notNull(),
    costOfGoodsCents: bigint("cost_of_goods_cents", { mode: "number", unsigned: true }),
    unitPriceCents: int("unit_price_cents", { unsigned: true }),
    amountCents: bigint("amount_cents", { mode: "number", unsigned: true }),
    description: varchar("description", { length: 200 }).notNull(),
    clientAccountId: refId("client_account_id").references(() => clientAccounts.id),
    projectId: refId("project_id").references(() => projects.id),
    bookingId: refId("booking_id").references(() => bookings.id),
    supplier: varchar("supplier", { length: 120 }),
    receivedOn: date("received_on", { mode: "string" }),
    receiptOriginalName: varchar("receipt_original_name", { length: 255 }),
    receiptStoredName: varchar("receipt_stored_name", { length: 80 }).unique(),
    receiptContentType: varchar("receipt_content_type", { length: 40 }),
    receiptBytes: int("receipt_bytes", { unsigned: true }),
    reason: varchar("reason", { length: 500 }),
    onHandAfter: int("on_hand_after", { unsigned: true }).notNull(),
    averageCostAfterCents: int("average_cost_after_cents", { unsigned: true }).notNull(),
    createdByUserId: varchar("created_by_user_id", { length: 36 })
      .notNull()
      .references(() => user.id),
    createdAt: createdAt(),
  },
  (t) => [
    index("tape_movements_product_idx").on(t.productId, t.id),
    index("tape_movements_client_idx").on(t.clientAccountId),
    index("tape_movements_kind_idx").on(t.kind, t.createdAt),
  ],
);

/** One row per low-stock crossing whose e-mail a job has claimed: the unique key stops a second send. */
export const tapeLowStockAlerts = mysqlTable(
  "tape_low_stock_alerts",
  {
    id: id(),
    productId: refId("product_id")
      .notNull()
      .references(() => tapeProducts.id),
    lowSince: utc("low_since").notNull(),
    onHand: int("on_hand", { unsigned: true }).notNull(),
    createdAt: createdAt(),
  },
  (t) => [unique("tape_low_stock_alerts_crossing_uq").on(t.productId, t.lowSince)],
);

export type TapeProduct = typeof tapeProducts.$inferSelect;
export type TapeMovement = typeof tapeMovements.$inferSelect;
