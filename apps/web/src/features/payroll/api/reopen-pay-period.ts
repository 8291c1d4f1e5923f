import { useMutation, useQueryClient } from "@tanstack/react-query";
import { payrollRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { settlePeriod } from "./settle-period.ts";

/** Approved → open again, so time in it can be corrected. */
export const reopenPayPeriod = (id: number) => callApi(payrollRoutes.reopenPeriod, { params: { id } });

export function useReopenPayPeriod() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: reopenPayPeriod, onSuccess: () => settlePeriod(queryClient) });
}
