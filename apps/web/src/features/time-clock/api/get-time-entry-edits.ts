import { queryOptions, useQuery } from "@tanstack/react-query";
import { timeClockRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { timeClockKeys, type TimeEntryEditsParams } from "./time-clock-keys.ts";

/** Corrections, newest first; an engineer gets their own, owner and manager everyone's. */
export function getTimeEntryEdits(params: TimeEntryEditsParams, signal?: AbortSignal) {
  return callApi(timeClockRoutes.edits, { query: { status: params.status || undefined }, signal });
}

export const timeEntryEditsQueryOptions = (params: TimeEntryEditsParams = {}) =>
  queryOptions({ queryKey: timeClockKeys.editList(params), queryFn: ({ signal }) => getTimeEntryEdits(params, signal) });

export const useTimeEntryEdits = (params: TimeEntryEditsParams = {}, { enabled = true }: { enabled?: boolean } = {}) =>
  useQuery({ ...timeEntryEditsQueryOptions(params), enabled });
