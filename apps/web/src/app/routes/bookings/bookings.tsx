import { useState } from "react";
import { PageHeader } from "../../../components/ui/page-header.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { canBook } from "../../../config/access.ts";
import { BookingPanel } from "../../../features/bookings/components/booking-panel.tsx";
import { BookingsBrowser } from "../../../features/bookings/components/bookings-browser.tsx";
import { useClients } from "../../../features/clients/api/get-clients.ts";
import { useRooms } from "../../../features/rooms/api/get-rooms.ts";
import { useStudio } from "../../../features/studio/api/get-studio.ts";
import { useSignedInUser } from "../../use-signed-in-user.ts";
import { useBookingPanelData } from "./use-booking-panel-data.ts";

export function BookingsRoute() {
  const me = useSignedInUser();
  const studio = useStudio();
  const rooms = useRooms();
  const clients = useClients();
  const panelData = useBookingPanelData(me.role);
  const [bookingId, setBookingId] = useState<number | null>(null);
  const failed = studio.isError ? studio : rooms.isError ? rooms : null;

  return (
    <>
      <PageHeader title="Bookings" description="Holds, bookings and sessions by date, room, status and client. Times are studio time." />
      {failed ? (
        <ErrorState error={failed.error} onRetry={() => void failed.refetch()} />
      ) : studio.isPending || rooms.isPending ? (
        <LoadingState />
      ) : (
        <>
          <BookingsBrowser rooms={rooms.data ?? []} clients={clients.data ?? []} timeZone={studio.data?.timeZone ?? "UTC"} onOpenBooking={setBookingId} />
          <BookingPanel
            bookingId={bookingId}
            onClose={() => setBookingId(null)}
            timeZone={studio.data?.timeZone ?? "UTC"}
            canEdit={canBook(me.role)}
            engineers={panelData.engineers}
            equipment={panelData.equipment}
            onOpenBooking={setBookingId}
          />
        </>
      )}
    </>
  );
}
