import { PageHeader } from "../../../components/ui/page-header.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { useStudio } from "../../../features/studio/api/get-studio.ts";
import { MyTimesheet } from "../../../features/time-clock/components/my-timesheet.tsx";
import { useSignedInUser } from "../../use-signed-in-user.ts";

export function MyTimesheetPage() {
  const me = useSignedInUser();
  const studio = useStudio();
  return (
    <>
      <PageHeader title="My timesheet" description="Your clocked time, week by week. If a time is wrong, ask for a correction." />
      {studio.isPending ? (
        <LoadingState />
      ) : studio.isError ? (
        <ErrorState error={studio.error} onRetry={() => void studio.refetch()} />
      ) : (
        <MyTimesheet staffUserId={me.id} timeZone={studio.data.timeZone} workweekStartDay={studio.data.workweekStartDay} />
      )}
    </>
  );
}
