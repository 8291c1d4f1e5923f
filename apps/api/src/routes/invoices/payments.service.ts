import { and, eq, sql } from "drizzle-orm";
import { bookings, clientCredits, creditNotes, invoiceEmails, invoiceLines, invoicePayments, invoicedSources, invoices, isDuplicateKeyError, type Db, type Tx } from "@takeup/db";
import { formatInvoiceNumber, formatMoney, paidStatus, splitPayment, type CreditNoteInput, type InvoiceDetailDto, type RecordPaymentInput } from "@takeup/domain";
import { conflict, HttpError, notFound } from "../../lib/http-error.ts";
import { writeAudit } from "../../lib/audit.ts";
import type { Actor } from "../../lib/actor.ts";
import { logger } from "../../lib/logger.ts";
import type { Deps } from "../../deps.ts";
import { loadStudio } from "../studio/studio.service.ts";
import { transitionBooking } from "../bookings/transitions.ts";
import { loadInvoiceSettings } from "./invoice-settings.ts";
import { loadInvoiceDetail, studioDate } from "./invoice-dto.ts";
import { billingRecipient, issueInTx, recompute, today } from "./invoices.service.ts";
import { ensureCounter, takeNextNumber } from "./numbering.ts";
import { sendPendingInvoiceEmails } from "./invoice-mail.ts";

async function lockInvoice(tx: Tx, id: number) {
  const [row] = await tx.select().from(invoices).where(eq(invoices.id, id)).for("update");
  if (!row) throw notFound("That invoice");
  return row;
}

/** What the client must pay on the invoice, before payments: total less deposit and credit used. */
const amountDue = (row: typeof invoices.$inferSelect) => row.totalMinor - row.depositAppliedMinor - row.creditAppliedMinor;
const settled = (_row: typeof invoices.$inferSelect, paid: number, credited: number) => paid + credited;

export async function recordPayment(deps: Deps, actor: Actor, id: number, input: RecordPaymentInput): Promise<InvoiceDetailDto> {
  const { db } = deps;
  const studio = await loadStudio(db);
  const result = await db.transaction(async (tx) => {
    const row = await lockInvoice(tx, id);
    if (row.status !== "issued" && row.status !== "part_paid") {
      throw conflict(row.status === "draft" ? "invoice_not_issued" : "invoice_closed", `Invoice ${row.number ?? row.id} is ${row.status.replace("_", " ")}; payments are recorded against issued invoices with a balance`);
    }
    if (input.amountCents > row.balanceMinor && !input.overpaymentToCredit) {
      throw new HttpError(409, "overpayment", `The balance is ${formatMoney(row.balanceMinor, row.currency)}; record the excess as a client credit to take more`, [
        { field: "amountCents", rule: "at_most_balance", message: `At most ${formatMoney(row.balanceMinor, row.currency)}` },
      ]);
    }
    const split = splitPayment(row.balanceMinor, input.amountCents);
    const [payment] = await tx
      .insert(invoicePayments)
      .values({ invoiceId: id, method: input.method, reference: input.reference || null, receivedOn: input.receivedOn, amountMinor: input.amountCents, appliedMinor: split.appliedMinor, creditMinor: split.creditMinor, recordedByUserId: actor.userId })
      .$returningId();
    if (split.creditMinor > 0) {
      await tx.insert(clientCredits).values({ clientAccountId: row.clientAccountId, amountMinor: split.creditMinor, paymentId: payment!.id, note: `Overpayment on ${row.number}` });
    }
    const paidMinor = row.paidMinor + split.appliedMinor;
    const balanceMinor = row.balanceMinor - split.appliedMinor;
    const status = paidStatus(amountDue(row), settled(row, paidMinor, row.creditedMinor));
    await tx.update(invoices).set({ paidMinor, balanceMinor, status }).where(eq(invoices.id, id));
    const to = await billingRecipient(tx, row.clientAccountId);
    if (to) await tx.insert(invoiceEmails).values({ invoiceId: id, step: `receipt:${payment!.id}`, toAddress: to });
    const after = await loadInvoiceDetail(tx, id, today(studio));
    await writeAudit(tx, actor, "invoice.payment_recorded", { type: "invoice", id }, { after: { paymentId: payment!.id, ...input, status, balanceMinor } });
    return { after, confirmHold: row.kind === "deposit" && status === "paid" ? row.bookingId : null };
  });
  await sendPendingInvoiceEmails(deps, id);
  if (result.confirmHold) await confirmHoldAfterDeposit(deps, actor, result.confirmHold, id);
  return loadInvoiceDetail(db, id, today(studio));
}

