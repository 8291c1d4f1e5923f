import { useState } from "react";
import { formatMoney, formatTaxRate, paymentMethodLabels, taxCategoryLabels, type InvoiceDetailDto, type Role } from "@takeup/domain";
import { Button, buttonStyles } from "../../../components/ui/button.tsx";
import { Card } from "../../../components/ui/card.tsx";
import { FormAlert } from "../../../components/ui/form-field.tsx";
import { errorMessage } from "../../../lib/api-client.ts";
import { invoicePdfHref, useIssueInvoice, useReversePayment, useVoidInvoice } from "../api/invoices.ts";
import { CreditNoteForm } from "./credit-note-form.tsx";
import { DraftEditor } from "./draft-editor.tsx";
import { InvoiceStatusBadge } from "./invoice-status.tsx";
import { PaymentForm } from "./payment-form.tsx";

export function InvoiceView({ invoice, role }: { invoice: InvoiceDetailDto; role: Role }) {
  const money = (m: number) => formatMoney(m, invoice.currency);
  const issue = useIssueInvoice(invoice.id);
  const voidIt = useVoidInvoice(invoice.id);
  const reverse = useReversePayment(invoice.id);
  const [voidReason, setVoidReason] = useState("");
  const manages = role === "owner" || role === "manager";
  const takesPayments = manages || role === "bookkeeper";
  const open = invoice.status === "issued" || invoice.status === "part_paid";
  const issued = invoice.status !== "draft" && invoice.status !== "void";

  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-wrap items-center gap-3">
        <InvoiceStatusBadge status={invoice.status} daysOverdue={invoice.daysOverdue} />
        {invoice.dueAt ? <span className="text-sm text-muted">Due {invoice.dueAt}</span> : null}
        <a className={buttonStyles("secondary", "sm")} href={invoicePdfHref(invoice.id)} target="_blank" rel="noreferrer">
          Open the PDF
        </a>
        {manages && invoice.status === "draft" ? (
          <Button size="sm" pending={issue.isPending} onClick={() => issue.mutate()}>
            Issue and e-mail
          </Button>
        ) : null}
      </div>
      <FormAlert message={issue.isError ? errorMessage(issue.error) : voidIt.isError ? errorMessage(voidIt.error) : reverse.isError ? errorMessage(reverse.error) : null} />

      <Card title="Lines">
        <table className="w-full text-sm tabular-nums" aria-label="Invoice lines">
          <thead className="text-left text-xs text-muted">
            <tr>
              <th className="py-1">Item</th>
              <th>Category</th>
              <th className="text-right">Quantity × rate</th>
              <th className="text-right">Amount</th>
              <th className="text-right">Tax</th>
            </tr>
          </thead>
          <tbody>
            {invoice.lines.map((line) => (
              <tr key={line.id} className="border-t border-line align-top">
                <td className="py-1.5">
                  {line.groupLabel ? <span className="block text-xs text-muted">{line.groupLabel}</span> : null}
                  {line.description}
                  {line.explanation ? <span className="block text-xs text-muted">{line.explanation}</span> : null}
                </td>
                <td>{taxCategoryLabels[line.category]}</td>
                <td className="text-right">
                  {line.quantity} {line.unit} × {money(line.unitPriceCents)}
                </td>
                <td className="text-right">
                  {money(line.amountCents)}
                  {line.discountCents ? <span className="block text-xs text-muted">−{money(line.discountCents)}</span> : null}
                </td>
                <td className="text-right">{money(line.taxCents)}</td>
              </tr>
            ))}
          </tbody>
        </table>
        <dl className="mt-3 ml-auto grid max-w-sm grid-cols-2 gap-1 text-sm tabular-nums" aria-label="Totals">
          <dt>Subtotal</dt>
          <dd className="text-right">{money(invoice.subtotalCents)}</dd>
          {invoice.discountCents ? (
            <>
              <dt>Discounts</dt>
              <dd className="text-right">−{money(invoice.discountCents)}</dd>
            </>
          ) : null}
          {invoice.taxRows.map((t) => (
            <div key={t.category} className="contents">
              <dt>
                Tax, {taxCategoryLabels[t.category]} {formatTaxRate(t.ratePpm)}
              </dt>
              <dd className="text-right">{money(t.taxCents)}</dd>
            </div>
          ))}
          <dt className="font-semibold">Total</dt>
          <dd className="text-right font-semibold">{money(invoice.totalCents)}</dd>
          {invoice.depositAppliedCents ? (
            <>
              <dt>Deposit paid</dt>
              <dd className="text-right">−{money(invoice.depositAppliedCents)}</dd>
            </>
          ) : null}
          {invoice.creditAppliedCents ? (
            <>
              <dt>Credit applied</dt>
              <dd className="text-right">−{money(invoice.creditAppliedCents)}</dd>
            </>
          ) : null}
          <dt>Paid</dt>
          <dd className="text-right">−{money(invoice.paidCents)}</dd>
          {invoice.creditedCents ? (
            <>
              <dt>Credit notes</dt>
              <dd className="text-right">−{money(invoice.creditedCents)}</dd>
            </>
          ) : null}
          <dt className="font-semibold">Balance</dt>
          <dd className="text-right font-semibold">{money(invoice.balanceCents)}</dd>
        </dl>
      </Card>

      {manages && invoice.status === "draft" ? (
        <Card title="Edit the draft">
          <DraftEditor invoice={invoice} />
        </Card>
      ) : null}

      {issued ? (
        <Card title="Payments">
          {invoice.payments.length === 0 ? <p className="text-sm text-muted">No payments yet.</p> : null}
          <ul className="mb-3 flex flex-col gap-1 text-sm">
            {invoice.payments.map((p) => (
              <li key={p.id} className="flex flex-wrap items-center gap-2">
                <span className={p.reversedAt ? "line-through" : undefined}>
                  {p.receivedOn} · {paymentMethodLabels[p.method]}
                  {p.reference ? ` ${p.reference}` : ""} · {money(p.amountCents)}
                  {p.creditCents ? ` (${money(p.creditCents)} to client credit)` : ""}
                </span>
                {p.reversedAt ? (
                  <span className="text-muted">reversed: {p.reversalReason}</span>
                ) : takesPayments ? (
                  <Button
                    variant="ghost"
                    size="sm"
                    onClick={() => {
                      const reason = window.prompt("Why is this payment reversed (e.g. cheque bounced)?");
                      if (reason?.trim()) reverse.mutate({ paymentId: p.id, reason: reason.trim() });
                    }}
                  >
                    Reverse
                  </Button>
                ) : null}
              </li>
            ))}
          </ul>
          {takesPayments && open ? <PaymentForm invoiceId={invoice.id} balanceCents={invoice.balanceCents} /> : null}
        </Card>
      ) : null}

      {issued ? (
        <Card title="Credit notes">
          <ul className="mb-3 flex flex-col gap-1 text-sm">
            {invoice.creditNotes.map((n) => (
              <li key={n.id}>
                {n.number} · {n.issuedOn} · {money(n.totalCents)} · {n.reason}
              </li>
            ))}
          </ul>
          {manages ? <CreditNoteForm invoice={invoice} /> : null}
        </Card>
      ) : null}

      {role !== "client" ? (
        <Card title="E-mails sent">
          {invoice.emails.length === 0 ? <p className="text-sm text-muted">Nothing sent yet.</p> : null}
          <ul className="flex flex-col gap-1 text-sm">
            {invoice.emails.map((e) => (
              <li key={`${e.step}-${e.toAddress}`}>
                {e.step} → {e.toAddress} · {e.status}
                {e.sentAt ? ` · ${e.sentAt.replace("T", " ").slice(0, 16)} UTC` : ""}
              </li>
            ))}
          </ul>
        </Card>
      ) : null}

      {manages && (invoice.status === "draft" || (open && invoice.paidCents === 0 && invoice.creditedCents === 0)) ? (
        <Card title="Void">
          <div className="flex flex-wrap items-center gap-2">
            <input aria-label="Reason to void" className="h-8 rounded-md border border-line-strong px-2 text-sm" value={voidReason} onChange={(e) => setVoidReason(e.target.value)} placeholder="Reason" />
            <Button variant="danger" size="sm" disabled={!voidReason.trim()} pending={voidIt.isPending} onClick={() => voidIt.mutate(voidReason.trim())}>
              Void this invoice
            </Button>
          </div>
        </Card>
      ) : null}
    </div>
  );
}
