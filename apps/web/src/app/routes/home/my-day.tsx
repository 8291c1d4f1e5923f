import type { MeDto } from "@takeup/domain";
import { Link } from "react-router";
import { PageHeader } from "../../../components/ui/page-header.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { paths } from "../../../config/paths.ts";
import { TodaysSessions } from "../../../features/bookings/components/studio-sessions.tsx";
import { useStudio } from "../../../features/studio/api/get-studio.ts";
import { StudioDay } from "./studio-day.tsx";

export function MyDayPage({ me }: { me: MeDto }) {
  const studio = useStudio();
  if (studio.isPending) return <LoadingState />;
  if (studio.isError) return <ErrorState error={studio.error} onRetry={() => void studio.refetch()} />;
  return (
    <>
      <PageHeader title="My day" description={<StudioDay me={me} timeZone={studio.data.timeZone} />} />
      <h2 className="mb-3 text-lg font-semibold">Today&apos;s sessions</h2>
      <TodaysSessions timeZone={studio.data.timeZone} meId={me.id} />
      <p className="mt-4 text-sm">
        <Link to={paths.mySessions.getHref()} className="font-medium text-rust-deep underline-offset-2 hover:underline">
          See the next 30 days
        </Link>
      </p>
    </>
  );
}
