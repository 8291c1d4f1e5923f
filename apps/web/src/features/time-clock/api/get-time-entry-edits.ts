import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { timeEntryEditDto } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { timeClockKeys, type TimeEntryEditsParams } from "./time-clock-keys.ts";

/** Corrections, newest first; an engineer gets their own, owner and manager everyone's. */
export function getTimeEntryEdits(params: TimeEntryEditsParams, signal?: AbortSignal) {
  const path = params.status ? `/api/time-entry-edits?status=${params.status}` : "/api/time-entry-edits";
  return api.get(path, z.array(timeEntryEditDto), signal);
}

export const timeEntryEditsQueryOptions = (params: TimeEntryEditsParams = {}) =>
  queryOptions({ queryKey: timeClockKeys.editList(params), queryFn: ({ signal }) => getTimeEntryEdits(params, signal) });

export const useTimeEntryEdits = (params: TimeEntryEditsParams = {}, { enabled = true }: { enabled?: boolean } = {}) =>
  useQuery({ ...timeEntryEditsQueryOptions(params), enabled });
