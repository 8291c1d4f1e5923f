import { useMemo } from "react";
import { Link } from "react-router";
import { clientKindLabels, type ClientSummaryDto } from "@takeup/domain";
import { paths } from "../../../config/paths.ts";
import { Badge } from "../../../components/ui/badge.tsx";
import { DataTable, type ColumnDef } from "../../../components/ui/data-table.tsx";

type ClientsTableProps = { clients: ClientSummaryDto[] };

const dash = <span className="text-muted">—</span>;

export function ClientsTable({ clients }: ClientsTableProps) {
  const columns = useMemo<ColumnDef<ClientSummaryDto>[]>(
    () => [
      {
        id: "name",
        header: "Name",
        accessorFn: (c) => c.name,
        cell: ({ row }) => (
          <Link to={paths.clients.detail.getHref(row.original.id)} className="font-medium text-rust-deep underline-offset-2 hover:underline">
            {row.original.name}
          </Link>
        ),
      },
      { id: "kind", header: "Kind", accessorFn: (c) => clientKindLabels[c.kind] },
      { id: "primaryContact", header: "Primary contact", accessorFn: (c) => c.primaryContact ?? "", cell: ({ row }) => row.original.primaryContact ?? dash },
      { id: "email", header: "E-mail", accessorFn: (c) => c.email ?? "", cell: ({ row }) => row.original.email ?? dash },
      {
        id: "phone",
        header: "Phone",
        accessorFn: (c) => c.phone ?? "",
        cell: ({ row }) => <span className="whitespace-nowrap">{row.original.phone ?? dash}</span>,
      },
      { id: "userCount", header: "Sign-ins", accessorFn: (c) => c.userCount, sortDescFirst: true },
      {
        id: "status",
        header: "Status",
        accessorFn: (c) => (c.active ? "Active" : "Inactive"),
        cell: ({ row }) => (row.original.active ? <Badge>Active</Badge> : <Badge tone="muted">Inactive</Badge>),
      },
    ],
    [],
  );

  return (
    <DataTable
      label="Clients"
      filterLabel="Filter clients"
      data={clients}
      columns={columns}
      getRowId={(c) => String(c.id)}
      pageSize={25}
      initialSorting={[{ id: "name", desc: false }]}
      emptyMessage="No clients yet."
    />
  );
}
