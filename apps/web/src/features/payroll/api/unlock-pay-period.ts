import { useMutation, useQueryClient } from "@tanstack/react-query";
import { payPeriodDto } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { settlePeriod } from "./settle-period.ts";

/** Locked → open, by the owner only, with a reason that goes into the audit log. */
export const unlockPayPeriod = ({ id, reason }: { id: number; reason: string }) => api.post(`/api/pay-periods/${id}/unlock`, { reason }, payPeriodDto);

export function useUnlockPayPeriod() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: unlockPayPeriod, onSuccess: () => settlePeriod(queryClient) });
}
