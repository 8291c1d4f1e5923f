import { queryOptions, useQuery } from "@tanstack/react-query";
import { payPeriodReviewDto } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { payrollKeys } from "./payroll-keys.ts";

/** A period's figures per person, its flags and the rules they were worked out with. */
export const getPayPeriod = (id: number, signal?: AbortSignal) => api.get(`/api/pay-periods/${id}`, payPeriodReviewDto, signal);

export const payPeriodQueryOptions = (id: number) => queryOptions({ queryKey: payrollKeys.period(id), queryFn: ({ signal }) => getPayPeriod(id, signal) });

export const usePayPeriod = (id: number) => useQuery(payPeriodQueryOptions(id));
