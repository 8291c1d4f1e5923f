import type { QueryClient } from "@tanstack/react-query";
import type { TimeClockDto, TimeEntryDto } from "@takeup/domain";
import { timeClockKeys } from "./time-clock-keys.ts";

/**
 * After a punch: show the new state at once (the big button must never show the old word),
 * then refetch the clock, the week so far and the timesheet.
 */
export function settleClock(queryClient: QueryClient, openEntry: TimeEntryDto | null) {
  queryClient.setQueryData<TimeClockDto>(timeClockKeys.clock(), (old) =>
    old ? { ...old, openEntry, onBreak: Boolean(openEntry?.breaks.some((b) => b.endedAt === null)) } : old,
  );
  return queryClient.invalidateQueries({ queryKey: timeClockKeys.all });
}

/** After a refusal (409): the screen was behind the server, so look again. */
export const refreshClock = (queryClient: QueryClient) => queryClient.invalidateQueries({ queryKey: timeClockKeys.all });
