import { useMutation, useQueryClient } from "@tanstack/react-query";
import { payPeriodDto } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { settlePeriod } from "./settle-period.ts";

/** Approved → open again, so time in it can be corrected. */
export const reopenPayPeriod = (id: number) => api.post(`/api/pay-periods/${id}/reopen`, {}, payPeriodDto);

export function useReopenPayPeriod() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: reopenPayPeriod, onSuccess: () => settlePeriod(queryClient) });
}
