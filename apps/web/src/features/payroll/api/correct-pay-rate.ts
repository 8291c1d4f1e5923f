import { useMutation, useQueryClient } from "@tanstack/react-query";
import { payRateDto, type CorrectPayRateInput } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { payrollKeys } from "./payroll-keys.ts";

export const correctPayRate = ({ id, ...input }: CorrectPayRateInput & { id: number }) => api.patch(`/api/pay-rates/${id}`, input, payRateDto);

export function useCorrectPayRate() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: correctPayRate,
    // A corrected rate changes the figures of every open period it applies to.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: payrollKeys.all }),
  });
}
