import { useMutation, useQueryClient } from "@tanstack/react-query";
import { calendarFeedRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { calendarFeedKeys } from "./calendar-feed-keys.ts";

export type CalendarFeedTarget = { roomId: number } | { staffUserId: string };

/** The answer carries the feed's address, this once. */
export const createCalendarFeed = (target: CalendarFeedTarget) => callApi(calendarFeedRoutes.create, { body: target });

export function useCreateCalendarFeed() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createCalendarFeed,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: calendarFeedKeys.all }),
  });
}
