import { useMutation, useQueryClient } from "@tanstack/react-query";
import { calendarFeedRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { calendarFeedKeys } from "./calendar-feed-keys.ts";

/** Calendars subscribed to the address stop updating. */
export const revokeCalendarFeed = (id: number) => callApi(calendarFeedRoutes.revoke, { params: { id } });

export function useRevokeCalendarFeed() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: revokeCalendarFeed,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: calendarFeedKeys.all }),
  });
}
