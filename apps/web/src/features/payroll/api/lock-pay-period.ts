import { useMutation, useQueryClient } from "@tanstack/react-query";
import { payrollRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { settlePeriod } from "./settle-period.ts";

/** Approved → locked: the time in it can no longer change (owner, bookkeeper). */
export const lockPayPeriod = (id: number) => callApi(payrollRoutes.lockPeriod, { params: { id } });

export function useLockPayPeriod() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: lockPayPeriod, onSuccess: () => settlePeriod(queryClient) });
}
