import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { invoiceRoutes, type CreateInvoiceInput, type CreditNoteInput, type RecordPaymentInput, type UpdateDraftInput } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";

export const invoiceKeys = {
  all: ["invoices"] as const,
  list: (filters: InvoiceFilters) => [...invoiceKeys.all, "list", filters] as const,
  detail: (id: number) => [...invoiceKeys.all, "detail", id] as const,
  billable: (clientId: number) => [...invoiceKeys.all, "billable", clientId] as const,
  ageing: (asOf: string) => [...invoiceKeys.all, "ageing", asOf] as const,
  settings: () => [...invoiceKeys.all, "settings"] as const,
};

export type InvoiceFilters = { status?: "draft" | "issued" | "part_paid" | "paid" | "void"; clientAccountId?: number; from?: string; to?: string };

export const invoicesQueryOptions = (filters: InvoiceFilters) =>
  queryOptions({ queryKey: invoiceKeys.list(filters), queryFn: ({ signal }) => callApi(invoiceRoutes.list, { query: filters, signal }) });
export const useInvoices = (filters: InvoiceFilters, { enabled = true } = {}) => useQuery({ ...invoicesQueryOptions(filters), enabled });

export const useInvoice = (id: number) => useQuery({ queryKey: invoiceKeys.detail(id), queryFn: ({ signal }) => callApi(invoiceRoutes.get, { params: { id }, signal }) });
export const useBillable = (clientId: number) =>
  useQuery({ queryKey: invoiceKeys.billable(clientId), queryFn: ({ signal }) => callApi(invoiceRoutes.billable, { params: { id: clientId }, signal }) });
export const useAgeing = (asOf: string) => useQuery({ queryKey: invoiceKeys.ageing(asOf), queryFn: ({ signal }) => callApi(invoiceRoutes.ageing, { query: { asOf }, signal }) });
export const useInvoiceSettings = ({ enabled = true } = {}) =>
  useQuery({ queryKey: invoiceKeys.settings(), queryFn: ({ signal }) => callApi(invoiceRoutes.settings, { signal }), enabled });

export const invoicePdfHref = (id: number) => `/api/invoices/${id}/pdf`;

/** Every invoice mutation answers with the invoice; the cache is refreshed from it. */
function useInvoiceMutation<I>(run: (input: I) => ReturnType<typeof callApi<typeof invoiceRoutes.get>>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: run,
    onSuccess: (invoice) => {
      queryClient.setQueryData(invoiceKeys.detail(invoice.id), invoice);
      return queryClient.invalidateQueries({ queryKey: invoiceKeys.all, predicate: (q) => q.queryKey[1] !== "detail" });
    },
  });
}

export const useCreateInvoice = () => useInvoiceMutation((body: CreateInvoiceInput) => callApi(invoiceRoutes.create, { body }));
export const useUpdateDraft = (id: number) => useInvoiceMutation((body: UpdateDraftInput) => callApi(invoiceRoutes.updateDraft, { params: { id }, body }));
export const useIssueInvoice = (id: number) => useInvoiceMutation((_: void) => callApi(invoiceRoutes.issue, { params: { id } }));
export const useVoidInvoice = (id: number) => useInvoiceMutation((reason: string) => callApi(invoiceRoutes.void, { params: { id }, body: { reason } }));
export const useRecordPayment = (id: number) => useInvoiceMutation((body: RecordPaymentInput) => callApi(invoiceRoutes.recordPayment, { params: { id }, body }));
export const useReversePayment = (id: number) =>
  useInvoiceMutation((input: { paymentId: number; reason: string }) => callApi(invoiceRoutes.reversePayment, { params: { id, paymentId: input.paymentId }, body: { reason: input.reason } }));
export const useCreditNote = (id: number) => useInvoiceMutation((body: CreditNoteInput) => callApi(invoiceRoutes.creditNote, { params: { id }, body }));
