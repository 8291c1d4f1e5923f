import { useMutation, useQueryClient } from "@tanstack/react-query";
import { timeClockRoutes, type ClockInInput } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { refreshClock, settleClock } from "./settle-clock.ts";

/** Against a session (bookingId), or as shop time without one. 409 already_clocked_in. */
export const clockIn = (input: ClockInInput) => callApi(timeClockRoutes.clockIn, { body: input });

export function useClockIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: clockIn,
    onSuccess: (entry) => settleClock(queryClient, entry),
    onError: () => refreshClock(queryClient),
  });
}
