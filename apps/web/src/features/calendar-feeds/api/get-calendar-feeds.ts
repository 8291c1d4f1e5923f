import { queryOptions, useQuery } from "@tanstack/react-query";
import { calendarFeedRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { calendarFeedKeys } from "./calendar-feed-keys.ts";

/** Owner and manager see every feed; an engineer only their own. Addresses are never sent again. */
export const getCalendarFeeds = (signal?: AbortSignal) => callApi(calendarFeedRoutes.list, { signal });

export const calendarFeedsQueryOptions = () =>
  queryOptions({ queryKey: calendarFeedKeys.list(), queryFn: ({ signal }) => getCalendarFeeds(signal) });

export const useCalendarFeeds = ({ enabled = true }: { enabled?: boolean } = {}) => useQuery({ ...calendarFeedsQueryOptions(), enabled });
