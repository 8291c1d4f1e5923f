import { z } from "zod";
import { ageingBuckets } from "../invoicing/ageing.ts";
import { billableSourceKinds, taxCategories } from "../invoicing/categories.ts";
import { billingBases } from "../invoicing/booking-lines.ts";
import { taxCalculations, taxRoundings } from "../invoicing/tax.ts";
import { idParams } from "./common.ts";
import { defineRoute } from "./route.ts";

export const invoiceStatuses = ["draft", "issued", "part_paid", "paid", "void"] as const;
export type InvoiceStatus = (typeof invoiceStatuses)[number];
export const invoiceStatusLabels: Record<InvoiceStatus, string> = { draft: "Draft", issued: "Issued", part_paid: "Part paid", paid: "Paid", void: "Void" };
export const paymentMethods = ["cash", "cheque", "bank_transfer"] as const;
export type PaymentMethod = (typeof paymentMethods)[number];
export const paymentMethodLabels: Record<PaymentMethod, string> = { cash: "Cash", cheque: "Cheque", bank_transfer: "Bank transfer" };

const localDate = z.iso.date("Use a date as YYYY-MM-DD");
const cents = z.number().int("Use whole minor units (cents)").min(0, "Use zero or more").max(1_000_000_000, "Too large");
const positiveCents = z.number().int("Use whole minor units (cents)").min(1, "Use more than zero").max(1_000_000_000, "Too large");

export const discountInput = z.discriminatedUnion("kind", [
  z.strictObject({ kind: z.literal("amount"), amountCents: cents }),
  z.strictObject({ kind: z.literal("percent"), bp: z.number().int("Use whole basis points").min(0, "At least 0%").max(10_000, "At most 100%") }),
]);
export type DiscountInput = z.infer<typeof discountInput>;

export const manualLineInput = z.strictObject({
  description: z.string().trim().min(1, "Describe the line").max(300, "Use at most 300 characters"),
  category: z.enum(taxCategories, "Choose room, engineer, tape_goods, storage or other"),
  quantity: z
    .number()
    .min(0, "Use zero or more")
    .max(100_000, "At most 100,000")
    .refine((q) => Math.abs(q * 1000 - Math.round(q * 1000)) < 1e-6, "Use at most three decimals"),
  unit: z.string().trim().min(1).max(16).optional(),
  unitPriceCents: cents,
  discount: discountInput.nullable().optional(),
});
export type ManualLineInput = z.infer<typeof manualLineInput>;

/** Kinds a draft can name as sources; manual lines come as `manualLines`. */
export const sourceKindsInput = billableSourceKinds.filter((k) => k !== "manual" && k !== "deposit") as ["booking", "tape_sale", "storage"];
export const sourceRef = z.strictObject({
  kind: z.enum(sourceKindsInput, "Choose booking, tape_sale or storage"),
  id: z.union([z.string().trim().min(1).max(64), z.number().int().positive()]).transform(String),
});

export const createInvoiceInput = z.strictObject({
  clientAccountId: z.number().int().positive("Choose a client"),
  sources: z.array(sourceRef).max(200, "At most 200 items on one invoice"),
  manualLines: z.array(manualLineInput).max(100, "At most 100 manual lines").optional(),
  invoiceDiscount: discountInput.nullable().optional(),
  notes: z.string().trim().max(1000, "Use at most 1000 characters").optional(),
});
export type CreateInvoiceInput = z.infer<typeof createInvoiceInput>;

export const updateDraftInput = z.strictObject({
  /** Replace the manual lines. */
  manualLines: z.array(manualLineInput).max(100, "At most 100 manual lines").optional(),
  /** Take these lines (and their sources) off the draft. */
  removeLineIds: z.array(z.number().int().positive()).max(300).optional(),
  /** Set a line's discount (null removes it). */
  lineDiscounts: z.array(z.strictObject({ lineId: z.number().int().positive(), discount: discountInput.nullable() })).max(300).optional(),
  invoiceDiscount: discountInput.nullable().optional(),
  notes: z.string().trim().max(1000, "Use at most 1000 characters").optional(),
});
export type UpdateDraftInput = z.infer<typeof updateDraftInput>;

