import { useMutation, useQueryClient } from "@tanstack/react-query";
import { payrollRoutes, type CorrectPayRateInput } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { payrollKeys } from "./payroll-keys.ts";

export const correctPayRate = ({ id, ...input }: CorrectPayRateInput & { id: number }) => callApi(payrollRoutes.correctRate, { params: { id }, body: input });

export function useCorrectPayRate() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: correctPayRate,
    // A corrected rate changes the figures of every open period it applies to.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: payrollKeys.all }),
  });
}
