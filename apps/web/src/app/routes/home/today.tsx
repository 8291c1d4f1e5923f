import type { MeDto } from "@takeup/domain";
import { PageHeader } from "../../../components/ui/page-header.tsx";
import { StatCard } from "../../../components/ui/stat-card.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { paths } from "../../../config/paths.ts";
import { TodayBoard } from "../../../features/bookings/components/studio-sessions.tsx";
import { useClients } from "../../../features/clients/api/get-clients.ts";
import { useStaff } from "../../../features/staff/api/get-staff.ts";
import { useStudio } from "../../../features/studio/api/get-studio.ts";
import { StudioDay } from "./studio-day.tsx";
import { MoneyOwedCard } from "../../../features/invoices/components/money-owed-card.tsx";
import { RecordersDueCard } from "../../../features/vault/components/recorders-due-card.tsx";

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

export function TodayPage({ me }: { me: MeDto }) {
  const isOwner = me.role === "owner";
  const studio = useStudio();
  const clients = useClients();
  const staff = useStaff({ enabled: isOwner });

  if (studio.isPending) return <LoadingState />;
  if (studio.isError) return <ErrorState error={studio.error} onRetry={() => void studio.refetch()} />;

  const failed = clients.isError ? clients : isOwner && staff.isError ? staff : null;
  const loading = clients.isPending || (isOwner && staff.isPending);
  const activeClients = clients.data?.filter((c) => c.active).length ?? 0;
  const members = staff.data?.members ?? [];
  const activeMembers = members.filter((m) => m.active).length;
  const pending = staff.data?.invitations.length ?? 0;

  return (
    <>
      <PageHeader title="Today" description={<StudioDay me={me} timeZone={studio.data.timeZone} />} />
      <div className="mb-6">
        <TodayBoard timeZone={studio.data.timeZone} calendarHref={paths.calendar.getHref()} />
      </div>
      <div className="mb-6">
        <RecordersDueCard careHref={`${paths.rooms.getHref()}#recorder-care`} />
      </div>
      {failed ? (
        <ErrorState error={failed.error} onRetry={() => void failed.refetch()} />
      ) : loading ? (
        <LoadingState />
      ) : (
        <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
          <MoneyOwedCard />
          <StatCard
            label="Clients"
            value={clients.data?.length ?? 0}
            detail={`${activeClients} active`}
            href={paths.clients.list.getHref()}
            linkLabel="Open clients"
          />
          {isOwner ? (
            <>
              <StatCard
                label="Active team members"
                value={activeMembers}
                detail={members.length > activeMembers ? `${plural(members.length - activeMembers, "is", "are")} deactivated` : "Everyone can sign in"}
                href={paths.team.getHref()}
                linkLabel="Open team"
              />
              <StatCard
                label="Pending invitations"
                value={pending}
                detail={pending === 0 ? "Nobody is waiting to accept" : `${plural(pending, "person has", "people have")} not accepted yet`}
                href={paths.team.getHref()}
                linkLabel="See who is waiting"
              />
            </>
          ) : null}
        </div>
      )}
    </>
  );
}