export const invoicesQuery = z.strictObject({
  status: z.enum(invoiceStatuses, "Choose draft, issued, part_paid, paid or void").optional(),
  clientAccountId: z.coerce.number().int().positive().max(2 ** 53 - 1).optional(),
  from: localDate.optional(),
  to: localDate.optional(),
});

export const recordPaymentInput = z.strictObject({
  method: z.enum(paymentMethods, "Choose cash, cheque or bank_transfer"),
  amountCents: positiveCents,
  receivedOn: localDate,
  reference: z.string().trim().max(80, "Use at most 80 characters").optional(),
  /** Take money beyond the balance as a client credit instead of refusing it. */
  overpaymentToCredit: z.boolean().optional(),
});
export type RecordPaymentInput = z.infer<typeof recordPaymentInput>;

export const reversePaymentInput = z.strictObject({ reason: z.string().trim().min(1, "Give the reason").max(200, "Use at most 200 characters") });
export const voidInvoiceInput = z.strictObject({ reason: z.string().trim().min(1, "Give the reason").max(200, "Use at most 200 characters") });
export const creditNoteInput = z.strictObject({
  reason: z.string().trim().min(1, "Give the reason").max(200, "Use at most 200 characters"),
  /** The lines to credit in full; none means the whole invoice. */
  lineIds: z.array(z.number().int().positive()).max(300).optional(),
});
export type CreditNoteInput = z.infer<typeof creditNoteInput>;

export const ageingQuery = z.strictObject({ asOf: localDate });
export const paymentParams = idParams.extend({ paymentId: z.coerce.number().int().positive().max(2 ** 53 - 1) });

export const invoiceSummaryDto = z.object({
  id: z.number(),
  number: z.string().nullable(),
  kind: z.enum(["standard", "deposit"]),
  clientAccountId: z.number(),
  clientName: z.string(),
  status: z.enum(invoiceStatuses),
  issuedAt: z.string().nullable(),
  dueAt: z.string().nullable(),
  currency: z.string(),
  totalCents: z.number(),
  balanceCents: z.number(),
  daysOverdue: z.number(),
});
export type InvoiceSummaryDto = z.infer<typeof invoiceSummaryDto>;

const discountDto = z.union([z.object({ kind: z.literal("amount"), amountCents: z.number() }), z.object({ kind: z.literal("percent"), bp: z.number() })]);

export const invoiceLineDto = z.object({
  id: z.number(),
  sourceKind: z.string(),
  sourceId: z.string().nullable(),
  groupLabel: z.string().nullable(),
  category: z.enum(taxCategories),
  description: z.string(),
  explanation: z.string().nullable(),
  quantity: z.number(),
  unit: z.string(),
  unitPriceCents: z.number(),
  amountCents: z.number(),
  discount: discountDto.nullable(),
  discountCents: z.number(),
  netCents: z.number(),
  taxRatePpm: z.number(),
  taxCents: z.number(),
});
export type InvoiceLineDto = z.infer<typeof invoiceLineDto>;

export const paymentDto = z.object({
  id: z.number(),
  method: z.enum(paymentMethods),
  reference: z.string().nullable(),
  receivedOn: z.string(),
  amountCents: z.number(),
  appliedCents: z.number(),
  creditCents: z.number(),
  reversedAt: z.string().nullable(),
  reversalReason: z.string().nullable(),
});
export type PaymentDto = z.infer<typeof paymentDto>;

export const creditNoteDto = z.object({
  id: z.number(),
  number: z.string(),
  issuedOn: z.string(),
  reason: z.string(),
  totalCents: z.number(),
  taxCents: z.number(),
  lines: z.array(z.object({ invoiceLineId: z.number(), description: z.string(), netMinor: z.number(), taxMinor: z.number() })),
});
export type CreditNoteDto = z.infer<typeof creditNoteDto>;

