import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "../../../lib/api-client.ts";
import { calendarFeedKeys } from "./calendar-feed-keys.ts";

/** Calendars subscribed to the address stop updating. */
export const revokeCalendarFeed = (id: number) => api.delete(`/api/calendar-feeds/${id}`);

export function useRevokeCalendarFeed() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: revokeCalendarFeed,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: calendarFeedKeys.all }),
  });
}
