import { useMutation, useQueryClient } from "@tanstack/react-query";
import { engineerRateDto, type CreateEngineerRateInput } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { roomKeys } from "./room-keys.ts";

export const createEngineerRate = (input: CreateEngineerRateInput) => api.post("/api/engineer-rates", input, engineerRateDto);

export function useCreateEngineerRate() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createEngineerRate,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: roomKeys.engineerRates() }),
  });
}
