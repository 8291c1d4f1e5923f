import { Card } from "../../../components/ui/card.tsx";
import { PageHeader } from "../../../components/ui/page-header.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { usePayRates } from "../../../features/payroll/api/get-pay-rates.ts";
import { PayRateForm, PayRatesTable } from "../../../features/payroll/components/pay-rates.tsx";
import { PayrollCaution } from "../../../features/payroll/components/payroll-caution.tsx";
import { canEditPayRates } from "../../../config/access.ts";
import { useStaff } from "../../../features/staff/api/get-staff.ts";
import { useStudio } from "../../../features/studio/api/get-studio.ts";
import { useSignedInUser } from "../../use-signed-in-user.ts";

export function PayRatesPage() {
  const me = useSignedInUser();
  const canEdit = canEditPayRates(me.role);
  const rates = usePayRates();
  const studio = useStudio();
  // The team list is the owner's; only the owner's form needs it.
  const staff = useStaff({ enabled: canEdit });

  return (
    <>
      <PageHeader
        title="Pay rates"
        description="What each person is paid an hour, by kind of work, from a date. A new rate takes over from its date; earlier time keeps the old one."
      />
      <PayrollCaution className="mb-6" />
      {rates.isError ? (
        <ErrorState error={rates.error} onRetry={() => void rates.refetch()} />
      ) : studio.isError ? (
        <ErrorState error={studio.error} onRetry={() => void studio.refetch()} />
      ) : rates.isPending || studio.isPending ? (
        <LoadingState />
      ) : (
        <div className="flex flex-col gap-6">
          {canEdit ? (
            <Card title="Add a pay rate">
              {staff.isPending ? (
                <LoadingState label="Loading the team…" />
              ) : staff.isError ? (
                <ErrorState error={staff.error} onRetry={() => void staff.refetch()} />
              ) : (
                <PayRateForm members={staff.data.members} currency={studio.data.currency} timeZone={studio.data.timeZone} />
              )}
            </Card>
          ) : (
            <p className="text-sm text-muted">Only the owner adds or changes pay rates.</p>
          )}
          <PayRatesTable rates={rates.data} currency={studio.data.currency} canCorrect={canEdit} />
        </div>
      )}
    </>
  );
}
