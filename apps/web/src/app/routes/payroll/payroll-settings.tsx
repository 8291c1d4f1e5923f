import { PageHeader } from "../../../components/ui/page-header.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { usePayrollSettings } from "../../../features/payroll/api/get-payroll-settings.ts";
import { PayrollCaution } from "../../../features/payroll/components/payroll-caution.tsx";
import { PayrollSettingsForm } from "../../../features/payroll/components/payroll-settings-form.tsx";
import { canEditPayrollSettings } from "../../../config/access.ts";
import { useSignedInUser } from "../../use-signed-in-user.ts";

export function PayrollSettingsPage() {
  const me = useSignedInUser();
  const settings = usePayrollSettings();
  return (
    <>
      <PageHeader title="Payroll settings" description="How clocked time becomes paid hours: the workweek, pay periods, rounding and overtime." />
      <PayrollCaution prominent text={settings.data?.caution} className="mb-6" />
      {settings.isPending ? (
        <LoadingState />
      ) : settings.isError ? (
        <ErrorState error={settings.error} onRetry={() => void settings.refetch()} />
      ) : (
        <PayrollSettingsForm settings={settings.data} canEdit={canEditPayrollSettings(me.role)} />
      )}
    </>
  );
}
