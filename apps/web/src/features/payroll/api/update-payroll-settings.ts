import { useMutation, useQueryClient } from "@tanstack/react-query";
import { payrollRoutes, type UpdatePayrollSettingsInput } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { payrollKeys } from "./payroll-keys.ts";

export const updatePayrollSettings = (input: UpdatePayrollSettingsInput) => callApi(payrollRoutes.updateSettings, { body: input });

export function useUpdatePayrollSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updatePayrollSettings,
    // Open periods are worked out again with the new rules; the list may change kind too.
    onSuccess: (settings) => {
      queryClient.setQueryData(payrollKeys.settings(), settings);
      return queryClient.invalidateQueries({ queryKey: payrollKeys.all });
    },
  });
}
