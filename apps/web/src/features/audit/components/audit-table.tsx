import { useMemo } from "react";
import type { AuditEventDto } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { DataTable, type ColumnDef } from "../../../components/ui/data-table.tsx";
import { formatStudioDateTime } from "../../../lib/dates.ts";
import { describeAction, describeActor, describeEntity, showJson } from "./describe-event.ts";

type AuditTableProps = { events: AuditEventDto[]; timeZone: string };

export function AuditTable({ events, timeZone }: AuditTableProps) {
  const columns = useMemo<ColumnDef<AuditEventDto>[]>(
    () => [
      {
        id: "at",
        header: "When",
        accessorFn: (e) => e.at,
        sortDescFirst: true,
        cell: ({ row }) => <span className="whitespace-nowrap">{formatStudioDateTime(row.original.at, timeZone)}</span>,
      },
      { id: "who", header: "Who", accessorFn: describeActor },
      { id: "action", header: "What", accessorFn: (e) => describeAction(e.action) },
      { id: "entity", header: "Entity", accessorFn: (e) => describeEntity(e.entityType, e.entityId) },
      {
        id: "details",
        header: () => <span className="sr-only">Details</span>,
        enableSorting: false,
        cell: ({ row }) => (
          <Button variant="ghost" size="sm" aria-expanded={row.getIsExpanded()} onClick={row.getToggleExpandedHandler()}>
            {row.getIsExpanded() ? "Hide details" : "Details"}
          </Button>
        ),
      },
    ],
    [timeZone],
  );

  return (
    <DataTable
      label="Activity"
      filterLabel="Filter activity"
      data={events}
      columns={columns}
      getRowId={(e) => String(e.id)}
      initialSorting={[{ id: "at", desc: true }]}
      emptyMessage="Nothing has been changed yet."
      renderSubRow={(event) => <EventDetails event={event} />}
    />
  );
}

function EventDetails({ event }: { event: AuditEventDto }) {
  return (
    <div className="grid gap-3 md:grid-cols-2">
      {(["before", "after"] as const).map((side) => (
        <div key={side} className="min-w-0">
          <p className="mb-1 text-xs font-semibold text-muted uppercase">{side === "before" ? "Before" : "After"}</p>
          <pre className="max-h-80 overflow-auto rounded-md border border-line bg-card p-3 font-mono text-xs leading-relaxed">
            {showJson(event[side])}
          </pre>
        </div>
      ))}
    </div>
  );
}
