import { useMutation, useQueryClient } from "@tanstack/react-query";
import { timeClockRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { refreshClock, settleClock } from "./settle-clock.ts";

/** An unpaid break inside the open entry. 409 already_on_break. */
export const startBreak = () => callApi(timeClockRoutes.breakStart);

export function useStartBreak() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: startBreak,
    onSuccess: (entry) => settleClock(queryClient, entry),
    onError: () => refreshClock(queryClient),
  });
}
