import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { calendarFeedDto } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { calendarFeedKeys } from "./calendar-feed-keys.ts";

/** Owner and manager see every feed; an engineer only their own. Addresses are never sent again. */
export const getCalendarFeeds = (signal?: AbortSignal) => api.get("/api/calendar-feeds", z.array(calendarFeedDto), signal);

export const calendarFeedsQueryOptions = () =>
  queryOptions({ queryKey: calendarFeedKeys.list(), queryFn: ({ signal }) => getCalendarFeeds(signal) });

export const useCalendarFeeds = ({ enabled = true }: { enabled?: boolean } = {}) => useQuery({ ...calendarFeedsQueryOptions(), enabled });
