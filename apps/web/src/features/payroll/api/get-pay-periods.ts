import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { payPeriodDto } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { payrollKeys } from "./payroll-keys.ts";

/** The current pay period and the ones before it, newest first. */
export const getPayPeriods = (signal?: AbortSignal) => api.get("/api/pay-periods", z.array(payPeriodDto), signal);

export const payPeriodsQueryOptions = () => queryOptions({ queryKey: payrollKeys.periodList(), queryFn: ({ signal }) => getPayPeriods(signal) });

export const usePayPeriods = () => useQuery(payPeriodsQueryOptions());
