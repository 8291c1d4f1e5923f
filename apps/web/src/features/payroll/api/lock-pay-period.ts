import { useMutation, useQueryClient } from "@tanstack/react-query";
import { payPeriodDto } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { settlePeriod } from "./settle-period.ts";

/** Approved → locked: the time in it can no longer change (owner, bookkeeper). */
export const lockPayPeriod = (id: number) => api.post(`/api/pay-periods/${id}/lock`, {}, payPeriodDto);

export function useLockPayPeriod() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: lockPayPeriod, onSuccess: () => settlePeriod(queryClient) });
}
