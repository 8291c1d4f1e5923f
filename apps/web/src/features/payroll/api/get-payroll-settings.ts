import { queryOptions, useQuery } from "@tanstack/react-query";
import { payrollSettingsDto } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { payrollKeys } from "./payroll-keys.ts";

export const getPayrollSettings = (signal?: AbortSignal) => api.get("/api/payroll-settings", payrollSettingsDto, signal);

export const payrollSettingsQueryOptions = () =>
  queryOptions({ queryKey: payrollKeys.settings(), queryFn: ({ signal }) => getPayrollSettings(signal) });

export const usePayrollSettings = () => useQuery(payrollSettingsQueryOptions());
