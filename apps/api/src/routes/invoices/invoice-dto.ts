import { asc, eq } from "drizzle-orm";
import { clientAccounts, creditNotes, invoiceEmails, invoiceLines, invoicePayments, invoices, type DbOrTx, type Invoice } from "@takeup/db";
import { daysPastDue, quantityScale, type InvoiceDetailDto, type InvoiceSummaryDto, type TaxCategory } from "@takeup/domain";
import { notFound } from "../../lib/http-error.ts";
import type { Actor } from "../../lib/actor.ts";

const toDiscountDto = (d: Invoice["invoiceDiscount"]) => (!d ? null : d.kind === "amount" ? { kind: "amount" as const, amountCents: d.amountMinor } : { kind: "percent" as const, bp: d.bp });

export function daysOverdue(row: Pick<Invoice, "status" | "dueOn">, today: string): number {
  if (!row.dueOn || (row.status !== "issued" && row.status !== "part_paid")) return 0;
  return Math.max(0, daysPastDue(row.dueOn, today));
}

export function toSummaryDto(row: Invoice, clientName: string, today: string): InvoiceSummaryDto {
  return {
    id: row.id,
    number: row.number,
    kind: row.kind,
    clientAccountId: row.clientAccountId,
    clientName,
    status: row.status,
    issuedAt: row.issuedAt?.toISOString() ?? null,
    dueAt: row.dueOn,
    currency: row.currency,
    totalCents: row.totalMinor,
    balanceCents: row.balanceMinor,
    daysOverdue: daysOverdue(row, today),
  };
}

/** The studio's calendar date of an instant (YYYY-MM-DD). */
export function studioDate(at: Date, timeZone: string): string {
  return new Intl.DateTimeFormat("en-CA", { timeZone, year: "numeric", month: "2-digit", day: "2-digit" }).format(at);
}

/** One invoice in full; a client user gets 404 for anything not its own, and for drafts. */
export async function loadInvoiceDetail(db: DbOrTx, id: number, today: string, actor?: Actor): Promise<InvoiceDetailDto> {
  const [found] = await db.select({ invoice: invoices, clientName: clientAccounts.name }).from(invoices).innerJoin(clientAccounts, eq(clientAccounts.id, invoices.clientAccountId)).where(eq(invoices.id, id));
  if (!found || (actor?.role === "client" && (found.invoice.clientAccountId !== actor.clientAccountId || found.invoice.status === "draft"))) throw notFound("That invoice");
  const row = found.invoice;
  const lines = await db.select().from(invoiceLines).where(eq(invoiceLines.invoiceId, id)).orderBy(asc(invoiceLines.position));
  const payments = await db.select().from(invoicePayments).where(eq(invoicePayments.invoiceId, id)).orderBy(asc(invoicePayments.id));
  const notes = await db.select().from(creditNotes).where(eq(creditNotes.invoiceId, id)).orderBy(asc(creditNotes.id));
  const emails = await db.select().from(invoiceEmails).where(eq(invoiceEmails.invoiceId, id)).orderBy(asc(invoiceEmails.id));
  const taxRows = new Map<TaxCategory, { category: TaxCategory; ratePpm: number; netCents: number; taxCents: number }>();
  for (const line of lines) {
    const r = taxRows.get(line.category) ?? { category: line.category, ratePpm: line.taxRatePpm, netCents: 0, taxCents: 0 };
    r.netCents += line.netMinor;
    r.taxCents += line.taxMinor;
    taxRows.set(line.category, r);
  }
  return {
    ...toSummaryDto(row, found.clientName, today),
    bookingId: row.bookingId,
    subtotalCents: row.subtotalMinor,
    discountCents: row.discountMinor,
    taxCents: row.taxMinor,
    taxRows: [...taxRows.values()],
    depositAppliedCents: row.depositAppliedMinor,
    creditAppliedCents: row.creditAppliedMinor,
    paidCents: row.paidMinor,
    creditedCents: row.creditedMinor,
    invoiceDiscount: toDiscountDto(row.invoiceDiscount),
    notes: row.notes,
    voidReason: row.voidReason,
    lines: lines.map((l) => ({
      id: l.id,
      sourceKind: l.sourceKind,
      sourceId: l.sourceId,
      groupLabel: l.groupLabel,
      category: l.category,
      description: l.description,
      explanation: l.explanation,
      quantity: l.quantityMilli / quantityScale,
      unit: l.unit,
      unitPriceCents: l.unitPriceMinor,
      amountCents: l.amountMinor,
      discount: toDiscountDto(l.discount),
      discountCents: l.discountMinor,
      netCents: l.netMinor,
      taxRatePpm: l.taxRatePpm,
      taxCents: l.taxMinor,
    })),
    payments: payments.map((p) => ({
      id: p.id,
      method: p.method,
      reference: p.reference,
      receivedOn: p.receivedOn,
      amountCents: p.amountMinor,
      appliedCents: p.appliedMinor,
      creditCents: p.creditMinor,
      reversedAt: p.reversedAt?.toISOString() ?? null,
      reversalReason: p.reversalReason,
    })),
    creditNotes: notes.map((n) => ({ id: n.id, number: n.number, issuedOn: n.issuedOn, reason: n.reason, totalCents: n.totalMinor, taxCents: n.taxMinor, lines: n.lines })),
    emails: emails.map((e) => ({ step: e.step, toAddress: e.toAddress, status: e.status, sentAt: e.sentAt?.toISOString() ?? null })),
  };
}
