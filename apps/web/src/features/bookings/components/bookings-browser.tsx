import { useMemo, useState } from "react";
import { bookingStatuses, bookingStatusLabels, formatMoney, roomColourHex, type BookingDto, type BookingStatus, type ClientSummaryDto, type RoomDto } from "@takeup/domain";
import { DataTable, type ColumnDef } from "../../../components/ui/data-table.tsx";
import { FormField } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { Select } from "../../../components/ui/select.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { addDays, daysBetween, formatDayShort, formatTimeRange, studioDaysRange, studioToday } from "../../../lib/studio-time.ts";
import { useBookings } from "../api/get-bookings.ts";
import { BookingStatusBadge, statusText } from "./booking-status.tsx";

const maxSpanDays = 62;

type BookingsBrowserProps = {
  rooms: RoomDto[];
  clients: ClientSummaryDto[];
  timeZone: string;
  onOpenBooking: (bookingId: number) => void;
};

/** The bookings list: a date range (at most 62 days) and filters the API applies, then sorting and pages here. */
export function BookingsBrowser({ rooms, clients, timeZone, onOpenBooking }: BookingsBrowserProps) {
  const today = studioToday(timeZone);
  const [from, setFrom] = useState(today);
  const [to, setTo] = useState(addDays(today, 30));
  const [roomId, setRoomId] = useState("");
  const [status, setStatus] = useState<BookingStatus | "">("");
  const [clientId, setClientId] = useState("");

  const span = /^\d{4}-\d{2}-\d{2}$/.test(from) && /^\d{4}-\d{2}-\d{2}$/.test(to) ? daysBetween(from, to) + 1 : NaN;
  const wanted = Number.isFinite(span) && span >= 1 ? studioDaysRange(from, span, timeZone) : null;
  const rangeProblem = !wanted
    ? Number.isFinite(span)
      ? "The end date comes before the start date."
      : "Choose both dates."
    : // Measured in hours, as the API does: across a clock change 62 studio days can be an hour longer.
      Date.parse(wanted.to) - Date.parse(wanted.from) > maxSpanDays * 86_400_000
      ? `Choose at most ${maxSpanDays} days at a time.`
      : null;
  const range = wanted ?? studioDaysRange(today, 1, timeZone);
  const bookings = useBookings(
    {
      ...range,
      ...(roomId ? { roomId: Number(roomId) } : {}),
      ...(status ? { status } : {}),
      ...(clientId ? { clientAccountId: Number(clientId) } : {}),
    },
    { enabled: rangeProblem === null, keepPrevious: true },
  );

  const columns = useMemo<ColumnDef<BookingDto>[]>(
    () => [
      {
        id: "id",
        header: "#",
        accessorFn: (b) => b.id,
        cell: ({ row }) => (
          <button
            type="button"
            className="font-semibold text-rust-deep underline-offset-2 hover:underline"
            aria-label={`Open booking #${row.original.id}`}
            onClick={() => onOpenBooking(row.original.id)}
          >
            #{row.original.id}
          </button>
        ),
      },
      {
        id: "when",
        header: "When",
        accessorFn: (b) => b.startsAt,
        cell: ({ row }) => formatTimeRange(row.original.startsAt, row.original.endsAt, timeZone, { withDay: true }),
      },
      {
        id: "room",
        header: "Room",
        accessorFn: (b) => b.room.name,
        cell: ({ row }) => (
          <span className="flex items-center gap-1.5">
            <span aria-hidden="true" className="size-2.5 rounded-sm" style={{ backgroundColor: roomColourHex[row.original.room.colour] }} />
            {row.original.room.name}
          </span>
        ),
      },
      {
        id: "client",
        header: "Client and project",
        // The project rides along so searching finds it too.
        accessorFn: (b) => (b.project ? `${b.client.name} · ${b.project.name}` : b.client.name),
        cell: ({ row }) => (
          <span>
            {row.original.client.name}
            {row.original.project ? <span className="text-muted"> · {row.original.project.name}</span> : null}
          </span>
        ),
      },
      { id: "status", header: "Status", accessorFn: (b) => statusText(b), cell: ({ row }) => <BookingStatusBadge booking={row.original} /> },
      {
        id: "engineers",
        header: "Engineers",
        accessorFn: (b) => b.engineers.map((e) => e.name).join(", "),
        cell: ({ row }) =>
          row.original.engineers.length > 0 ? row.original.engineers.map((e) => e.name).join(", ") : <span className="text-muted">—</span>,
      },
      {
        id: "total",
        header: "Quoted",
        accessorFn: (b) => b.quoteTotalCents,
        cell: ({ row }) => formatMoney(row.original.quoteTotalCents, row.original.quote.currency),
      },
      {
        id: "deposit",
        header: "Deposit",
        accessorFn: (b) => (b.depositRequiredCents === 0 ? "None" : b.depositReceivedAt ? "Received" : "Due"),
        cell: ({ row }) => {
          const b = row.original;
          if (b.depositRequiredCents === 0) return <span className="text-muted">None</span>;
          return `${formatMoney(b.depositRequiredCents, b.quote.currency)} ${b.depositReceivedAt ? "received" : "due"}`;
        },
      },
    ],
    [timeZone, onOpenBooking],
  );

  const activeRooms = rooms.filter((r) => r.active).sort((a, b) => a.position - b.position);
  const sortedClients = [...clients].sort((a, b) => a.name.localeCompare(b.name));

  return (
    <div className="flex flex-col gap-4">
      <form
        aria-label="Filter bookings"
        onSubmit={(event) => event.preventDefault()}
        className="grid gap-3 rounded-lg border border-line bg-card p-3 sm:grid-cols-3 lg:grid-cols-5"
      >
        <FormField label="From" error={rangeProblem ?? undefined}>
          {(field) => <Input {...field} type="date" value={from} onChange={(e) => setFrom(e.target.value)} className="h-9" />}
        </FormField>
        <FormField label="To">
          {(field) => <Input {...field} type="date" value={to} onChange={(e) => setTo(e.target.value)} className="h-9" />}
        </FormField>
        <FormField label="Room">
          {(field) => (
            <Select {...field} value={roomId} onChange={(e) => setRoomId(e.target.value)}>
              <option value="">All rooms</option>
              {activeRooms.map((room) => (
                <option key={room.id} value={room.id}>
                  {room.name}
                </option>
              ))}
            </Select>
          )}
        </FormField>
        <FormField label="Status">
          {(field) => (
            <Select {...field} value={status} onChange={(e) => setStatus(e.target.value as BookingStatus | "")}>
              <option value="">Any status</option>
              {bookingStatuses.map((s) => (
                <option key={s} value={s}>
                  {bookingStatusLabels[s]}
                </option>
              ))}
            </Select>
          )}
        </FormField>
        <FormField label="Client">
          {(field) => (
            <Select {...field} value={clientId} onChange={(e) => setClientId(e.target.value)}>
              <option value="">All clients</option>
              {sortedClients.map((client) => (
                <option key={client.id} value={client.id}>
                  {client.name}
                </option>
              ))}
            </Select>
          )}
        </FormField>
      </form>
      <p className="text-sm text-muted">
        {rangeProblem ? null : `${formatDayShort(from)} to ${formatDayShort(to)}, studio time.`}
      </p>
      {rangeProblem ? null : bookings.isError ? (
        <ErrorState error={bookings.error} onRetry={() => void bookings.refetch()} />
      ) : bookings.isPending ? (
        <LoadingState label="Loading bookings…" />
      ) : (
        <DataTable
          label="Bookings"
          filterLabel="Search these bookings"
          data={bookings.data}
          columns={columns}
          getRowId={(b) => String(b.id)}
          initialSorting={[{ id: "when", desc: false }]}
          emptyMessage="No bookings match these filters."
          onRowClick={(b) => onOpenBooking(b.id)}
        />
      )}
    </div>
  );
}
