import { useMemo } from "react";
import { equipmentKindLabels, tapeWidthLabel, type EquipmentDto } from "@takeup/domain";
import { Badge } from "../../../components/ui/badge.tsx";
import { Button } from "../../../components/ui/button.tsx";
import { DataTable, type ColumnDef } from "../../../components/ui/data-table.tsx";

type EquipmentTableProps = { equipment: EquipmentDto[]; canEdit: boolean; onEdit: (item: EquipmentDto) => void };

const dash = <span className="text-muted">—</span>;

export function EquipmentTable({ equipment, canEdit, onEdit }: EquipmentTableProps) {
  const columns = useMemo<ColumnDef<EquipmentDto>[]>(
    () => [
      { id: "name", header: "Name", accessorFn: (e) => e.name, cell: ({ row }) => <span className="font-medium">{row.original.name}</span> },
      { id: "kind", header: "Kind", accessorFn: (e) => equipmentKindLabels[e.kind] },
      { id: "home", header: "Home room", accessorFn: (e) => e.homeRoomName ?? "", cell: ({ row }) => row.original.homeRoomName ?? "Stores" },
      { id: "tracks", header: "Tracks", accessorFn: (e) => e.trackCount ?? 0, cell: ({ row }) => row.original.trackCount ?? dash },
      {
        id: "width",
        header: "Tape width",
        accessorFn: (e) => e.tapeWidthMils ?? 0,
        cell: ({ row }) => (row.original.tapeWidthMils ? tapeWidthLabel(row.original.tapeWidthMils) : dash),
      },
      {
        id: "speeds",
        header: "Speeds",
        accessorFn: (e) => e.speedsIps.join(", "),
        cell: ({ row }) => (row.original.speedsIps.length > 0 ? `${row.original.speedsIps.join(", ")} in/s` : dash),
      },
      {
        id: "notes",
        header: "Notes",
        accessorFn: (e) => e.notes ?? "",
        cell: ({ row }) => <span className="block max-w-40 truncate whitespace-nowrap" title={row.original.notes ?? undefined}>{row.original.notes ?? dash}</span>,
      },
      {
        id: "status",
        header: "Status",
        accessorFn: (e) => (e.active ? "In service" : "Retired"),
        cell: ({ row }) => (row.original.active ? <Badge>In service</Badge> : <Badge tone="muted">Retired</Badge>),
      },
      ...(canEdit
        ? [
            {
              id: "actions",
              header: () => <span className="sr-only">Actions</span>,
              enableSorting: false,
              cell: ({ row }) => (
                <Button variant="ghost" size="sm" aria-label={`Edit ${row.original.name}`} onClick={() => onEdit(row.original)}>
                  Edit
                </Button>
              ),
            } satisfies ColumnDef<EquipmentDto>,
          ]
        : []),
    ],
    [canEdit, onEdit],
  );

  return (
    <DataTable
      label="Equipment"
      filterLabel="Filter equipment"
      data={equipment}
      columns={columns}
      getRowId={(e) => String(e.id)}
      initialSorting={[{ id: "name", desc: false }]}
      emptyMessage="No equipment listed yet."
    />
  );
}
