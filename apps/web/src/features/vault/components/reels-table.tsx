import { useMemo } from "react";
import { Link } from "react-router";
import { reelStatusLabels, type ReelSummaryDto } from "@takeup/domain";
import { Badge } from "../../../components/ui/badge.tsx";
import { DataTable, type ColumnDef } from "../../../components/ui/data-table.tsx";
import { reelFormat } from "./reel-format.ts";

export function ReelsTable({ reels, reelHref, showClient }: { reels: ReelSummaryDto[]; reelHref: (id: number) => string; showClient: boolean }) {
  const columns = useMemo<ColumnDef<ReelSummaryDto>[]>(
    () => [
      {
        id: "label",
        header: "Label",
        accessorKey: "labelId",
        cell: ({ row }) => (
          <Link to={reelHref(row.original.id)} className="font-mono font-semibold text-rust-deep underline-offset-2 hover:underline">
            {row.original.labelId}
          </Link>
        ),
      },
      ...(showClient ? [{ id: "client", header: "Client", accessorKey: "clientName" } satisfies ColumnDef<ReelSummaryDto>] : []),
      { id: "project", header: "Project", accessorFn: (r) => r.projectName ?? "—" },
      { id: "format", header: "Format", accessorFn: (r) => reelFormat(r), enableSorting: false },
      { id: "contents", header: "Contents", accessorFn: (r) => r.contentsNote ?? "" },
      { id: "shelf", header: "Shelf", accessorFn: (r) => r.shelf ?? "—" },
      {
        id: "status",
        header: "Where",
        accessorKey: "status",
        cell: ({ row }) => (
          <Badge tone={row.original.status === "in_vault" ? "neutral" : row.original.status === "checked_out" ? "accent" : "muted"}>
            {reelStatusLabels[row.original.status]}
            {row.original.dueBack ? `, due back ${row.original.dueBack}` : ""}
          </Badge>
        ),
      },
    ],
    [reelHref, showClient],
  );
  return <DataTable label="Reels" data={reels} columns={columns} getRowId={(r) => String(r.id)} hideFilter pageSize={25} emptyMessage="No reels match." />;
}
