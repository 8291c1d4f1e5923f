import { invoiceRoutes } from "@takeup/domain";
import { ApiRouter } from "../../lib/api-router.ts";
import type { Deps } from "../../deps.ts";
import { loadStudio } from "../studio/studio.service.ts";
import { loadInvoiceSettings, toSettingsDto, updateInvoiceSettings } from "./invoice-settings.ts";
import { loadInvoiceDetail } from "./invoice-dto.ts";
import { invoiceFileName, invoicePdfFor } from "./invoice-pdf.ts";
import { sendPendingInvoiceEmails } from "./invoice-mail.ts";
import { createDraft, issueInvoice, listBillable, listInvoices, receivablesAgeing, today, updateDraft, voidInvoice } from "./invoices.service.ts";
import { issueCreditNote, issueDepositInvoice, recordPayment, reversePayment } from "./payments.service.ts";

export function invoicesRouter(deps: Deps) {
  const { db } = deps;
  const detail = async (id: number) => loadInvoiceDetail(db, id, today(await loadStudio(db)));
  return new ApiRouter("/api/invoices", "Invoices")
    .handle(invoiceRoutes.list, ({ actor, query }) => listInvoices(db, actor, query))
    .handle(invoiceRoutes.create, ({ actor, body }) => createDraft(db, actor, body))
    .handle(invoiceRoutes.get, async ({ actor, params }) => loadInvoiceDetail(db, params.id, today(await loadStudio(db)), actor))
    .handle(invoiceRoutes.updateDraft, ({ actor, params, body }) => updateDraft(db, actor, params.id, body))
    .handle(invoiceRoutes.issue, async ({ actor, params }) => {
      await issueInvoice(db, actor, params.id);
      await sendPendingInvoiceEmails(deps, params.id);
      return detail(params.id);
    })
    .handle(invoiceRoutes.void, ({ actor, params, body }) => voidInvoice(db, actor, params.id, body.reason))
    .handle(invoiceRoutes.pdf, async ({ actor, params, res }) => {
      const invoice = await loadInvoiceDetail(db, params.id, today(await loadStudio(db)), actor);
      const pdf = await invoicePdfFor(db, invoice);
      res.setHeader("content-disposition", `inline; filename="${invoiceFileName(invoice)}"`);
      res.setHeader("cache-control", "no-store");
      res.type("application/pdf").send(pdf);
    })
    .handle(invoiceRoutes.recordPayment, ({ actor, params, body }) => recordPayment(deps, actor, params.id, body))
    .handle(invoiceRoutes.reversePayment, ({ actor, params, body }) => reversePayment(db, actor, params.id, params.paymentId, body.reason))
    .handle(invoiceRoutes.creditNote, ({ actor, params, body }) => issueCreditNote(db, actor, params.id, body));
}

export function billableRouter(deps: Deps) {
  return new ApiRouter("/api/clients", "Invoices").handle(invoiceRoutes.billable, ({ params }) => listBillable(deps.db, params.id));
}

export function depositInvoicesRouter(deps: Deps) {
  return new ApiRouter("/api/bookings", "Invoices").handle(invoiceRoutes.depositInvoice, ({ actor, params }) => issueDepositInvoice(deps, actor, params.id));
}

export function receivablesRouter(deps: Deps) {
  return new ApiRouter("/api/receivables", "Invoices").handle(invoiceRoutes.ageing, ({ query }) => receivablesAgeing(deps.db, query.asOf));
}

export function invoiceSettingsRouter(deps: Deps) {
  return new ApiRouter("/api/invoice-settings", "Invoices")
    .handle(invoiceRoutes.settings, async () => toSettingsDto(await loadInvoiceSettings(deps.db)))
    .handle(invoiceRoutes.updateSettings, ({ actor, body }) => updateInvoiceSettings(deps.db, actor, body));
}
