import { useMutation, useQueryClient } from "@tanstack/react-query";
import { timeEntryDto } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { refreshClock, settleClock } from "./settle-clock.ts";

/** An unpaid break inside the open entry. 409 already_on_break. */
export const startBreak = () => api.post("/api/time-clock/break-start", {}, timeEntryDto);

export function useStartBreak() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: startBreak,
    onSuccess: (entry) => settleClock(queryClient, entry),
    onError: () => refreshClock(queryClient),
  });
}
