import { PageHeader } from "../../../components/ui/page-header.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { useInvoiceSettings } from "../../../features/invoices/api/invoices.ts";
import { InvoiceSettingsForm } from "../../../features/invoices/components/invoice-settings-form.tsx";
import { useSignedInUser } from "../../use-signed-in-user.ts";

export function InvoiceSettingsRoute() {
  const me = useSignedInUser();
  const settings = useInvoiceSettings();
  return (
    <>
      <PageHeader title="Invoicing settings" description="Numbers, payment terms, tax by category and the PDF's paper size." />
      {settings.isPending ? (
        <LoadingState />
      ) : settings.isError ? (
        <ErrorState error={settings.error} onRetry={() => void settings.refetch()} />
      ) : (
        <InvoiceSettingsForm settings={settings.data} canEdit={me.role === "owner"} />
      )}
    </>
  );
}
