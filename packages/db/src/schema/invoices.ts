import { char, index, int, json, mysqlEnum, mysqlTable, primaryKey, text, unique, varchar } from "drizzle-orm/mysql-core";
import {
  billingBases,
  invoiceStatuses,
  paymentMethods,
  taxCalculations,
  taxCategories,
  taxRoundings,
  type Discount,
  type TaxRates,
} from "@takeup/domain";
import { createdAt, id, refId, updatedAt, utc } from "./columns.ts";
import { user } from "./auth.ts";
import { clientAccounts } from "./people.ts";
import { bookings } from "./bookings.ts";

export const invoiceKinds = ["standard", "deposit"] as const;
export const paperSizes = ["A4", "LETTER"] as const;

/** The studio's invoicing settings: a single row with id 1, made with the defaults on first read. */
export const invoiceSettings = mysqlTable("invoice_settings", {
  id: int("id").primaryKey(),
  invoicePrefix: varchar("invoice_prefix", { length: 12 }).notNull().default("INV"),
  creditNotePrefix: varchar("credit_note_prefix", { length: 12 }).notNull().default("CR"),
  termsDays: int("terms_days").notNull().default(14),
  depositTermsDays: int("deposit_terms_days").notNull().default(0),
  taxRates: json("tax_rates")
    .$type<TaxRates>()
    .notNull()
    .$defaultFn(() => ({ room: 0, engineer: 0, tape_goods: 0, storage: 0, other: 0 })),
  taxCalculation: mysqlEnum("tax_calculation", taxCalculations).notNull().default("per_line"),
  taxRounding: mysqlEnum("tax_rounding", taxRoundings).notNull().default("half_up"),
  paperSize: mysqlEnum("paper_size", paperSizes).notNull().default("LETTER"),
  billingBasis: mysqlEnum("billing_basis", billingBases).notNull().default("booked"),
  /** Days past due on which a reminder goes out, e.g. [7, 21]. */
  reminderDays: json("reminder_days")
    .$type<number[]>()
    .notNull()
    .$defaultFn(() => [7, 21]),
  taxNumber: varchar("tax_number", { length: 40 }),
  paymentInstructions: text("payment_instructions"),
  updatedAt: updatedAt(),
});

export const invoices = mysqlTable(
  "invoices",
  {
    id: id(),
    kind: mysqlEnum("kind", invoiceKinds).notNull().default("standard"),
    status: mysqlEnum("status", invoiceStatuses).notNull().default("draft"),
    clientAccountId: refId("client_account_id")
      .notNull()
      .references(() => clientAccounts.id),
    /** The booking a deposit invoice asks a deposit for. */
    bookingId: refId("booking_id").references(() => bookings.id),
    /** Number parts, all null until issue: series prefix, year of issue, gapless sequence. */
    series: varchar("series", { length: 12 }),
    year: int("year"),
    sequence: int("sequence"),
    number: varchar("number", { length: 40 }).unique(),
    currency: char("currency", { length: 3 }).notNull(),
    issuedOn: char("issued_on", { length: 10 }),
    dueOn: char("due_on", { length: 10 }),
    issuedAt: utc("issued_at"),
    invoiceDiscount: json("invoice_discount").$type<Discount | null>(),
    subtotalMinor: int("subtotal_minor").notNull().default(0),
    discountMinor: int("discount_minor").notNull().default(0),
    taxMinor: int("tax_minor").notNull().default(0),
    totalMinor: int("total_minor").notNull().default(0),
    /** Paid deposit invoices deducted on this (final) invoice. */
    depositAppliedMinor: int("deposit_applied_minor").notNull().default(0),
    /** Client credit used on this invoice. */
    creditAppliedMinor: int("credit_applied_minor").notNull().default(0),
    paidMinor: int("paid_minor").notNull().default(0),
    creditedMinor: int("credited_minor").notNull().default(0),
    balanceMinor: int("balance_minor").notNull().default(0),
    /** The tax settings the invoice was computed with (copied on issue so later changes leave it alone). */
    taxSettings: json("tax_settings").$type<{ rates: TaxRates; calculation: string; rounding: string }>(),
    notes: text("notes"),
    voidedAt: utc("voided_at"),
    voidReason: varchar("void_reason", { length: 200 }),
    createdByUserId: varchar("created_by_user_id", { length: 36 }).references(() => user.id),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    unique("invoices_series_sequence").on(t.series, t.year, t.sequence),
    index("invoices_client_status").on(t.clientAccountId, t.status),
    index("invoices_status_due").on(t.status, t.dueOn),
    index("invoices_booking").on(t.bookingId),
  ],
);

export const invoiceLines = mysqlTable(
  "invoice_lines",
  {
    id: id(),
    invoiceId: refId("invoice_id")
      .notNull()
      .references(() => invoices.id),
    position: int("position").notNull(),
    sourceKind: varchar("source_kind", { length: 24 }).notNull(),
    /** The billed thing's id within its kind; null for manual lines. */
    sourceId: varchar("source_id", { length: 64 }),
    /** Lines of one session share a group, shown together on the PDF. */
    groupLabel: varchar("group_label", { length: 160 }),
    category: mysqlEnum("category", taxCategories).notNull(),
    description: varchar("description", { length: 300 }).notNull(),
    explanation: varchar("explanation", { length: 500 }),
    quantityMilli: int("quantity_milli").notNull(),
    unit: varchar("unit", { length: 16 }).notNull(),
    unitPriceMinor: int("unit_price_minor").notNull(),
    fixedAmountMinor: int("fixed_amount_minor"),
    discount: json("discount").$type<Discount | null>(),
    amountMinor: int("amount_minor").notNull(),
    discountMinor: int("discount_minor").notNull().default(0),
    netMinor: int("net_minor").notNull(),
    taxRatePpm: int("tax_rate_ppm").notNull().default(0),
    taxMinor: int("tax_minor").notNull().default(0),
  },
  (t) => [index("invoice_lines_invoice").on(t.invoiceId, t.position)],
);

