import type { MeDto } from "@takeup/domain";
import { PageHeader } from "../../../components/ui/page-header.tsx";
import { EmptyState, ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { useStudio } from "../../../features/studio/api/get-studio.ts";
import { StudioDay } from "./studio-day.tsx";

export function MyDayPage({ me }: { me: MeDto }) {
  const studio = useStudio();
  if (studio.isPending) return <LoadingState />;
  if (studio.isError) return <ErrorState error={studio.error} onRetry={() => void studio.refetch()} />;
  return (
    <>
      <PageHeader title="My day" description={<StudioDay me={me} timeZone={studio.data.timeZone} />} />
      <EmptyState title="No sessions booked for you today.">Enjoy the quiet, or tidy the patch bay.</EmptyState>
    </>
  );
}
