import { PageHeader } from "../../../components/ui/page-header.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { usePayPeriods } from "../../../features/payroll/api/get-pay-periods.ts";
import { PayPeriodsTable } from "../../../features/payroll/components/pay-periods-table.tsx";
import { PayrollCaution } from "../../../features/payroll/components/payroll-caution.tsx";
import { useStudio } from "../../../features/studio/api/get-studio.ts";

export function PayPeriodsPage() {
  const periods = usePayPeriods();
  const studio = useStudio();
  return (
    <>
      <PageHeader title="Pay periods" description="Review each period's hours and pay, approve it, then lock it for payroll. Newest first." />
      <PayrollCaution className="mb-6" />
      {periods.isError ? (
        <ErrorState error={periods.error} onRetry={() => void periods.refetch()} />
      ) : studio.isError ? (
        <ErrorState error={studio.error} onRetry={() => void studio.refetch()} />
      ) : periods.isPending || studio.isPending ? (
        <LoadingState />
      ) : (
        <PayPeriodsTable periods={periods.data} timeZone={studio.data.timeZone} />
      )}
    </>
  );
}