/**
 * A deposit paid in full confirms its hold through the bookings' own confirmation (conflicts
 * re-checked, audited, the client told). A conflict leaves the hold as it is, logged and audited.
 */
async function confirmHoldAfterDeposit(deps: Deps, actor: Actor, bookingId: number, invoiceId: number) {
  const [booking] = await deps.db.select({ status: bookings.status }).from(bookings).where(eq(bookings.id, bookingId));
  if (booking?.status !== "hold") return;
  try {
    await transitionBooking(deps, actor, bookingId, "confirm", { depositReceived: true });
  } catch (error) {
    logger.warn("deposit paid but the hold could not be confirmed", { bookingId, invoiceId, reason: String(error) });
    await writeAudit(deps.db, actor, "booking.deposit_paid_not_confirmed", { type: "booking", id: bookingId }, { after: { invoiceId, reason: error instanceof Error ? error.message : String(error) } });
  }
}

export async function reversePayment(db: Db, actor: Actor, id: number, paymentId: number, reason: string): Promise<InvoiceDetailDto> {
  const studio = await loadStudio(db);
  await db.transaction(async (tx) => {
    const row = await lockInvoice(tx, id);
    const [payment] = await tx.select().from(invoicePayments).where(and(eq(invoicePayments.id, paymentId), eq(invoicePayments.invoiceId, id))).for("update");
    if (!payment) throw notFound("That payment");
    if (payment.reversedAt) throw conflict("payment_reversed", "That payment is already reversed");
    await tx.update(invoicePayments).set({ reversedAt: new Date(), reversalReason: reason }).where(eq(invoicePayments.id, paymentId));
    if (payment.creditMinor > 0) {
      await tx.insert(clientCredits).values({ clientAccountId: row.clientAccountId, amountMinor: -payment.creditMinor, paymentId, note: "Overpayment reversed" });
    }
    const paidMinor = row.paidMinor - payment.appliedMinor;
    const balanceMinor = row.balanceMinor + payment.appliedMinor;
    const status = paidStatus(amountDue(row), settled(row, paidMinor, row.creditedMinor));
    await tx.update(invoices).set({ paidMinor, balanceMinor, status }).where(eq(invoices.id, id));
    await writeAudit(tx, actor, "invoice.payment_reversed", { type: "invoice", id }, { before: { paymentId, status: row.status }, after: { paymentId, reason, status, balanceMinor } });
  });
  return loadInvoiceDetail(db, id, today(studio));
}

export async function issueCreditNote(db: Db, actor: Actor, id: number, input: CreditNoteInput): Promise<InvoiceDetailDto> {
  const studio = await loadStudio(db);
  const settings = await loadInvoiceSettings(db);
  const now = new Date();
  const issuedOn = studioDate(now, studio.timeZone);
  const year = Number(issuedOn.slice(0, 4));
  await ensureCounter(db, settings.creditNotePrefix, year);
  await db.transaction(async (tx) => {
    const row = await lockInvoice(tx, id);
    if (row.status === "draft" || row.status === "void") throw conflict("invoice_not_issued", `A ${row.status} invoice has nothing to credit`);
    const lines = await tx.select().from(invoiceLines).where(eq(invoiceLines.invoiceId, id));
    const earlier = await tx.select({ lines: creditNotes.lines }).from(creditNotes).where(eq(creditNotes.invoiceId, id));
    const credited = new Set(earlier.flatMap((n) => n.lines.map((l) => l.invoiceLineId)));
    const chosen = input.lineIds?.length
      ? input.lineIds.map((lineId, i) => {
          const line = lines.find((l) => l.id === lineId);
          if (!line) throw new HttpError(400, "invalid_input", `Line ${lineId} is not on this invoice`, [{ field: `lineIds.${i}`, rule: "on_invoice", message: "Not on this invoice" }]);
          if (credited.has(lineId)) throw conflict("already_credited", `“${line.description}” is already credited`);
          return line;
        })
      : lines.filter((l) => !credited.has(l.id));
    if (chosen.length === 0) throw conflict("already_credited", "Every line of this invoice is already credited");
    const noteLines = chosen.map((l) => ({ invoiceLineId: l.id, description: l.description, netMinor: l.netMinor, taxMinor: l.taxMinor }));
    const netMinor = noteLines.reduce((s, l) => s + l.netMinor, 0);
    const taxMinor = noteLines.reduce((s, l) => s + l.taxMinor, 0);
    // The note credits the lines' nets and tax; beyond the open balance (already paid) it becomes client credit.
    const totalMinor = netMinor + taxMinor;
    const sequence = await takeNextNumber(tx, settings.creditNotePrefix, year);
    const number = formatInvoiceNumber(settings.creditNotePrefix, year, sequence);
    const [note] = await tx
      .insert(creditNotes)
      .values({ invoiceId: id, series: settings.creditNotePrefix, year, sequence, number, issuedOn, reason: input.reason, lines: noteLines, netMinor, taxMinor, totalMinor, createdByUserId: actor.userId })
      .$returningId();
    const onInvoice = Math.min(totalMinor, Math.max(row.balanceMinor, 0));
    const toCredit = totalMinor - onInvoice;
    if (toCredit > 0) await tx.insert(clientCredits).values({ clientAccountId: row.clientAccountId, amountMinor: toCredit, invoiceId: id, note: `Credit note ${number} beyond the balance` });
    const creditedMinor = row.creditedMinor + onInvoice;
    const balanceMinor = row.balanceMinor - onInvoice;
    const status = paidStatus(amountDue(row), settled(row, row.paidMinor, creditedMinor));
    await tx.update(invoices).set({ creditedMinor, balanceMinor, status }).where(eq(invoices.id, id));
    await writeAudit(tx, actor, "invoice.credit_note_issued", { type: "invoice", id }, { after: { creditNoteId: note!.id, number, totalMinor, lines: noteLines, status, balanceMinor } });
  });
  return loadInvoiceDetail(db, id, today(studio));
}

