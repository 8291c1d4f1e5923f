import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import { timeClockRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { timeClockKeys, type TimeEntriesParams } from "./time-clock-keys.ts";

/** Entries that start on the studio workdays from `from` to `to` (both included); an engineer gets their own. */
export function getTimeEntries(params: TimeEntriesParams, signal?: AbortSignal) {
  const query = { from: params.from, to: params.to, staffUserId: params.staffUserId || undefined };
  return callApi(timeClockRoutes.entries, { query, signal });
}

export const timeEntriesQueryOptions = (params: TimeEntriesParams) =>
  queryOptions({ queryKey: timeClockKeys.entryList(params), queryFn: ({ signal }) => getTimeEntries(params, signal) });

/** Keeps the previous week on screen while the next one loads, so the table does not flash. */
export const useTimeEntries = (params: TimeEntriesParams, { enabled = true }: { enabled?: boolean } = {}) =>
  useQuery({ ...timeEntriesQueryOptions(params), enabled, placeholderData: keepPreviousData });
