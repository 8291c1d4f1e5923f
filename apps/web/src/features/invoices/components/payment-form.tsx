import { useState, type FormEvent } from "react";
import { paymentMethodLabels, paymentMethods, type PaymentMethod } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { FormAlert, FormField } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { Select } from "../../../components/ui/select.tsx";
import { errorMessage } from "../../../lib/api-client.ts";
import { useRecordPayment } from "../api/invoices.ts";
import { parseMoney } from "./money-input.ts";

/** Record a cash, cheque or bank-transfer payment; money beyond the balance needs a tick to become client credit. */
export function PaymentForm({ invoiceId, balanceCents }: { invoiceId: number; balanceCents: number }) {
  const record = useRecordPayment(invoiceId);
  const [method, setMethod] = useState<PaymentMethod>("cheque");
  const [amount, setAmount] = useState((balanceCents / 100).toFixed(2));
  const [receivedOn, setReceivedOn] = useState(new Date().toISOString().slice(0, 10));
  const [reference, setReference] = useState("");
  const [toCredit, setToCredit] = useState(false);
  const cents = parseMoney(amount);

  function submit(event: FormEvent) {
    event.preventDefault();
    if (cents === null) return;
    record.mutate(
      { method, amountCents: cents, receivedOn, reference: reference || undefined, overpaymentToCredit: toCredit || undefined },
      { onSuccess: () => setReference("") },
    );
  }

  return (
    <form onSubmit={submit} className="grid gap-3 sm:grid-cols-2" aria-label="Record a payment">
      <FormField label="Method">
        {(c) => (
          <Select {...c} value={method} onChange={(e) => setMethod(e.target.value as PaymentMethod)}>
            {paymentMethods.map((m) => (
              <option key={m} value={m}>
                {paymentMethodLabels[m]}
              </option>
            ))}
          </Select>
        )}
      </FormField>
      <FormField label="Amount" error={cents === null ? "Enter an amount such as 250.00" : undefined}>
        {(c) => <Input {...c} inputMode="decimal" value={amount} onChange={(e) => setAmount(e.target.value)} />}
      </FormField>
      <FormField label="Received on">{(c) => <Input {...c} type="date" value={receivedOn} onChange={(e) => setReceivedOn(e.target.value)} />}</FormField>
      <FormField label={method === "cheque" ? "Cheque number" : method === "bank_transfer" ? "Transfer reference" : "Reference"} optional>
        {(c) => <Input {...c} value={reference} onChange={(e) => setReference(e.target.value)} />}
      </FormField>
      {cents !== null && cents > balanceCents ? (
        <label className="flex items-center gap-2 text-sm sm:col-span-2">
          <input type="checkbox" checked={toCredit} onChange={(e) => setToCredit(e.target.checked)} />
          Keep the amount beyond the balance as credit for the client's next invoice
        </label>
      ) : null}
      <div className="sm:col-span-2">
        <FormAlert message={record.isError ? errorMessage(record.error) : null} />
      </div>
      <div className="sm:col-span-2">
        <Button type="submit" pending={record.isPending} disabled={cents === null}>
          Record payment
        </Button>
      </div>
    </form>
  );
}
