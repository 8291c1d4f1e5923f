import { useState } from "react";
import { Link } from "react-router";
import { formatMoney, roomColourHex, type BookingDto } from "@takeup/domain";
import { Card } from "../../../components/ui/card.tsx";
import { EmptyState, ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { addDays, formatStudioDayTime, formatTimeRange, studioDaysRange, studioToday } from "../../../lib/studio-time.ts";
import { useBookings } from "../api/get-bookings.ts";
import { BookingStatusBadge } from "./booking-status.tsx";
import { SessionList } from "./session-list.tsx";

const live = (b: BookingDto) => b.status !== "cancelled";

/** The moment the screen was opened; lists compare against it, so they do not jump while read. */
const useOpenedAt = () => useState(() => Date.now())[0];

/** An engineer's sessions for the next `days` days from today (the API only returns the ones they are on). */
export function UpcomingSessions({ timeZone, meId, days = 30 }: { timeZone: string; meId: string; days?: number }) {
  const now = useOpenedAt();
  const bookings = useBookings(studioDaysRange(studioToday(timeZone), days + 1, timeZone));
  if (bookings.isPending) return <LoadingState label="Loading your sessions…" />;
  if (bookings.isError) return <ErrorState error={bookings.error} onRetry={() => void bookings.refetch()} />;
  const upcoming = bookings.data.filter((b) => live(b) && Date.parse(b.endsAt) > now);
  if (upcoming.length === 0) return <EmptyState title={`No sessions for you in the next ${days} days.`}>New bookings with you on them show up here.</EmptyState>;
  return <SessionList bookings={upcoming} timeZone={timeZone} audience="engineer" meId={meId} showActions />;
}

/** Today's sessions at the studio for the engineer signed in. */
export function TodaysSessions({ timeZone, meId }: { timeZone: string; meId: string }) {
  const bookings = useBookings(studioDaysRange(studioToday(timeZone), 1, timeZone));
  if (bookings.isPending) return <LoadingState label="Loading today's sessions…" />;
  if (bookings.isError) return <ErrorState error={bookings.error} onRetry={() => void bookings.refetch()} />;
  const today = bookings.data.filter(live);
  if (today.length === 0) return <EmptyState title="No sessions booked for you today.">Enjoy the quiet, or tidy the patch bay.</EmptyState>;
  return <SessionList bookings={today} timeZone={timeZone} audience="engineer" meId={meId} showActions groupByDay={false} />;
}

/** "Rooms in use now" and "Next sessions" for the studio's day, on the owner's and manager's Today board. */
export function TodayBoard({ timeZone, calendarHref }: { timeZone: string; calendarHref: string }) {
  const now = useOpenedAt();
  const bookings = useBookings(studioDaysRange(studioToday(timeZone), 1, timeZone));
  if (bookings.isPending) return <LoadingState label="Loading today's bookings…" />;
  if (bookings.isError) return <ErrorState error={bookings.error} onRetry={() => void bookings.refetch()} />;

  const today = bookings.data.filter(live).sort((a, b) => a.startsAt.localeCompare(b.startsAt));
  // A hold pencils a slot; only a booking or a running session puts a room in use.
  const inUse = today.filter((b) => (b.status === "confirmed" || b.status === "in_session") && Date.parse(b.startsAt) <= now && Date.parse(b.endsAt) > now);
  const next = today.filter((b) => b.status !== "wrapped" && Date.parse(b.startsAt) > now).slice(0, 5);
  const calendarLink = (
    <Link to={calendarHref} className="text-sm font-medium text-rust-deep underline-offset-2 hover:underline">
      Open calendar
    </Link>
  );

  return (
    <div className="grid gap-4 lg:grid-cols-2">
      <Card title="Rooms in use now" actions={calendarLink}>
        {inUse.length === 0 ? (
          <p className="text-sm text-muted">No room is in use right now.</p>
        ) : (
          <BoardList bookings={inUse} timeZone={timeZone} />
        )}
      </Card>
      <Card title="Next sessions">
        {next.length === 0 ? <p className="text-sm text-muted">Nothing else booked today.</p> : <BoardList bookings={next} timeZone={timeZone} />}
      </Card>
    </div>
  );
}

function BoardList({ bookings, timeZone }: { bookings: BookingDto[]; timeZone: string }) {
  return (
    <ul className="-my-3 divide-y divide-line">
      {bookings.map((b) => (
        <li key={b.id} className="flex flex-wrap items-center justify-between gap-2 py-2.5 text-sm">
          <div className="min-w-0">
            <p className="flex items-center gap-2 font-medium">
              <span aria-hidden="true" className="size-2.5 rounded-sm" style={{ backgroundColor: roomColourHex[b.room.colour] }} />
              {b.room.name} · {b.client.name}
            </p>
            <p className="text-muted">
              {formatTimeRange(b.startsAt, b.endsAt, timeZone)}
              {b.engineers.length > 0 ? ` · ${b.engineers.map((e) => e.name).join(", ")}` : " · no engineer yet"}
            </p>
          </div>
          <BookingStatusBadge booking={b} />
        </li>
      ))}
    </ul>
  );
}

// The API answers for at most 62 days at a time; 61 studio days stays inside that even across a clock change.
const listDays = 61;

/** A client's own sessions: what is coming up and what has been, about two months each way. */
export function ClientSessions({ timeZone }: { timeZone: string }) {
  const now = useOpenedAt();
  const today = studioToday(timeZone);
  const upcoming = useBookings(studioDaysRange(today, listDays, timeZone));
  const past = useBookings(studioDaysRange(addDays(today, 1 - listDays), listDays, timeZone));

  return (
    <div className="flex flex-col gap-8">
      <section aria-labelledby="sessions-upcoming">
        <h2 id="sessions-upcoming" className="mb-3 text-lg font-semibold">
          Coming up
        </h2>
        {upcoming.isPending ? (
          <LoadingState />
        ) : upcoming.isError ? (
          <ErrorState error={upcoming.error} onRetry={() => void upcoming.refetch()} />
        ) : (
          <ClientList bookings={upcoming.data.filter((b) => Date.parse(b.endsAt) > now)} timeZone={timeZone} empty="Nothing booked yet. Request a session and the studio will confirm it." />
        )}
      </section>
      <section aria-labelledby="sessions-past">
        <h2 id="sessions-past" className="mb-3 text-lg font-semibold">
          Past sessions
        </h2>
        {past.isPending ? (
          <LoadingState />
        ) : past.isError ? (
          <ErrorState error={past.error} onRetry={() => void past.refetch()} />
        ) : (
          <ClientList
            bookings={past.data.filter((b) => Date.parse(b.endsAt) <= now)}
            timeZone={timeZone}
            empty="No sessions in the last two months."
            newestFirst
          />
        )}
      </section>
    </div>
  );
}

function ClientList({ bookings, timeZone, empty, newestFirst = false }: { bookings: BookingDto[]; timeZone: string; empty: string; newestFirst?: boolean }) {
  if (bookings.length === 0) return <p className="text-sm text-muted">{empty}</p>;
  return <SessionList bookings={bookings} timeZone={timeZone} audience="client" newestFirst={newestFirst} />;
}

/** The client's next session, for its account page. */
export function NextSessionCard({ timeZone, sessionsHref }: { timeZone: string; sessionsHref: string }) {
  const now = useOpenedAt();
  const bookings = useBookings(studioDaysRange(studioToday(timeZone), listDays, timeZone));
  const next = (bookings.data ?? []).filter((b) => live(b) && Date.parse(b.endsAt) > now).sort((a, b) => a.startsAt.localeCompare(b.startsAt))[0];
  const link = (
    <Link to={sessionsHref} className="text-sm font-medium text-rust-deep underline-offset-2 hover:underline">
      All sessions
    </Link>
  );
  return (
    <Card title="Next session" actions={link}>
      {bookings.isPending ? (
        <p className="text-sm text-muted">Loading…</p>
      ) : bookings.isError ? (
        <p className="text-sm text-muted">Your sessions could not be loaded just now.</p>
      ) : next ? (
        <div className="flex flex-wrap items-center justify-between gap-2 text-sm">
          <div>
            <p className="font-semibold">{formatTimeRange(next.startsAt, next.endsAt, timeZone, { withDay: true })}</p>
            <p className="text-muted">
              {next.room.name}
              {next.title ? ` · ${next.title}` : ""}
              {next.status === "hold" && next.holdExpiresAt ? ` · held until ${formatStudioDayTime(next.holdExpiresAt, timeZone)}` : ""}
            </p>
            {next.depositRequiredCents > 0 && !next.depositReceivedAt && next.status !== "hold" ? (
              <p className="text-muted">Deposit due: {formatMoney(next.depositRequiredCents, next.quote.currency)}</p>
            ) : null}
          </div>
          <BookingStatusBadge booking={next} />
        </div>
      ) : (
        <p className="text-sm text-muted">No session booked in the next two months.</p>
      )}
    </Card>
  );
}
