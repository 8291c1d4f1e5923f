import { useMemo, useState } from "react";
import { Link, useSearchParams } from "react-router";
import { PageHeader } from "../../../components/ui/page-header.tsx";
import { EmptyState, ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { canBook } from "../../../config/access.ts";
import { paths } from "../../../config/paths.ts";
import { useBookingPanelData } from "../bookings/use-booking-panel-data.ts";
import { BookingCalendar, type CalendarView, type SlotSelection } from "../../../features/bookings/components/booking-calendar.tsx";
import { BookingPanel } from "../../../features/bookings/components/booking-panel.tsx";
import { QuotePanel } from "../../../features/bookings/components/quote-panel.tsx";
import { useClients } from "../../../features/clients/api/get-clients.ts";
import { useRooms } from "../../../features/rooms/api/get-rooms.ts";
import { useStudio } from "../../../features/studio/api/get-studio.ts";
import { studioToday } from "../../../lib/studio-time.ts";
import { useSignedInUser } from "../../use-signed-in-user.ts";

const isDate = (value: string | null): value is string => value !== null && /^\d{4}-\d{2}-\d{2}$/.test(value);

export function CalendarRoute() {
  const me = useSignedInUser();
  const studio = useStudio();
  const rooms = useRooms();
  const booker = canBook(me.role);
  const clients = useClients({ enabled: booker });
  const panelData = useBookingPanelData(me.role);
  const [params, setParams] = useSearchParams();
  const [quoting, setQuoting] = useState<SlotSelection | null>(null);
  const [bookingId, setBookingId] = useState<number | null>(null);

  const calendarRooms = useMemo(
    () =>
      (rooms.data ?? [])
        .filter((room) => room.active)
        .sort((a, b) => a.position - b.position)
        .map(({ id, name, colour }) => ({ id, name, colour })),
    [rooms.data],
  );

  const header = (
    <PageHeader
      title="Calendar"
      description={booker ? "Every room side by side. Pick free time to quote and book it." : "Every room side by side, read-only."}
    />
  );
  const failed = studio.isError ? studio : rooms.isError ? rooms : null;
  if (failed) {
    return (
      <>
        {header}
        <ErrorState error={failed.error} onRetry={() => void failed.refetch()} />
      </>
    );
  }
  if (!studio.data || !rooms.data) {
    return (
      <>
        {header}
        <LoadingState />
      </>
    );
  }

  const { timeZone, workweekStartDay } = studio.data;
  const view: CalendarView = params.get("view") === "week" ? "week" : "day";
  const dateParam = params.get("date");
  const date = isDate(dateParam) ? dateParam : studioToday(timeZone);

  return (
    <>
      {header}
      {calendarRooms.length === 0 ? (
        <EmptyState title="No rooms to show yet.">
          Add the studio&apos;s rooms on{" "}
          <Link to={paths.rooms.getHref()} className="font-medium text-rust-deep underline">
            Rooms and rates
          </Link>{" "}
          first.
        </EmptyState>
      ) : (
        <BookingCalendar
          rooms={calendarRooms}
          timeZone={timeZone}
          workweekStartDay={workweekStartDay}
          view={view}
          date={date}
          onNavigate={(next) => setParams({ view: next.view, date: next.date }, { replace: true })}
          onSelectSlot={booker ? setQuoting : undefined}
          onOpenBooking={setBookingId}
        />
      )}
      {booker && quoting ? (
        <QuotePanel
          open
          onClose={() => setQuoting(null)}
          initial={quoting}
          rooms={rooms.data}
          clients={clients.data ?? []}
          engineers={panelData.engineers}
          equipment={panelData.equipment}
          timeZone={timeZone}
        />
      ) : null}
      <BookingPanel
        bookingId={bookingId}
        onClose={() => setBookingId(null)}
        timeZone={timeZone}
        canEdit={booker}
        engineers={panelData.engineers}
        equipment={panelData.equipment}
        onOpenBooking={setBookingId}
      />
    </>
  );
}
