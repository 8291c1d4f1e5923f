import { useMutation, useQueryClient } from "@tanstack/react-query";
import { engineerRateRoutes, type CorrectEngineerRateInput } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { roomKeys } from "./room-keys.ts";

export const correctEngineerRate = ({ id, ...input }: CorrectEngineerRateInput & { id: number }) => callApi(engineerRateRoutes.correct, { params: { id }, body: input });

export function useCorrectEngineerRate() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: correctEngineerRate,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: roomKeys.engineerRates() }),
  });
}
