import { queryOptions, useQuery } from "@tanstack/react-query";
import { payrollRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { payrollKeys } from "./payroll-keys.ts";

/** Every pay rate with the date it applies from, by person and code. */
export const getPayRates = (signal?: AbortSignal) => callApi(payrollRoutes.rates, { signal });

export const payRatesQueryOptions = () => queryOptions({ queryKey: payrollKeys.rates(), queryFn: ({ signal }) => getPayRates(signal) });

export const usePayRates = () => useQuery(payRatesQueryOptions());