/** Each billable thing on at most one live invoice: the key is taken in the invoicing transaction. */
export const invoicedSources = mysqlTable(
  "invoiced_sources",
  {
    sourceKind: varchar("source_kind", { length: 24 }).notNull(),
    sourceId: varchar("source_id", { length: 64 }).notNull(),
    invoiceId: refId("invoice_id")
      .notNull()
      .references(() => invoices.id),
    createdAt: createdAt(),
  },
  (t) => [primaryKey({ columns: [t.sourceKind, t.sourceId] }), index("invoiced_sources_invoice").on(t.invoiceId)],
);

/** Gapless numbering: the next number is taken under FOR UPDATE on this row in the issuing transaction. */
export const documentCounters = mysqlTable(
  "document_counters",
  {
    series: varchar("series", { length: 12 }).notNull(),
    year: int("year").notNull(),
    lastSequence: int("last_sequence").notNull().default(0),
  },
  (t) => [primaryKey({ columns: [t.series, t.year] })],
);

/** Money received against an invoice. Never deleted: a bounced cheque is reversed with a reason. */
export const invoicePayments = mysqlTable(
  "invoice_payments",
  {
    id: id(),
    invoiceId: refId("invoice_id")
      .notNull()
      .references(() => invoices.id),
    method: mysqlEnum("method", paymentMethods).notNull(),
    reference: varchar("reference", { length: 80 }),
    receivedOn: char("received_on", { length: 10 }).notNull(),
    amountMinor: int("amount_minor").notNull(),
    /** The part that settled the invoice; the rest became a client credit. */
    appliedMinor: int("applied_minor").notNull(),
    creditMinor: int("credit_minor").notNull().default(0),
    reversedAt: utc("reversed_at"),
    reversalReason: varchar("reversal_reason", { length: 200 }),
    recordedByUserId: varchar("recorded_by_user_id", { length: 36 }).references(() => user.id),
    createdAt: createdAt(),
  },
  (t) => [index("invoice_payments_invoice").on(t.invoiceId)],
);

/** A client's credit ledger: overpayments in (positive), credit used on invoices out (negative). */
export const clientCredits = mysqlTable(
  "client_credits",
  {
    id: id(),
    clientAccountId: refId("client_account_id")
      .notNull()
      .references(() => clientAccounts.id),
    amountMinor: int("amount_minor").notNull(),
    paymentId: refId("payment_id").references(() => invoicePayments.id),
    invoiceId: refId("invoice_id").references(() => invoices.id),
    note: varchar("note", { length: 200 }).notNull(),
    createdAt: createdAt(),
  },
  (t) => [index("client_credits_client").on(t.clientAccountId)],
);

export type CreditNoteLine = { invoiceLineId: number; description: string; netMinor: number; taxMinor: number };

/** The only way to correct an issued invoice; its own gapless series. */
export const creditNotes = mysqlTable(
  "credit_notes",
  {
    id: id(),
    invoiceId: refId("invoice_id")
      .notNull()
      .references(() => invoices.id),
    series: varchar("series", { length: 12 }).notNull(),
    year: int("year").notNull(),
    sequence: int("sequence").notNull(),
    number: varchar("number", { length: 40 }).notNull().unique(),
    issuedOn: char("issued_on", { length: 10 }).notNull(),
    reason: varchar("reason", { length: 200 }).notNull(),
    lines: json("lines").$type<CreditNoteLine[]>().notNull(),
    netMinor: int("net_minor").notNull(),
    taxMinor: int("tax_minor").notNull(),
    totalMinor: int("total_minor").notNull(),
    createdByUserId: varchar("created_by_user_id", { length: 36 }).references(() => user.id),
    createdAt: createdAt(),
  },
  (t) => [unique("credit_notes_series_sequence").on(t.series, t.year, t.sequence), index("credit_notes_invoice").on(t.invoiceId)],
);

/** E-mails sent about an invoice, keyed so each step (issue, a receipt, a reminder day) goes once. */
export const invoiceEmails = mysqlTable(
  "invoice_emails",
  {
    id: id(),
    invoiceId: refId("invoice_id")
      .notNull()
      .references(() => invoices.id),
    step: varchar("step", { length: 40 }).notNull(),
    toAddress: varchar("to_address", { length: 254 }).notNull(),
    status: mysqlEnum("status", ["pending", "sending", "sent", "failed"]).notNull().default("pending"),
    createdAt: createdAt(),
    sentAt: utc("sent_at"),
  },
  (t) => [unique("invoice_emails_step").on(t.invoiceId, t.step, t.toAddress)],
);

export type Invoice = typeof invoices.$inferSelect;
export type InvoiceLine = typeof invoiceLines.$inferSelect;
export type InvoiceSettings = typeof invoiceSettings.$inferSelect;
