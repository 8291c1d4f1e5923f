import { PageHeader } from "../../../components/ui/page-header.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { useStudio } from "../../../features/studio/api/get-studio.ts";
import { StudioSettingsForm } from "../../../features/studio/components/studio-settings-form.tsx";

export function SettingsRoute() {
  const studio = useStudio();
  return (
    <>
      <PageHeader title="Studio settings" description="How the studio appears, and the clock and currency Takeup works in." />
      {studio.isPending ? (
        <LoadingState />
      ) : studio.isError ? (
        <ErrorState error={studio.error} onRetry={() => void studio.refetch()} />
      ) : (
        <StudioSettingsForm studio={studio.data} />
      )}
    </>
  );
}
