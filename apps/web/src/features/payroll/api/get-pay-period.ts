import { queryOptions, useQuery } from "@tanstack/react-query";
import { payrollRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { payrollKeys } from "./payroll-keys.ts";

/** A period's figures per person, its flags and the rules they were worked out with. */
export const getPayPeriod = (id: number, signal?: AbortSignal) => callApi(payrollRoutes.period, { params: { id }, signal });

export const payPeriodQueryOptions = (id: number) => queryOptions({ queryKey: payrollKeys.period(id), queryFn: ({ signal }) => getPayPeriod(id, signal) });

export const usePayPeriod = (id: number) => useQuery(payPeriodQueryOptions(id));
