import { PageHeader } from "../../../components/ui/page-header.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { useAuditEvents } from "../../../features/audit/api/get-audit-events.ts";
import { AuditTable } from "../../../features/audit/components/audit-table.tsx";
import { useStudio } from "../../../features/studio/api/get-studio.ts";

export function ActivityRoute() {
  const studio = useStudio();
  const events = useAuditEvents();
  const failed = studio.isError ? studio : events.isError ? events : null;
  const ready = studio.isSuccess && events.isSuccess;

  return (
    <>
      <PageHeader title="Activity" description="Who changed what, newest first. Times are studio time." />
      {failed ? (
        <ErrorState error={failed.error} onRetry={() => void failed.refetch()} />
      ) : ready ? (
        <AuditTable events={events.data} timeZone={studio.data.timeZone} />
      ) : (
        <LoadingState />
      )}
    </>
  );
}