/** A hold's deposit invoice: one line for the deposit on the booking, issued at once and e-mailed. */
export async function issueDepositInvoice(deps: Deps, actor: Actor, bookingId: number): Promise<InvoiceDetailDto> {
  const { db } = deps;
  const studio = await loadStudio(db);
  const settings = await loadInvoiceSettings(db);
  const now = new Date();
  await ensureCounter(db, settings.invoicePrefix, Number(studioDate(now, studio.timeZone).slice(0, 4)));
  let invoiceId = 0;
  try {
    await db.transaction(async (tx) => {
      const [booking] = await tx.select().from(bookings).where(eq(bookings.id, bookingId)).for("update");
      if (!booking) throw notFound("That booking");
      if (booking.status !== "hold") throw conflict("not_a_hold", "A deposit invoice is for a hold; this booking is " + booking.status.replace("_", " "));
      if (booking.depositRequiredCents <= 0) throw conflict("no_deposit", "This hold asks for no deposit");
      const [created] = await tx.insert(invoices).values({ kind: "deposit", clientAccountId: booking.clientAccountId, bookingId, currency: studio.currency, createdByUserId: actor.userId }).$returningId();
      invoiceId = created!.id;
      await tx.insert(invoicedSources).values({ sourceKind: "deposit", sourceId: String(bookingId), invoiceId });
      await tx.insert(invoiceLines).values({
        invoiceId,
        position: 0,
        sourceKind: "deposit",
        sourceId: String(bookingId),
        groupLabel: `Booking #${bookingId}`,
        category: "other",
        description: `Deposit to confirm booking #${bookingId}`,
        explanation: `${(studio.depositBp / 100).toFixed(2).replace(/\.00$/, "")}% of the quoted ${formatMoney(booking.quoteTotalCents, studio.currency)}; deducted on the final invoice`,
        quantityMilli: 1000,
        unit: "each",
        unitPriceMinor: booking.depositRequiredCents,
        fixedAmountMinor: booking.depositRequiredCents,
        amountMinor: 0,
        netMinor: 0,
      });
      await recompute(tx, invoiceId, settings);
      await writeAudit(tx, actor, "invoice.drafted", { type: "invoice", id: invoiceId }, { after: { kind: "deposit", bookingId } });
      await issueInTx(tx, actor, invoiceId, studio, settings, now);
    });
  } catch (error) {
    if (isDuplicateKeyError(error)) throw conflict("already_invoiced", `Booking #${bookingId} already has a deposit invoice`);
    throw error;
  }
  await sendPendingInvoiceEmails(deps, invoiceId);
  return loadInvoiceDetail(db, invoiceId, today(studio));
}

export const creditBalance = async (db: Db, clientAccountId: number) =>
  Number((await db.select({ s: sql<number>`coalesce(sum(${clientCredits.amountMinor}), 0)` }).from(clientCredits).where(eq(clientCredits.clientAccountId, clientAccountId)))[0]!.s);
