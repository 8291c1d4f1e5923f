import { PageHeader } from "../../../components/ui/page-header.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { UpcomingSessions } from "../../../features/bookings/components/studio-sessions.tsx";
import { MyCalendarFeeds } from "../../../features/calendar-feeds/components/my-calendar-feeds.tsx";
import { useStudio } from "../../../features/studio/api/get-studio.ts";
import { useSignedInUser } from "../../use-signed-in-user.ts";

export function MySessionsRoute() {
  const me = useSignedInUser();
  const studio = useStudio();
  return (
    <>
      <PageHeader title="My sessions" description="Sessions you are on for the next 30 days. Times are studio time." />
      {studio.isPending ? (
        <LoadingState />
      ) : studio.isError ? (
        <ErrorState error={studio.error} onRetry={() => void studio.refetch()} />
      ) : (
        <div className="grid gap-8 lg:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
          <UpcomingSessions timeZone={studio.data.timeZone} meId={me.id} />
          <div>
            <MyCalendarFeeds staffUserId={me.id} timeZone={studio.data.timeZone} />
          </div>
        </div>
      )}
    </>
  );
}