export const invoiceEmailDto = z.object({ step: z.string(), toAddress: z.string(), status: z.string(), sentAt: z.string().nullable() });

export const invoiceDetailDto = invoiceSummaryDto.extend({
  bookingId: z.number().nullable(),
  subtotalCents: z.number(),
  discountCents: z.number(),
  taxCents: z.number(),
  taxRows: z.array(z.object({ category: z.enum(taxCategories), ratePpm: z.number(), netCents: z.number(), taxCents: z.number() })),
  depositAppliedCents: z.number(),
  creditAppliedCents: z.number(),
  paidCents: z.number(),
  creditedCents: z.number(),
  invoiceDiscount: discountDto.nullable(),
  notes: z.string().nullable(),
  voidReason: z.string().nullable(),
  lines: z.array(invoiceLineDto),
  payments: z.array(paymentDto),
  creditNotes: z.array(creditNoteDto),
  emails: z.array(invoiceEmailDto),
});
export type InvoiceDetailDto = z.infer<typeof invoiceDetailDto>;

export const billableItemDto = z.object({
  kind: z.enum(billableSourceKinds),
  id: z.string(),
  date: z.string(),
  description: z.string(),
  amountCents: z.number(),
  lines: z.array(z.object({ description: z.string(), explanation: z.string(), category: z.enum(taxCategories), amountCents: z.number() })),
});
export type BillableItemDto = z.infer<typeof billableItemDto>;

export const ageingDto = z.object({
  asOf: z.string(),
  currency: z.string(),
  totals: z.record(z.enum([...ageingBuckets, "totalMinor"]), z.number()),
  invoices: z.array(invoiceSummaryDto.extend({ bucket: z.enum(ageingBuckets) })),
});
export type AgeingDto = z.infer<typeof ageingDto>;

export const invoiceSettingsDto = z.object({
  invoicePrefix: z.string(),
  creditNotePrefix: z.string(),
  termsDays: z.number(),
  depositTermsDays: z.number(),
  taxRates: z.record(z.enum(taxCategories), z.number()),
  taxCalculation: z.enum(taxCalculations),
  taxRounding: z.enum(taxRoundings),
  paperSize: z.enum(["A4", "LETTER"]),
  billingBasis: z.enum(billingBases),
  reminderDays: z.array(z.number()),
  taxNumber: z.string().nullable(),
  paymentInstructions: z.string().nullable(),
});
export type InvoiceSettingsDto = z.infer<typeof invoiceSettingsDto>;

const prefix = z.string().trim().regex(/^[A-Z0-9]{1,8}$/, "Use 1–8 capital letters or digits");
const ratePpm = z.number().int("Use whole parts per million").min(0, "Use zero or more").max(500_000, "At most 50%");
export const updateInvoiceSettingsInput = z.strictObject({
  invoicePrefix: prefix.optional(),
  creditNotePrefix: prefix.optional(),
  termsDays: z.number().int().min(0).max(365, "At most 365 days").optional(),
  depositTermsDays: z.number().int().min(0).max(365, "At most 365 days").optional(),
  taxRates: z.strictObject({ room: ratePpm, engineer: ratePpm, tape_goods: ratePpm, storage: ratePpm, other: ratePpm }).optional(),
  taxCalculation: z.enum(taxCalculations).optional(),
  taxRounding: z.enum(taxRoundings).optional(),
  paperSize: z.enum(["A4", "LETTER"]).optional(),
  billingBasis: z.enum(billingBases).optional(),
  reminderDays: z.array(z.number().int().min(1).max(365)).max(6, "At most six reminder steps").optional(),
  taxNumber: z.string().trim().max(40).nullable().optional(),
  paymentInstructions: z.string().trim().max(1000).nullable().optional(),
});
export type UpdateInvoiceSettingsInput = z.infer<typeof updateInvoiceSettingsInput>;

const money = ["owner", "manager"] as const;
const books = ["owner", "manager", "bookkeeper"] as const;

