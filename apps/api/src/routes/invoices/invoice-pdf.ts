import { eq } from "drizzle-orm";
import { clientAccounts, type DbOrTx } from "@takeup/db";
import { formatMoney, formatTaxRate, paymentMethodLabels, taxCategoryLabels, type InvoiceDetailDto, type StudioDto } from "@takeup/domain";
import { newPdfDocument, pdfToBuffer, type PaperSize } from "../../lib/pdf.ts";
import { loadStudio } from "../studio/studio.service.ts";
import { loadInvoiceSettings } from "./invoice-settings.ts";

export type InvoicePdfInput = {
  invoice: InvoiceDetailDto;
  studio: StudioDto;
  taxNumber: string | null;
  paymentInstructions: string | null;
  paper: PaperSize;
  client: { name: string; billingAddress: string | null };
};

const quantityText = (q: number, unit: string) => (unit === "hour" ? `${q.toLocaleString("en-US", { maximumFractionDigits: 3 })} h` : unit === "day" ? `${q} day${q === 1 ? "" : "s"}` : `${q.toLocaleString("en-US", { maximumFractionDigits: 3 })}`);

/** The invoice as a PDF in Public Sans: lines grouped by session, tax per rate, what is applied and what is due. */
export async function renderInvoicePdf(p: InvoicePdfInput): Promise<Buffer> {
  const inv = p.invoice;
  const money = (minor: number) => formatMoney(minor, inv.currency);
  const title = inv.number ? `Invoice ${inv.number}` : "Draft invoice";
  const doc = newPdfDocument({ size: p.paper, title });
  const left = doc.page.margins.left;
  const width = doc.page.width - left - doc.page.margins.right;
  const amountX = left + width - 90;

  doc.font("bold").fontSize(16).text(p.studio.name, left, 50);
  doc.font("body").fontSize(9);
  if (p.studio.address) doc.text(p.studio.address);
  if (p.studio.email || p.studio.phone) doc.text([p.studio.email, p.studio.phone].filter(Boolean).join(" · "));
  if (p.taxNumber) doc.text(`Tax number: ${p.taxNumber}`);

  doc.moveDown(1.2);
  doc.font("bold").fontSize(14).text(inv.kind === "deposit" ? `Deposit ${title.toLowerCase()}` : title);
  doc.font("body").fontSize(9);
  if (inv.issuedAt) doc.text(`Issued: ${inv.issuedAt.slice(0, 10)}`);
  if (inv.dueAt) doc.text(`Due: ${inv.dueAt}`);
  doc.moveDown(0.6);
  doc.font("bold").text("Bill to");
  doc.font("body").text(p.client.name);
  if (p.client.billingAddress) doc.text(p.client.billingAddress);
  doc.moveDown(1);

  const row = (label: string, amount: string, opts: { bold?: boolean; size?: number } = {}) => {
    const y = doc.y;
    doc.font(opts.bold ? "bold" : "body").fontSize(opts.size ?? 9);
    doc.text(label, left, y, { width: width - 100 });
    const after = doc.y;
    doc.text(amount, amountX, y, { width: 90, align: "right" });
    doc.y = Math.max(after, doc.y);
    doc.x = left;
  };

  let group: string | null | undefined;
  for (const line of inv.lines) {
    if (line.groupLabel !== group) {
      group = line.groupLabel;
      doc.moveDown(0.4);
      doc.font("bold").fontSize(10).text(group ?? "Other items", left, doc.y, { width });
    }
    row(line.description, money(line.amountCents));
    doc.font("body").fontSize(7.5).fillColor("#555555");
    doc.text(`${quantityText(line.quantity, line.unit)} × ${money(line.unitPriceCents)}${line.unit === "hour" ? "/h" : ""} · ${taxCategoryLabels[line.category]}${line.discountCents ? ` · discount ${money(line.discountCents)}` : ""}`, left + 10, doc.y, { width: width - 110 });
    if (line.explanation) doc.text(line.explanation, left + 10, doc.y, { width: width - 110 });
    doc.fillColor("#000000");
    doc.x = left;
  }

  doc.moveDown(0.8);
  doc.moveTo(left, doc.y).lineTo(left + width, doc.y).stroke();
  doc.moveDown(0.4);
  row("Subtotal", money(inv.subtotalCents));
  if (inv.discountCents) row("Discounts", `−${money(inv.discountCents)}`);
  for (const t of inv.taxRows) {
    row(`Tax ${taxCategoryLabels[t.category]} ${formatTaxRate(t.ratePpm)} on ${money(t.netCents)}`, money(t.taxCents));
  }
  row("Total", money(inv.totalCents), { bold: true, size: 10 });
  if (inv.depositAppliedCents) row("Deposit paid", `−${money(inv.depositAppliedCents)}`);
  if (inv.creditAppliedCents) row("Credit applied", `−${money(inv.creditAppliedCents)}`);
  for (const pay of inv.payments.filter((x) => !x.reversedAt)) {
    row(`Payment ${pay.receivedOn} (${paymentMethodLabels[pay.method]}${pay.reference ? ` ${pay.reference}` : ""})`, `−${money(pay.appliedCents)}`);
  }
  for (const note of inv.creditNotes) row(`Credit note ${note.number}`, `−${money(Math.min(note.totalCents, inv.creditedCents))}`);
  row("Balance due", money(inv.balanceCents), { bold: true, size: 11 });

  doc.moveDown(1.2);
  doc.font("bold").fontSize(9).text("How to pay", left, doc.y, { width });
  doc.font("body").text(p.paymentInstructions ?? "Cash, cheque or bank transfer; quote the invoice number.", { width });
  // The online pay link goes here when card payments arrive.
  return pdfToBuffer(doc);
}

export async function invoicePdfFor(db: DbOrTx, invoice: InvoiceDetailDto): Promise<Buffer> {
  const studio = await loadStudio(db);
  const settings = await loadInvoiceSettings(db);
  const [client] = await db.select({ name: clientAccounts.name, billingAddress: clientAccounts.billingAddress }).from(clientAccounts).where(eq(clientAccounts.id, invoice.clientAccountId));
  return renderInvoicePdf({ invoice, studio, taxNumber: settings.taxNumber, paymentInstructions: settings.paymentInstructions, paper: settings.paperSize, client: client! });
}

export const invoiceFileName = (invoice: InvoiceDetailDto) => `${invoice.number ?? `draft-${invoice.id}`}.pdf`;
