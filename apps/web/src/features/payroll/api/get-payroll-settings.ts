import { queryOptions, useQuery } from "@tanstack/react-query";
import { payrollRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { payrollKeys } from "./payroll-keys.ts";

export const getPayrollSettings = (signal?: AbortSignal) => callApi(payrollRoutes.settings, { signal });

export const payrollSettingsQueryOptions = () =>
  queryOptions({ queryKey: payrollKeys.settings(), queryFn: ({ signal }) => getPayrollSettings(signal) });

export const usePayrollSettings = () => useQuery(payrollSettingsQueryOptions());
