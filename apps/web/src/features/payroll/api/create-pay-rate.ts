import { useMutation, useQueryClient } from "@tanstack/react-query";
import { payrollRoutes, type CreatePayRateInput } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { payrollKeys } from "./payroll-keys.ts";

export const createPayRate = (input: CreatePayRateInput) => callApi(payrollRoutes.createRate, { body: input });

export function useCreatePayRate() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createPayRate,
    // A new rate can put entries that had none into a period's figures.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: payrollKeys.all }),
  });
}