/** Invoices, payments, credit notes and receivables (docs/invoicing.md). */
export const invoiceRoutes = {
  list: defineRoute({
    method: "get",
    path: "/api/invoices",
    summary: "Invoices, filtered by status, client and issue date (a client sees only its own issued ones)",
    access: [...books, "client"],
    query: invoicesQuery,
    response: z.array(invoiceSummaryDto),
  }),
  create: defineRoute({
    method: "post",
    path: "/api/invoices",
    summary: "A draft invoice from a client's billable items and manual lines",
    access: money,
    body: createInvoiceInput,
    status: 201,
    response: invoiceDetailDto,
  }),
  get: defineRoute({
    method: "get",
    path: "/api/invoices/:id",
    summary: "One invoice with its lines, payments, credit notes and e-mails",
    access: [...books, "client"],
    params: idParams,
    response: invoiceDetailDto,
  }),
  updateDraft: defineRoute({
    method: "patch",
    path: "/api/invoices/:id",
    summary: "Edit a draft: manual lines, discounts, notes, lines taken off",
    access: money,
    params: idParams,
    body: updateDraftInput,
    response: invoiceDetailDto,
  }),
  issue: defineRoute({
    method: "post",
    path: "/api/invoices/:id/issue",
    summary: "Issue a draft: its gapless number, due date, PDF and e-mail to the client",
    access: money,
    params: idParams,
    response: invoiceDetailDto,
  }),
  void: defineRoute({
    method: "post",
    path: "/api/invoices/:id/void",
    summary: "Void an invoice with no payments; its items become billable again",
    access: money,
    params: idParams,
    body: voidInvoiceInput,
    response: invoiceDetailDto,
  }),
  pdf: defineRoute({
    method: "get",
    path: "/api/invoices/:id/pdf",
    summary: "The invoice as a PDF",
    access: [...books, "client"],
    params: idParams,
    response: "file",
  }),
  recordPayment: defineRoute({
    method: "post",
    path: "/api/invoices/:id/payments",
    summary: "Record a cash, cheque or bank-transfer payment",
    access: books,
    params: idParams,
    body: recordPaymentInput,
    status: 201,
    response: invoiceDetailDto,
  }),
  reversePayment: defineRoute({
    method: "post",
    path: "/api/invoices/:id/payments/:paymentId/reversal",
    summary: "Reverse a payment (e.g. a bounced cheque) with a reason; it is never deleted",
    access: books,
    params: paymentParams,
    body: reversePaymentInput,
    response: invoiceDetailDto,
  }),
  creditNote: defineRoute({
    method: "post",
    path: "/api/invoices/:id/credit-notes",
    summary: "Correct an issued invoice with a credit note, in whole or by lines",
    access: money,
    params: idParams,
    body: creditNoteInput,
    status: 201,
    response: invoiceDetailDto,
  }),
  depositInvoice: defineRoute({
    method: "post",
    path: "/api/bookings/:id/deposit-invoice",
    summary: "Issue a hold's deposit invoice and e-mail it to the client",
    access: money,
    params: idParams,
    status: 201,
    response: invoiceDetailDto,
  }),
  billable: defineRoute({
    method: "get",
    path: "/api/clients/:id/billable",
    summary: "A client's billable items not yet on a live invoice",
    access: books,
    params: idParams,
    response: z.array(billableItemDto),
  }),
  ageing: defineRoute({
    method: "get",
    path: "/api/receivables/ageing",
    summary: "Open balances by days past due as of a date",
    access: books,
    query: ageingQuery,
    response: ageingDto,
  }),
  settings: defineRoute({
    method: "get",
    path: "/api/invoice-settings",
    summary: "The studio's invoicing settings: numbers, terms, tax rates and rounding, paper",
    access: books,
    response: invoiceSettingsDto,
  }),
  updateSettings: defineRoute({
    method: "patch",
    path: "/api/invoice-settings",
    summary: "Change the invoicing settings",
    access: ["owner"],
    body: updateInvoiceSettingsInput,
    response: invoiceSettingsDto,
  }),
};
