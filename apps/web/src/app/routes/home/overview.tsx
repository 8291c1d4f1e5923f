import type { MeDto, PayPeriodDto } from "@takeup/domain";
import { PageHeader } from "../../../components/ui/page-header.tsx";
import { StatCard } from "../../../components/ui/stat-card.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { paths } from "../../../config/paths.ts";
import { useClients } from "../../../features/clients/api/get-clients.ts";
import { usePayPeriods } from "../../../features/payroll/api/get-pay-periods.ts";
import { PayrollCaution } from "../../../features/payroll/components/payroll-caution.tsx";
import { formatPeriod } from "../../../features/payroll/components/period-format.ts";
import { periodStatusLabels } from "../../../features/payroll/components/period-status.tsx";
import { useStudio } from "../../../features/studio/api/get-studio.ts";
import { studioToday } from "../../../lib/studio-time.ts";
import { StudioDay } from "./studio-day.tsx";

/**
 * The period to close is the latest one that has ended and is not locked yet; when every
 * ended period is locked, the one running today. `periods` come newest first.
 */
export function periodToClose(periods: readonly PayPeriodDto[], today: string): PayPeriodDto | undefined {
  return periods.find((p) => p.endDate < today && p.status !== "locked") ?? periods.find((p) => p.startDate <= today && today <= p.endDate) ?? periods[0];
}

export function OverviewPage({ me }: { me: MeDto }) {
  const studio = useStudio();
  const clients = useClients();
  const periods = usePayPeriods();
  if (studio.isPending) return <LoadingState />;
  if (studio.isError) return <ErrorState error={studio.error} onRetry={() => void studio.refetch()} />;
  const next = periods.data ? periodToClose(periods.data, studioToday(studio.data.timeZone)) : undefined;

  return (
    <>
      <PageHeader title="Overview" description={<StudioDay me={me} timeZone={studio.data.timeZone} />} />
      {clients.isError ? (
        <ErrorState error={clients.error} onRetry={() => void clients.refetch()} />
      ) : periods.isError ? (
        <ErrorState error={periods.error} onRetry={() => void periods.refetch()} />
      ) : clients.isPending || periods.isPending ? (
        <LoadingState />
      ) : (
        <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
          {next ? (
            <StatCard
              label="Pay period to close"
              value={formatPeriod(next.startDate, next.endDate)}
              detail={periodStatusLabels[next.status]}
              href={paths.payPeriods.detail.getHref(next.id)}
              linkLabel="Review the period"
            />
          ) : null}
          <StatCard
            label="Clients"
            value={clients.data.length}
            detail={`${clients.data.filter((c) => c.active).length} active · billed in ${studio.data.currency}`}
            href={paths.clients.list.getHref()}
            linkLabel="Open clients"
          />
        </div>
      )}
      <PayrollCaution className="mt-8" />
    </>
  );
}
