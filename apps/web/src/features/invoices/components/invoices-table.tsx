import { useMemo } from "react";
import { Link } from "react-router";
import { formatMoney, type InvoiceSummaryDto } from "@takeup/domain";
import { DataTable, type ColumnDef } from "../../../components/ui/data-table.tsx";
import { paths } from "../../../config/paths.ts";
import { InvoiceStatusBadge } from "./invoice-status.tsx";

const dash = <span className="text-muted">—</span>;

export function InvoicesTable({ invoices, showClient = true }: { invoices: InvoiceSummaryDto[]; showClient?: boolean }) {
  const columns = useMemo<ColumnDef<InvoiceSummaryDto>[]>(
    () => [
      {
        id: "number",
        header: "Number",
        // Drafts have no number yet; they sort after the numbered ones.
        accessorFn: (i) => i.number ?? `~draft ${String(i.id).padStart(8, "0")}`,
        cell: ({ row }) => (
          <Link to={paths.invoices.detail.getHref(row.original.id)} className="font-medium text-rust-deep underline-offset-2 hover:underline">
            {row.original.number ?? `Draft #${row.original.id}`}
          </Link>
        ),
      },
      ...(showClient ? [{ id: "client", header: "Client", accessorFn: (i: InvoiceSummaryDto) => i.clientName }] : []),
      { id: "issued", header: "Issued", accessorFn: (i) => i.issuedAt?.slice(0, 10) ?? "", cell: ({ row }) => row.original.issuedAt?.slice(0, 10) ?? dash },
      { id: "due", header: "Due", accessorFn: (i) => i.dueAt ?? "", cell: ({ row }) => row.original.dueAt ?? dash },
      { id: "total", header: "Total", accessorFn: (i) => i.totalCents, cell: ({ row }) => formatMoney(row.original.totalCents, row.original.currency) },
      { id: "balance", header: "Balance", accessorFn: (i) => i.balanceCents, cell: ({ row }) => formatMoney(row.original.balanceCents, row.original.currency) },
      { id: "status", header: "Status", accessorFn: (i) => i.status, cell: ({ row }) => <InvoiceStatusBadge status={row.original.status} /> },
      { id: "overdue", header: "Days overdue", accessorFn: (i) => i.daysOverdue, cell: ({ row }) => (row.original.daysOverdue > 0 ? row.original.daysOverdue : dash) },
    ],
    [showClient],
  );
  return (
    <DataTable
      label="Invoices"
      filterLabel="Filter invoices"
      data={invoices}
      columns={columns}
      getRowId={(i) => String(i.id)}
      initialSorting={[{ id: "number", desc: true }]}
      emptyMessage="No invoices match."
    />
  );
}
