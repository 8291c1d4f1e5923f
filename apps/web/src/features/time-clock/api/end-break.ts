import { useMutation, useQueryClient } from "@tanstack/react-query";
import { timeClockRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { refreshClock, settleClock } from "./settle-clock.ts";

/** Back to work. 409 not_on_break. */
export const endBreak = () => callApi(timeClockRoutes.breakEnd);

export function useEndBreak() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: endBreak,
    onSuccess: (entry) => settleClock(queryClient, entry),
    onError: () => refreshClock(queryClient),
  });
}
