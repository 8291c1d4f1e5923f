import { queryOptions, useQuery } from "@tanstack/react-query";
import { timeClockRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { timeClockKeys } from "./time-clock-keys.ts";

/** The signed-in person's clock: the open entry, sessions now and the workweek so far. */
export const getTimeClock = (signal?: AbortSignal) => callApi(timeClockRoutes.clock, { signal });

export const timeClockQueryOptions = () =>
  // The console tablet stays open all day: a fresh look each minute keeps "sessions now" current.
  queryOptions({ queryKey: timeClockKeys.clock(), queryFn: ({ signal }) => getTimeClock(signal), refetchInterval: 60_000 });

export const useTimeClock = ({ enabled = true }: { enabled?: boolean } = {}) => useQuery({ ...timeClockQueryOptions(), enabled });
