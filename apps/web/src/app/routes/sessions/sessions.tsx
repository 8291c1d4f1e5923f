import { useState } from "react";
import { Button } from "../../../components/ui/button.tsx";
import { PageHeader } from "../../../components/ui/page-header.tsx";
import { EmptyState, ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { RequestSessionDialog } from "../../../features/bookings/components/request-session-dialog.tsx";
import { ClientSessions } from "../../../features/bookings/components/studio-sessions.tsx";
import { useRooms } from "../../../features/rooms/api/get-rooms.ts";
import { useStudio } from "../../../features/studio/api/get-studio.ts";
import { useSignedInUser } from "../../use-signed-in-user.ts";

export function SessionsRoute() {
  const me = useSignedInUser();
  const studio = useStudio();
  const rooms = useRooms();
  const [requesting, setRequesting] = useState(false);
  const account = me.clientAccount;

  return (
    <>
      <PageHeader
        title="Sessions"
        description="Your sessions at the studio, coming up and past. Times are studio time."
        actions={account ? <Button onClick={() => setRequesting(true)}>Request a session</Button> : null}
      />
      {!account ? (
        <EmptyState title="This sign-in is not linked to a client account.">Ask the studio to check your invitation.</EmptyState>
      ) : studio.isPending ? (
        <LoadingState />
      ) : studio.isError ? (
        <ErrorState error={studio.error} onRetry={() => void studio.refetch()} />
      ) : (
        <>
          <ClientSessions timeZone={studio.data.timeZone} />
          <RequestSessionDialog
            open={requesting}
            onClose={() => setRequesting(false)}
            rooms={rooms.data ?? []}
            clientId={account.id}
            timeZone={studio.data.timeZone}
          />
        </>
      )}
    </>
  );
}
