import { useMutation, useQueryClient } from "@tanstack/react-query";
import { payrollRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { settlePeriod } from "./settle-period.ts";

/** Open → approved. 409 edits_pending while corrections in the period wait for a decision. */
export const approvePayPeriod = (id: number) => callApi(payrollRoutes.approvePeriod, { params: { id } });

export function useApprovePayPeriod() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: approvePayPeriod, onSuccess: () => settlePeriod(queryClient) });
}
