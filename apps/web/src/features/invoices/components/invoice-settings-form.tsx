import { useState, type FormEvent } from "react";
import { formatTaxRate, taxCategories, taxCategoryLabels, type InvoiceSettingsDto, type TaxCategory } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { FormAlert, FormField } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { Select } from "../../../components/ui/select.tsx";
import { callApi, errorMessage } from "../../../lib/api-client.ts";
import { invoiceRoutes } from "@takeup/domain";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { invoiceKeys } from "../api/invoices.ts";
import { TaxCaution } from "./tax-caution.tsx";

/** "6.25" → 62 500 parts per million; null when it is not a rate with up to four decimals. */
const parseRate = (text: string) => (/^\d{1,2}(\.\d{1,4})?$/.test(text.trim()) ? Math.round(Number(text) * 10_000) : null);

/** The owner's invoicing settings: numbers, terms, tax per category with its calculation and rounding, paper. */
export function InvoiceSettingsForm({ settings, canEdit }: { settings: InvoiceSettingsDto; canEdit: boolean }) {
  const queryClient = useQueryClient();
  const save = useMutation({
    mutationFn: (body: Parameters<typeof callApi<typeof invoiceRoutes.updateSettings>>[1]["body"]) => callApi(invoiceRoutes.updateSettings, { body }),
    onSuccess: (data) => queryClient.setQueryData(invoiceKeys.settings(), data),
  });
  const [prefix, setPrefix] = useState(settings.invoicePrefix);
  const [terms, setTerms] = useState(String(settings.termsDays));
  const [rates, setRates] = useState<Record<TaxCategory, string>>(
    Object.fromEntries(taxCategories.map((c) => [c, formatTaxRate(settings.taxRates[c]).replace("%", "")])) as Record<TaxCategory, string>,
  );
  const [calculation, setCalculation] = useState(settings.taxCalculation);
  const [rounding, setRounding] = useState(settings.taxRounding);
  const [paper, setPaper] = useState(settings.paperSize);
  const [basis, setBasis] = useState(settings.billingBasis);
  const parsed = Object.fromEntries(taxCategories.map((c) => [c, parseRate(rates[c])])) as Record<TaxCategory, number | null>;
  const valid = Object.values(parsed).every((r) => r !== null) && /^\d{1,3}$/.test(terms);

  function submit(event: FormEvent) {
    event.preventDefault();
    save.mutate({
      invoicePrefix: prefix.trim().toUpperCase(),
      termsDays: Number(terms),
      taxRates: parsed as Record<TaxCategory, number>,
      taxCalculation: calculation,
      taxRounding: rounding,
      paperSize: paper,
      billingBasis: basis,
    });
  }

  return (
    <form onSubmit={submit} className="flex max-w-2xl flex-col gap-4" aria-label="Invoicing settings">
      <TaxCaution />
      <fieldset disabled={!canEdit} className="grid gap-3 sm:grid-cols-2">
        <FormField label="Invoice number prefix" hint="Numbers read PREFIX-YEAR-0001">
          {(c) => <Input {...c} value={prefix} onChange={(e) => setPrefix(e.target.value)} />}
        </FormField>
        <FormField label="Payment terms (days after issue)" hint="0 means due on receipt">
          {(c) => <Input {...c} inputMode="numeric" value={terms} onChange={(e) => setTerms(e.target.value)} />}
        </FormField>
        {taxCategories.map((c) => (
          <FormField key={c} label={`Tax on ${taxCategoryLabels[c].toLowerCase()} (%)`} error={parsed[c] === null ? "Use a rate such as 6.25" : undefined}>
            {(ctl) => <Input {...ctl} inputMode="decimal" value={rates[c]} onChange={(e) => setRates((r) => ({ ...r, [c]: e.target.value }))} />}
          </FormField>
        ))}
        <FormField label="Tax calculated">
          {(c) => (
            <Select {...c} value={calculation} onChange={(e) => setCalculation(e.target.value as typeof calculation)}>
              <option value="per_line">On each line</option>
              <option value="per_invoice">On the invoice, once per rate</option>
            </Select>
          )}
        </FormField>
        <FormField label="Tax rounding">
          {(c) => (
            <Select {...c} value={rounding} onChange={(e) => setRounding(e.target.value as typeof rounding)}>
              <option value="half_up">Half a cent or more rounds up</option>
              <option value="down">Round the tax down</option>
            </Select>
          )}
        </FormField>
        <FormField label="Paper">
          {(c) => (
            <Select {...c} value={paper} onChange={(e) => setPaper(e.target.value as typeof paper)}>
              <option value="LETTER">US Letter</option>
              <option value="A4">A4</option>
            </Select>
          )}
        </FormField>
        <FormField label="Sessions billed on">
          {(c) => (
            <Select {...c} value={basis} onChange={(e) => setBasis(e.target.value as typeof basis)}>
              <option value="booked">Booked time</option>
              <option value="actual">Actual time, with any overrun at the hourly rate</option>
            </Select>
          )}
        </FormField>
      </fieldset>
      <FormAlert message={save.isError ? errorMessage(save.error) : null} />
      {canEdit ? (
        <div>
          <Button type="submit" pending={save.isPending} disabled={!valid}>
            Save invoicing settings
          </Button>
        </div>
      ) : null}
    </form>
  );
}
