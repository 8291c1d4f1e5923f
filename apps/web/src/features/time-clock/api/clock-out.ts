import { useMutation, useQueryClient } from "@tanstack/react-query";
import { timeClockRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { refreshClock, settleClock } from "./settle-clock.ts";

/** Closes the open entry (and any break still running). 409 not_clocked_in. */
export const clockOut = () => callApi(timeClockRoutes.clockOut);

export function useClockOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: clockOut,
    onSuccess: () => settleClock(queryClient, null),
    onError: () => refreshClock(queryClient),
  });
}
