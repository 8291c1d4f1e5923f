import { useMutation, useQueryClient } from "@tanstack/react-query";
import { engineerRateRoutes, type CreateEngineerRateInput } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { roomKeys } from "./room-keys.ts";

export const createEngineerRate = (input: CreateEngineerRateInput) => callApi(engineerRateRoutes.create, { body: input });

export function useCreateEngineerRate() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createEngineerRate,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: roomKeys.engineerRates() }),
  });
}
