import type { MeDto } from "@takeup/domain";
import { PageHeader } from "../../../components/ui/page-header.tsx";
import { StatCard } from "../../../components/ui/stat-card.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { paths } from "../../../config/paths.ts";
import { useClients } from "../../../features/clients/api/get-clients.ts";
import { useStudio } from "../../../features/studio/api/get-studio.ts";
import { StudioDay } from "./studio-day.tsx";

export const payrollCaution =
  "Overtime, rounding and tax rules differ by country, state and city. The settings in Takeup are the studio's responsibility; local labour law, the tax authorities and a licensed accountant or payroll provider decide. Nothing here is legal or tax advice.";

export function OverviewPage({ me }: { me: MeDto }) {
  const studio = useStudio();
  const clients = useClients();
  if (studio.isPending) return <LoadingState />;
  if (studio.isError) return <ErrorState error={studio.error} onRetry={() => void studio.refetch()} />;

  return (
    <>
      <PageHeader title="Overview" description={<StudioDay me={me} timeZone={studio.data.timeZone} />} />
      {clients.isError ? (
        <ErrorState error={clients.error} onRetry={() => void clients.refetch()} />
      ) : clients.isPending ? (
        <LoadingState />
      ) : (
        <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
          <StatCard
            label="Clients"
            value={clients.data.length}
            detail={`${clients.data.filter((c) => c.active).length} active · billed in ${studio.data.currency}`}
            href={paths.clients.list.getHref()}
            linkLabel="Open clients"
          />
        </div>
      )}
      <aside aria-label="A word of caution" className="mt-8 max-w-3xl rounded-lg border border-line px-4 py-3 text-sm text-muted">
        {payrollCaution}
      </aside>
    </>
  );
}
