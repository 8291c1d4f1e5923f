import { PageHeader } from "../../../components/ui/page-header.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { useStudio } from "../../../features/studio/api/get-studio.ts";
import { CorrectionsReview } from "../../../features/time-clock/components/corrections-review.tsx";

export function ApprovalsPage() {
  const studio = useStudio();
  return (
    <>
      <PageHeader
        title="Corrections"
        description="Changes to clocked time that the team asked for. Nothing changes until you approve it; times are studio time."
      />
      {studio.isPending ? (
        <LoadingState />
      ) : studio.isError ? (
        <ErrorState error={studio.error} onRetry={() => void studio.refetch()} />
      ) : (
        <CorrectionsReview timeZone={studio.data.timeZone} />
      )}
    </>
  );
}
