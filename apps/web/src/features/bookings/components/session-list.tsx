import { roomColourHex, type BookingDto } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { useToast } from "../../../components/ui/use-toast.ts";
import { errorMessage } from "../../../lib/api-client.ts";
import { formatDayLong, formatTimeRange, studioParts } from "../../../lib/studio-time.ts";
import { useStartBooking } from "../api/start-booking.ts";
import { useWrapBooking } from "../api/wrap-booking.ts";
import { BookingStatusBadge } from "./booking-status.tsx";

type SessionListProps = {
  bookings: BookingDto[];
  timeZone: string;
  /** An engineer sees the client and the others on the session; a client sees its own sessions. */
  audience: "engineer" | "client";
  /** The engineer looking, left out of "with …". */
  meId?: string;
  /** Start and wrap buttons where the API allows them. */
  showActions?: boolean;
  /** Days are headed with their date; leave off for a single day's list. */
  groupByDay?: boolean;
  newestFirst?: boolean;
};

/** Sessions as a readable list, grouped by studio day. */
export function SessionList({ bookings, timeZone, audience, meId, showActions = false, groupByDay = true, newestFirst = false }: SessionListProps) {
  const sorted = [...bookings].sort((a, b) => (newestFirst ? b.startsAt.localeCompare(a.startsAt) : a.startsAt.localeCompare(b.startsAt)));
  const days = new Map<string, BookingDto[]>();
  for (const booking of sorted) {
    const date = studioParts(booking.startsAt, timeZone).date;
    days.set(date, [...(days.get(date) ?? []), booking]);
  }

  const list = (items: BookingDto[]) => (
    <ul className="divide-y divide-line rounded-lg border border-line bg-card">
      {items.map((booking) => (
        <SessionItem key={booking.id} booking={booking} timeZone={timeZone} audience={audience} meId={meId} showActions={showActions} />
      ))}
    </ul>
  );

  if (!groupByDay) return list(sorted);
  return (
    <div className="flex flex-col gap-5">
      {[...days.entries()].map(([date, items]) => (
        <section key={date} aria-label={formatDayLong(date)}>
          <h3 className="mb-2 text-sm font-semibold text-muted">{formatDayLong(date)}</h3>
          {list(items)}
        </section>
      ))}
    </div>
  );
}

function SessionItem({ booking, timeZone, audience, meId, showActions }: { booking: BookingDto; timeZone: string; audience: "engineer" | "client"; meId?: string; showActions: boolean }) {
  const others = booking.engineers.filter((e) => e.userId !== meId);
  return (
    <li className="flex flex-col gap-2 px-4 py-3 sm:flex-row sm:items-center sm:justify-between">
      <div className="min-w-0">
        <p className="flex flex-wrap items-center gap-x-2 gap-y-1">
          <span className="font-semibold tabular-nums">{formatTimeRange(booking.startsAt, booking.endsAt, timeZone)}</span>
          <span className="flex items-center gap-1.5">
            <span aria-hidden="true" className="size-2.5 rounded-sm" style={{ backgroundColor: roomColourHex[booking.room.colour] }} />
            {booking.room.name}
          </span>
          <BookingStatusBadge booking={booking} />
        </p>
        <p className="text-sm">
          {audience === "engineer" ? <span className="font-medium">{booking.client.name}</span> : null}
          {audience === "engineer" && (booking.title || booking.project) ? " · " : null}
          {booking.title ?? booking.project?.name ?? null}
          {audience === "client" && !booking.title && !booking.project ? <span className="text-muted">Session</span> : null}
        </p>
        <p className="text-sm text-muted">
          {audience === "engineer"
            ? others.length > 0
              ? `With ${others.map((e) => e.name).join(", ")}`
              : "No other engineers"
            : booking.engineers.length > 0
              ? `Engineers: ${booking.engineers.map((e) => e.name).join(", ")}`
              : "Engineer to be confirmed"}
        </p>
      </div>
      {showActions ? <SessionActions booking={booking} timeZone={timeZone} /> : null}
    </li>
  );
}

function SessionActions({ booking, timeZone }: { booking: BookingDto; timeZone: string }) {
  const toast = useToast();
  const start = useStartBooking(booking.id);
  const wrap = useWrapBooking(booking.id);
  const onError = (error: unknown) => toast(errorMessage(error), "error");
  const label = `${booking.room.name} ${formatTimeRange(booking.startsAt, booking.endsAt, timeZone)}`;
  return (
    <div className="flex shrink-0 gap-2">
      {booking.allowedActions.includes("start") ? (
        <Button size="sm" pending={start.isPending} aria-label={`Start session, ${label}`} onClick={() => start.mutate(undefined, { onSuccess: () => toast("Session started"), onError })}>
          Start session
        </Button>
      ) : null}
      {booking.allowedActions.includes("wrap") ? (
        <Button size="sm" pending={wrap.isPending} aria-label={`Wrap session, ${label}`} onClick={() => wrap.mutate(undefined, { onSuccess: () => toast("Session wrapped"), onError })}>
          Wrap session
        </Button>
      ) : null}
    </div>
  );
}
