import { and, eq, inArray, isNotNull } from "drizzle-orm";
import { invoiceEmails, invoices, isDuplicateKeyError, type Db } from "@takeup/db";
import { daysPastDue } from "@takeup/domain";
import type { Mailer } from "../../lib/mailer.ts";
import { loadStudio } from "../studio/studio.service.ts";
import { loadInvoiceSettings } from "./invoice-settings.ts";
import { studioDate } from "./invoice-dto.ts";
import { billingRecipient } from "./invoices.service.ts";
import { sendPendingInvoiceEmails } from "./invoice-mail.ts";

/**
 * Overdue reminders at the owner's steps (e.g. 7 and 21 days past due). Each step of each invoice
 * is claimed by inserting its row under the UNIQUE (invoice, step, recipient) key, so two runs at
 * once (or two API processes) send it once; the e-mail goes after the claim is committed.
 * An invoice first seen far past due gets only its latest step (the earlier ones are not sent late).
 */
export async function sendInvoiceReminders(db: Db, mailer: Mailer, now = new Date(), appUrl?: string): Promise<number> {
  const studio = await loadStudio(db);
  const settings = await loadInvoiceSettings(db);
  if (settings.reminderDays.length === 0) return 0;
  const today = studioDate(now, studio.timeZone);
  const open = await db
    .select({ id: invoices.id, dueOn: invoices.dueOn, clientAccountId: invoices.clientAccountId, balanceMinor: invoices.balanceMinor })
    .from(invoices)
    .where(and(inArray(invoices.status, ["issued", "part_paid"]), isNotNull(invoices.dueOn)));
  let sent = 0;
  for (const invoice of open) {
    if (invoice.balanceMinor <= 0) continue;
    const late = daysPastDue(invoice.dueOn!, today);
    const due = settings.reminderDays.filter((d) => d <= late);
    if (due.length === 0) continue;
    const to = await billingRecipient(db, invoice.clientAccountId);
    if (!to) continue;
    const latest = Math.max(...due);
    const claimed = await db.transaction(async (tx) => {
      const existing = await tx.select({ step: invoiceEmails.step }).from(invoiceEmails).where(and(eq(invoiceEmails.invoiceId, invoice.id), inArray(invoiceEmails.step, due.map((d) => `reminder:${d}`))));
      const have = new Set(existing.map((e) => e.step));
      if (have.has(`reminder:${latest}`)) return false;
      try {
        await tx.insert(invoiceEmails).values({ invoiceId: invoice.id, step: `reminder:${latest}`, toAddress: to });
        return true;
      } catch (error) {
        if (isDuplicateKeyError(error)) return false;
        throw error;
      }
    });
    if (claimed) sent += await sendPendingInvoiceEmails({ db, mailer, config: appUrl ? { appUrl } : undefined }, invoice.id, now);
  }
  return sent;
}
