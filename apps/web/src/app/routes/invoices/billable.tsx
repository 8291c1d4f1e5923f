import { useState } from "react";
import { useNavigate, useParams } from "react-router";
import { formatMoney } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { FormAlert } from "../../../components/ui/form-field.tsx";
import { PageHeader } from "../../../components/ui/page-header.tsx";
import { EmptyState, ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { paths } from "../../../config/paths.ts";
import { errorMessage } from "../../../lib/api-client.ts";
import { useClient } from "../../../features/clients/api/get-client.ts";
import { useBillable, useCreateInvoice } from "../../../features/invoices/api/invoices.ts";
import { useStudio } from "../../../features/studio/api/get-studio.ts";
import { useSignedInUser } from "../../use-signed-in-user.ts";

/** A client's wrapped sessions (and, later, tape and storage) not yet invoiced: tick them and invoice them. */
export function BillableRoute() {
  const me = useSignedInUser();
  const clientId = Number(useParams().clientId);
  const client = useClient(clientId);
  const studio = useStudio();
  const billable = useBillable(clientId);
  const create = useCreateInvoice();
  const navigate = useNavigate();
  const [chosen, setChosen] = useState<string[]>([]);
  const canInvoice = me.role === "owner" || me.role === "manager";
  const currency = studio.data?.currency ?? "USD";

  if (billable.isPending) return <LoadingState />;
  if (billable.isError) return <ErrorState error={billable.error} onRetry={() => void billable.refetch()} />;
  const items = billable.data;
  const key = (i: { kind: string; id: string }) => `${i.kind}:${i.id}`;
  const total = items.filter((i) => chosen.includes(key(i))).reduce((s, i) => s + i.amountCents, 0);

  function invoiceThese(manualOnly = false) {
    create.mutate(
      manualOnly
        ? { clientAccountId: clientId, sources: [], manualLines: [{ description: "New item", category: "other", quantity: 1, unitPriceCents: 0 }] }
        : { clientAccountId: clientId, sources: items.filter((i) => chosen.includes(key(i))).map((i) => ({ kind: i.kind as "booking", id: i.id })) },
      { onSuccess: (invoice) => navigate(paths.invoices.detail.getHref(invoice.id)) },
    );
  }

  return (
    <>
      <PageHeader eyebrow={client.data?.name} title="Billable items" description="Wrapped sessions not yet on an invoice. Each can be invoiced once." />
      {items.length === 0 ? (
        <EmptyState title="Nothing to bill">Every wrapped session of this client is on an invoice.</EmptyState>
      ) : (
        <ul className="mb-4 flex flex-col gap-2" aria-label="Billable items">
          {items.map((item) => (
            <li key={key(item)} className="rounded-lg border border-line bg-card px-4 py-3">
              <label className="flex items-start gap-3">
                <input
                  type="checkbox"
                  className="mt-1"
                  checked={chosen.includes(key(item))}
                  disabled={!canInvoice}
                  onChange={(e) => setChosen((c) => (e.target.checked ? [...c, key(item)] : c.filter((x) => x !== key(item))))}
                />
                <span className="flex-1">
                  <span className="font-semibold">{item.description}</span>
                  <span className="ml-2 tabular-nums">{formatMoney(item.amountCents, currency)}</span>
                  <ul className="mt-1 text-sm text-muted">
                    {item.lines.map((l, i) => (
                      <li key={i}>
                        {l.description}: {formatMoney(l.amountCents, currency)}
                      </li>
                    ))}
                  </ul>
                </span>
              </label>
            </li>
          ))}
        </ul>
      )}
      <FormAlert message={create.isError ? errorMessage(create.error) : null} />
      {canInvoice ? (
        <div className="mt-3 flex flex-wrap items-center gap-3">
          <Button disabled={chosen.length === 0} pending={create.isPending} onClick={() => invoiceThese()}>
            Invoice these ({formatMoney(total, currency)})
          </Button>
          <Button variant="secondary" pending={create.isPending} onClick={() => invoiceThese(true)}>
            Start a draft with a manual line
          </Button>
        </div>
      ) : null}
    </>
  );
}
