import { useState } from "react";
import { Link } from "react-router";
import { buttonStyles } from "../../../components/ui/button.tsx";
import { paths } from "../../../config/paths.ts";
import { invoiceStatuses, invoiceStatusLabels } from "@takeup/domain";
import { PageHeader } from "../../../components/ui/page-header.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { Select } from "../../../components/ui/select.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { useClients } from "../../../features/clients/api/get-clients.ts";
import { useInvoices, type InvoiceFilters } from "../../../features/invoices/api/invoices.ts";
import { InvoicesTable } from "../../../features/invoices/components/invoices-table.tsx";
import { useSignedInUser } from "../../use-signed-in-user.ts";

export function InvoicesRoute() {
  const me = useSignedInUser();
  const staff = me.role !== "client";
  const clients = useClients({ enabled: staff });
  const [filters, setFilters] = useState<InvoiceFilters>({});
  const invoices = useInvoices(filters);
  const set = (patch: Partial<InvoiceFilters>) => setFilters((f) => ({ ...f, ...patch }));

  return (
    <>
      <PageHeader
        title="Invoices"
        description={staff ? "Drafts, issued invoices and what is still owed. Start a new invoice from a client's billable items." : "Your invoices and what is still owed."}
        actions={
          staff ? (
            <Link to={paths.invoiceSettings.getHref()} className={buttonStyles("secondary")}>
              Invoicing settings
            </Link>
          ) : null
        }
      />
      <div className="mb-4 flex flex-wrap items-end gap-3">
        <label className="flex flex-col gap-1 text-sm font-semibold">
          Status
          <Select size="sm" value={filters.status ?? ""} onChange={(e) => set({ status: (e.target.value || undefined) as InvoiceFilters["status"] })}>
            <option value="">Any</option>
            {invoiceStatuses.map((s) => (
              <option key={s} value={s}>
                {invoiceStatusLabels[s]}
              </option>
            ))}
          </Select>
        </label>
        {staff ? (
          <label className="flex flex-col gap-1 text-sm font-semibold">
            Client
            <Select size="sm" value={filters.clientAccountId ?? ""} onChange={(e) => set({ clientAccountId: e.target.value ? Number(e.target.value) : undefined })}>
              <option value="">Any</option>
              {(clients.data ?? []).map((c) => (
                <option key={c.id} value={c.id}>
                  {c.name}
                </option>
              ))}
            </Select>
          </label>
        ) : null}
        <label className="flex flex-col gap-1 text-sm font-semibold">
          Issued from
          <Input className="h-8" type="date" value={filters.from ?? ""} onChange={(e) => set({ from: e.target.value || undefined })} />
        </label>
        <label className="flex flex-col gap-1 text-sm font-semibold">
          to
          <Input className="h-8" type="date" value={filters.to ?? ""} onChange={(e) => set({ to: e.target.value || undefined })} />
        </label>
      </div>
      {invoices.isPending ? (
        <LoadingState />
      ) : invoices.isError ? (
        <ErrorState error={invoices.error} onRetry={() => void invoices.refetch()} />
      ) : (
        <InvoicesTable invoices={invoices.data} showClient={staff} />
      )}
    </>
  );
}
