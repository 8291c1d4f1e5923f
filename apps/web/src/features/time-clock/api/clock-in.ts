import { useMutation, useQueryClient } from "@tanstack/react-query";
import { timeEntryDto, type ClockInInput } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { refreshClock, settleClock } from "./settle-clock.ts";

/** Against a session (bookingId), or as shop time without one. 409 already_clocked_in. */
export const clockIn = (input: ClockInInput) => api.post("/api/time-clock/clock-in", input, timeEntryDto);

export function useClockIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: clockIn,
    onSuccess: (entry) => settleClock(queryClient, entry),
    onError: () => refreshClock(queryClient),
  });
}
