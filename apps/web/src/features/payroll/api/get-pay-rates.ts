import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { payRateDto } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { payrollKeys } from "./payroll-keys.ts";

/** Every pay rate with the date it applies from, by person and code. */
export const getPayRates = (signal?: AbortSignal) => api.get("/api/pay-rates", z.array(payRateDto), signal);

export const payRatesQueryOptions = () => queryOptions({ queryKey: payrollKeys.rates(), queryFn: ({ signal }) => getPayRates(signal) });

export const usePayRates = () => useQuery(payRatesQueryOptions());
