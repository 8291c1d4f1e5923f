import { PageHeader } from "../../../components/ui/page-header.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { useStudio } from "../../../features/studio/api/get-studio.ts";
import { TimeClock } from "../../../features/time-clock/components/time-clock.tsx";

/** The engineer's home ("/") and the owner's and manager's "/clock". */
export function ClockPage() {
  const studio = useStudio();
  return (
    <>
      <PageHeader title="Time clock" />
      {studio.isPending ? (
        <LoadingState />
      ) : studio.isError ? (
        <ErrorState error={studio.error} onRetry={() => void studio.refetch()} />
      ) : (
        <TimeClock timeZone={studio.data.timeZone} />
      )}
    </>
  );
}
