import type { QueryClient } from "@tanstack/react-query";
import { payrollKeys } from "./payroll-keys.ts";

/** After a period moves (approved, locked, reopened, unlocked): its review and the list both change. */
export const settlePeriod = (queryClient: QueryClient) => queryClient.invalidateQueries({ queryKey: payrollKeys.periods() });
