import { and, eq } from "drizzle-orm";
import { invoiceEmails, invoicePayments } from "@takeup/db";
import { formatMoney, paymentMethodLabels, type InvoiceDetailDto, type StudioDto } from "@takeup/domain";
import { composeEmail } from "../../emails/layout.ts";
import type { Mailer, OutgoingEmail } from "../../lib/mailer.ts";
import { logger } from "../../lib/logger.ts";
import type { Deps } from "../../deps.ts";
import { loadStudio } from "../studio/studio.service.ts";
import { loadInvoiceDetail, studioDate } from "./invoice-dto.ts";
import { invoiceFileName, invoicePdfFor } from "./invoice-pdf.ts";

type Db = Deps["db"];

function messageFor(step: string, invoice: InvoiceDetailDto, studio: StudioDto, to: string, appUrl: string | undefined, payment?: typeof invoicePayments.$inferSelect): OutgoingEmail {
  const money = (m: number) => formatMoney(m, invoice.currency);
  const base = { to, studioName: studio.name, greeting: `Hello ${invoice.clientName},`, ...(appUrl ? { action: { label: "See your invoices", url: `${appUrl}/invoices/${invoice.id}` } } : {}) };
  if (step === "issued") {
    return composeEmail({
      ...base,
      template: invoice.kind === "deposit" ? "deposit_invoice_issued" : "invoice_issued",
      subject: `${invoice.kind === "deposit" ? "Deposit invoice" : "Invoice"} ${invoice.number} from ${studio.name}`,
      paragraphs: [
        `Invoice ${invoice.number} for ${money(invoice.totalCents)} is attached.`,
        `Balance due: ${money(invoice.balanceCents)} by ${invoice.dueAt}.`,
        ...(invoice.kind === "deposit" ? ["Your hold is confirmed as soon as the deposit is paid in full."] : []),
      ],
    });
  }
  if (step.startsWith("receipt:") && payment) {
    return composeEmail({
      ...base,
      template: "payment_receipt",
      subject: `Payment received for ${invoice.number}`,
      paragraphs: [
        `Thank you: we received ${money(payment.amountMinor)} by ${paymentMethodLabels[payment.method].toLowerCase()}${payment.reference ? ` (${payment.reference})` : ""} on ${payment.receivedOn}.`,
        payment.creditMinor > 0 ? `${money(payment.creditMinor)} beyond the balance is kept as credit for your next invoice.` : `Balance now: ${money(invoice.balanceCents)}.`,
      ],
    });
  }
  const days = step.replace("reminder:", "");
  return composeEmail({
    ...base,
    template: "invoice_reminder",
    subject: `Reminder: invoice ${invoice.number} is overdue`,
    paragraphs: [`Invoice ${invoice.number} was due on ${invoice.dueAt} (${days}+ days ago).`, `Balance due: ${money(invoice.balanceCents)}. If you have already paid, thank you, and please ignore this message.`],
  });
}

/**
 * Sends an invoice's e-mails still pending. Each row is taken by moving it from pending to
 * sending (only one process wins that update), so a step is sent once even with two API processes.
 */
export async function sendPendingInvoiceEmails(deps: { db: Db; mailer: Mailer; config?: { appUrl: string } }, invoiceId: number, now = new Date()): Promise<number> {
  const { db } = deps;
  const pending = await db.select().from(invoiceEmails).where(and(eq(invoiceEmails.invoiceId, invoiceId), eq(invoiceEmails.status, "pending")));
  if (pending.length === 0) return 0;
  const studio = await loadStudio(db);
  const invoice = await loadInvoiceDetail(db, invoiceId, studioDate(now, studio.timeZone));
  let sent = 0;
  let pdf: Buffer | null = null;
  for (const row of pending) {
    const [taken] = await db.update(invoiceEmails).set({ status: "sending" }).where(and(eq(invoiceEmails.id, row.id), eq(invoiceEmails.status, "pending")));
    if (taken.affectedRows !== 1) continue;
    const paymentId = row.step.startsWith("receipt:") ? Number(row.step.slice(8)) : null;
    const [payment] = paymentId ? await db.select().from(invoicePayments).where(eq(invoicePayments.id, paymentId)) : [];
    const message = messageFor(row.step, invoice, studio, row.toAddress, deps.config?.appUrl, payment);
    if (row.step === "issued" || row.step.startsWith("reminder:")) {
      pdf ??= await invoicePdfFor(db, invoice);
      message.attachments = [{ filename: invoiceFileName(invoice), content: pdf, contentType: "application/pdf" }];
    }
    try {
      await deps.mailer.send(message);
      await db.update(invoiceEmails).set({ status: "sent", sentAt: new Date() }).where(eq(invoiceEmails.id, row.id));
      sent++;
    } catch (error) {
      // The invoice stands; the failure is on the invoice and in the e-mail log.
      await db.update(invoiceEmails).set({ status: "failed" }).where(eq(invoiceEmails.id, row.id));
      logger.warn("invoice e-mail not sent", { invoiceId, step: row.step, reason: String(error) });
    }
  }
  return sent;
}
