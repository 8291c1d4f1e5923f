import { useState, type FormEvent } from "react";
import { formatMoney, type InvoiceDetailDto } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { FormAlert, FormField } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { errorMessage } from "../../../lib/api-client.ts";
import { useCreditNote } from "../api/invoices.ts";

/** Correct an issued invoice: credit the chosen lines, or everything not yet credited. */
export function CreditNoteForm({ invoice }: { invoice: InvoiceDetailDto }) {
  const credit = useCreditNote(invoice.id);
  const credited = new Set(invoice.creditNotes.flatMap((n) => n.lines.map((l) => l.invoiceLineId)));
  const open = invoice.lines.filter((l) => !credited.has(l.id));
  const [chosen, setChosen] = useState<number[]>([]);
  const [reason, setReason] = useState("");

  function submit(event: FormEvent) {
    event.preventDefault();
    credit.mutate({ reason, lineIds: chosen.length ? chosen : undefined }, { onSuccess: () => (setChosen([]), setReason("")) });
  }

  if (open.length === 0) return <p className="text-sm text-muted">Every line is already credited.</p>;
  return (
    <form onSubmit={submit} className="flex flex-col gap-3" aria-label="Issue a credit note">
      <fieldset className="flex flex-col gap-1">
        <legend className="mb-1 text-sm font-semibold">Lines to credit (none chosen: the whole invoice)</legend>
        {open.map((line) => (
          <label key={line.id} className="flex items-center gap-2 text-sm">
            <input
              type="checkbox"
              checked={chosen.includes(line.id)}
              onChange={(e) => setChosen((c) => (e.target.checked ? [...c, line.id] : c.filter((x) => x !== line.id)))}
            />
            {line.description} — {formatMoney(line.netCents + line.taxCents, invoice.currency)}
          </label>
        ))}
      </fieldset>
      <FormField label="Reason">{(c) => <Input {...c} value={reason} onChange={(e) => setReason(e.target.value)} />}</FormField>
      <FormAlert message={credit.isError ? errorMessage(credit.error) : null} />
      <div>
        <Button type="submit" variant="secondary" pending={credit.isPending} disabled={!reason.trim()}>
          Issue credit note
        </Button>
      </div>
    </form>
  );
}
