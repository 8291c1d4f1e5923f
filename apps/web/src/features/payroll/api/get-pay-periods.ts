import { queryOptions, useQuery } from "@tanstack/react-query";
import { payrollRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { payrollKeys } from "./payroll-keys.ts";

/** The current pay period and the ones before it, newest first. */
export const getPayPeriods = (signal?: AbortSignal) => callApi(payrollRoutes.periods, { signal });

export const payPeriodsQueryOptions = () => queryOptions({ queryKey: payrollKeys.periodList(), queryFn: ({ signal }) => getPayPeriods(signal) });

export const usePayPeriods = () => useQuery(payPeriodsQueryOptions());
