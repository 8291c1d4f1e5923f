import type { QueryClient } from "@tanstack/react-query";
import { payrollKeys } from "../../payroll/api/payroll-keys.ts";
import { timeClockKeys } from "./time-clock-keys.ts";

export type DecideEditVariables = { id: number; note?: string };

/** An empty note is no note. */
export const decisionBody = (note?: string) => (note?.trim() ? { note: note.trim() } : {});

/** After a decision: entries change, and with them a pay period's figures and flags. */
export function settleDecision(queryClient: QueryClient) {
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: timeClockKeys.all }),
    queryClient.invalidateQueries({ queryKey: payrollKeys.all }),
  ]);
}
