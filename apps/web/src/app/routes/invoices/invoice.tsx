import { useParams } from "react-router";
import { PageHeader } from "../../../components/ui/page-header.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { useInvoice } from "../../../features/invoices/api/invoices.ts";
import { InvoiceView } from "../../../features/invoices/components/invoice-view.tsx";
import { useSignedInUser } from "../../use-signed-in-user.ts";

export function InvoiceRoute() {
  const me = useSignedInUser();
  const id = Number(useParams().invoiceId);
  const invoice = useInvoice(id);
  if (invoice.isPending) return <LoadingState />;
  if (invoice.isError) return <ErrorState error={invoice.error} onRetry={() => void invoice.refetch()} />;
  const i = invoice.data;
  return (
    <>
      <PageHeader eyebrow={i.clientName} title={i.number ? `${i.kind === "deposit" ? "Deposit invoice" : "Invoice"} ${i.number}` : `Draft invoice #${i.id}`} />
      <InvoiceView invoice={i} role={me.role} />
    </>
  );
}
