import { useMutation, useQueryClient } from "@tanstack/react-query";
import { equipmentRoutes, type CreateEquipmentInput } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { roomKeys } from "./room-keys.ts";

export const createEquipment = (input: CreateEquipmentInput) => callApi(equipmentRoutes.create, { body: input });

export function useCreateEquipment() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createEquipment,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: roomKeys.equipment() }),
  });
}
