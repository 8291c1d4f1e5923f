import { useMemo, useState } from "react";
import { computeInvoice, formatMoney, quantityScale, taxCategories, taxCategoryLabels, type InvoiceDetailDto, type TaxCategory } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { FormAlert } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { Select } from "../../../components/ui/select.tsx";
import { errorMessage } from "../../../lib/api-client.ts";
import { useInvoiceSettings, useUpdateDraft } from "../api/invoices.ts";
import { parseMoney } from "./money-input.ts";
import { TaxCaution } from "./tax-caution.tsx";

type ManualRow = { description: string; category: TaxCategory; quantity: string; unitPrice: string };

const toRow = (l: InvoiceDetailDto["lines"][number]): ManualRow => ({ description: l.description, category: l.category, quantity: String(l.quantity), unitPrice: (l.unitPriceCents / 100).toFixed(2) });

/** A draft's manual lines and invoice discount, with the totals previewed live by the same rules the API uses. */
export function DraftEditor({ invoice }: { invoice: InvoiceDetailDto }) {
  const settings = useInvoiceSettings();
  const save = useUpdateDraft(invoice.id);
  const sourced = invoice.lines.filter((l) => l.sourceKind !== "manual");
  const [rows, setRows] = useState<ManualRow[]>(invoice.lines.filter((l) => l.sourceKind === "manual").map(toRow));
  const [discountPercent, setDiscountPercent] = useState(invoice.invoiceDiscount?.kind === "percent" ? String(invoice.invoiceDiscount.bp / 100) : "");

  const parsed = rows.map((r) => ({ ...r, q: Number(r.quantity), price: parseMoney(r.unitPrice) }));
  const valid = parsed.every((r) => r.description.trim() && Number.isFinite(r.q) && r.q >= 0 && r.price !== null);
  const bp = discountPercent.trim() === "" ? null : Math.round(Number(discountPercent) * 100);
  const preview = useMemo(() => {
    if (!settings.data || !valid || (bp !== null && !(bp >= 0 && bp <= 10_000))) return null;
    return computeInvoice({
      lines: [
        ...sourced.map((l) => ({ category: l.category, quantityMilli: Math.round(l.quantity * quantityScale), unitPriceMinor: l.unitPriceCents, fixedAmountMinor: l.amountCents, discount: l.discount ? (l.discount.kind === "percent" ? l.discount : { kind: "amount" as const, amountMinor: l.discount.amountCents }) : null })),
        ...parsed.map((r) => ({ category: r.category, quantityMilli: Math.round(r.q * quantityScale), unitPriceMinor: r.price! })),
      ],
      invoiceDiscount: bp ? { kind: "percent", bp } : null,
      tax: { rates: settings.data.taxRates, calculation: settings.data.taxCalculation, rounding: settings.data.taxRounding },
    });
  }, [settings.data, valid, bp, sourced, parsed]);

  const money = (m: number) => formatMoney(m, invoice.currency);
  const set = (i: number, patch: Partial<ManualRow>) => setRows((all) => all.map((r, j) => (j === i ? { ...r, ...patch } : r)));

  return (
    <div className="flex flex-col gap-3">
      <h3 className="font-semibold">Manual lines</h3>
      {rows.map((row, i) => (
        <div key={i} className="grid gap-2 sm:grid-cols-[2fr_1fr_0.6fr_0.8fr_auto]">
          <Input aria-label={`Line ${i + 1} description`} value={row.description} onChange={(e) => set(i, { description: e.target.value })} />
          <Select aria-label={`Line ${i + 1} category`} value={row.category} onChange={(e) => set(i, { category: e.target.value as TaxCategory })}>
            {taxCategories.map((c) => (
              <option key={c} value={c}>
                {taxCategoryLabels[c]}
              </option>
            ))}
          </Select>
          <Input aria-label={`Line ${i + 1} quantity`} inputMode="decimal" value={row.quantity} onChange={(e) => set(i, { quantity: e.target.value })} />
          <Input aria-label={`Line ${i + 1} unit price`} inputMode="decimal" value={row.unitPrice} onChange={(e) => set(i, { unitPrice: e.target.value })} />
          <Button variant="ghost" size="sm" onClick={() => setRows((all) => all.filter((_, j) => j !== i))}>
            Remove
          </Button>
        </div>
      ))}
      <div>
        <Button variant="secondary" size="sm" onClick={() => setRows((all) => [...all, { description: "", category: "other", quantity: "1", unitPrice: "0.00" }])}>
          Add a line
        </Button>
      </div>
      <label className="flex max-w-xs flex-col gap-1 text-sm font-semibold">
        Discount on the whole invoice (%)
        <Input inputMode="decimal" value={discountPercent} onChange={(e) => setDiscountPercent(e.target.value)} />
      </label>
      {preview ? (
        <dl className="grid max-w-sm grid-cols-2 gap-1 text-sm tabular-nums" aria-label="Live totals">
          <dt>Subtotal</dt>
          <dd className="text-right">{money(preview.subtotalMinor)}</dd>
          <dt>Discounts</dt>
          <dd className="text-right">−{money(preview.discountMinor)}</dd>
          <dt>Tax</dt>
          <dd className="text-right">{money(preview.taxMinor)}</dd>
          <dt className="font-semibold">Total</dt>
          <dd className="text-right font-semibold">{money(preview.totalMinor)}</dd>
        </dl>
      ) : (
        <p className="text-sm text-muted">Fill in every line to see the totals.</p>
      )}
      <TaxCaution />
      <FormAlert message={save.isError ? errorMessage(save.error) : null} />
      <div>
        <Button
          pending={save.isPending}
          disabled={!valid}
          onClick={() =>
            save.mutate({
              manualLines: parsed.map((r) => ({ description: r.description.trim(), category: r.category, quantity: r.q, unitPriceCents: r.price! })),
              invoiceDiscount: bp ? { kind: "percent", bp } : null,
            })
          }
        >
          Save draft
        </Button>
      </div>
    </div>
  );
}
