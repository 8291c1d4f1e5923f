import { useMutation, useQueryClient } from "@tanstack/react-query";
import { payrollRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { settlePeriod } from "./settle-period.ts";

/** Locked → open, by the owner only, with a reason that goes into the audit log. */
export const unlockPayPeriod = ({ id, reason }: { id: number; reason: string }) => callApi(payrollRoutes.unlockPeriod, { params: { id }, body: { reason } });

export function useUnlockPayPeriod() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: unlockPayPeriod, onSuccess: () => settlePeriod(queryClient) });
}
