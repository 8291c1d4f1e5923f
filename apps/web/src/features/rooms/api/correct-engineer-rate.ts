import { useMutation, useQueryClient } from "@tanstack/react-query";
import { engineerRateDto, type CorrectEngineerRateInput } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { roomKeys } from "./room-keys.ts";

export const correctEngineerRate = ({ id, ...input }: CorrectEngineerRateInput & { id: number }) => api.patch(`/api/engineer-rates/${id}`, input, engineerRateDto);

export function useCorrectEngineerRate() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: correctEngineerRate,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: roomKeys.engineerRates() }),
  });
}
