import { useMemo, type ReactNode } from "react";
import { formatMoney, type RoomDto } from "@takeup/domain";
import { Badge } from "../../../components/ui/badge.tsx";
import { Button } from "../../../components/ui/button.tsx";
import { DataTable, type ColumnDef } from "../../../components/ui/data-table.tsx";
import { RateCardHistory } from "./rate-card-history.tsx";
import { RoomSwatch } from "./room-swatch.tsx";
import { roomColourLabels } from "./room-labels.ts";

type RoomsTableProps = {
  rooms: RoomDto[];
  currency: string;
  timeZone: string;
  canEdit: boolean;
  canSeeRates: boolean;
  onEdit: (room: RoomDto) => void;
  onNewRateCard: (room: RoomDto) => void;
  /** More actions per room that other parts of the app supply, such as the calendar feed. */
  renderActions?: (room: RoomDto) => ReactNode;
};

const dash = <span className="text-muted">—</span>;

export function RoomsTable({ rooms, currency, timeZone, canEdit, canSeeRates, onEdit, onNewRateCard, renderActions }: RoomsTableProps) {
  const columns = useMemo<ColumnDef<RoomDto>[]>(
    () => [
      {
        id: "name",
        header: "Room",
        accessorFn: (r) => r.name,
        cell: ({ row }) => (
          <span className="flex items-center gap-2 font-medium">
            <RoomSwatch colour={row.original.colour} />
            {row.original.name}
            <span className="sr-only">, {roomColourLabels[row.original.colour]}</span>
            {row.original.active ? null : <Badge tone="muted">Not in use</Badge>}
          </span>
        ),
      },
      { id: "capacity", header: "Capacity", accessorFn: (r) => r.capacity, cell: ({ row }) => `${row.original.capacity} people` },
      { id: "turnover", header: "Turnover", accessorFn: (r) => r.turnoverMinutes, cell: ({ row }) => `${row.original.turnoverMinutes} min` },
      {
        id: "hourly",
        header: "Hourly rate",
        accessorFn: (r) => r.currentRateCard?.hourlyRateCents ?? -1,
        cell: ({ row }) => (row.original.currentRateCard ? formatMoney(row.original.currentRateCard.hourlyRateCents, currency) : dash),
      },
      {
        id: "day",
        header: "Day rate",
        accessorFn: (r) => r.currentRateCard?.dayRateCents ?? -1,
        cell: ({ row }) => {
          const card = row.original.currentRateCard;
          return card ? `${formatMoney(card.dayRateCents, currency)} / ${card.dayCoversMinutes / 60} h` : dash;
        },
      },
      {
        id: "actions",
        header: () => <span className="sr-only">Actions</span>,
        enableSorting: false,
        cell: ({ row }) => {
          const room = row.original;
          return (
            <div className="flex items-center justify-end gap-1">
              {canSeeRates ? (
                <Button
                  variant="ghost"
                  size="sm"
                  aria-expanded={row.getIsExpanded()}
                  aria-label={`Rate card history for ${room.name}`}
                  onClick={() => row.toggleExpanded()}
                >
                  History
                </Button>
              ) : null}
              {canEdit ? (
                <>
                  <Button variant="ghost" size="sm" aria-label={`New rate card version for ${room.name}`} onClick={() => onNewRateCard(room)}>
                    New rate card
                  </Button>
                  <Button variant="ghost" size="sm" aria-label={`Edit ${room.name}`} onClick={() => onEdit(room)}>
                    Edit
                  </Button>
                </>
              ) : null}
              {renderActions?.(room)}
            </div>
          );
        },
      },
    ],
    [currency, canEdit, canSeeRates, onEdit, onNewRateCard, renderActions],
  );

  // In calendar order until someone sorts by a column.
  const ordered = useMemo(() => [...rooms].sort((a, b) => a.position - b.position), [rooms]);

  return (
    <DataTable
      label="Rooms"
      filterLabel="Filter rooms"
      hideFilter={rooms.length < 8}
      data={ordered}
      columns={columns}
      getRowId={(r) => String(r.id)}
      emptyMessage="No rooms yet. Add the first one to start booking."
      renderSubRow={canSeeRates ? (room) => <RateCardHistory room={room} currency={currency} timeZone={timeZone} /> : undefined}
    />
  );
}
