import type { MeDto } from "@takeup/domain";
import { Link } from "react-router";
import { PageHeader } from "../../../components/ui/page-header.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { paths } from "../../../config/paths.ts";
import { TodaysSessions } from "../../../features/bookings/components/studio-sessions.tsx";
import { useStudio } from "../../../features/studio/api/get-studio.ts";
import { TimeClock } from "../../../features/time-clock/components/time-clock.tsx";
import { StudioDay } from "./studio-day.tsx";

/** The engineer's home: the clock first (a tablet by the console), then today's sessions. */
export function MyDayPage({ me }: { me: MeDto }) {
  const studio = useStudio();
  if (studio.isPending) return <LoadingState />;
  if (studio.isError) return <ErrorState error={studio.error} onRetry={() => void studio.refetch()} />;
  const timeZone = studio.data.timeZone;
  return (
    <>
      <PageHeader title="My day" description={<StudioDay me={me} timeZone={timeZone} />} />
      <h2 className="sr-only">Time clock</h2>
      <TimeClock timeZone={timeZone} />
      <h2 className="mt-8 mb-3 text-lg font-semibold">Today&apos;s sessions</h2>
      <TodaysSessions timeZone={timeZone} meId={me.id} />
      <p className="mt-4 flex flex-wrap gap-x-6 gap-y-2 text-sm">
        <Link to={paths.mySessions.getHref()} className="font-medium text-rust-deep underline-offset-2 hover:underline">
          See the next 30 days
        </Link>
        <Link to={paths.myTimesheet.getHref()} className="font-medium text-rust-deep underline-offset-2 hover:underline">
          My timesheet and corrections
        </Link>
      </p>
    </>
  );
}
