import { useMutation, useQueryClient } from "@tanstack/react-query";
import { equipmentDto, type CreateEquipmentInput } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { roomKeys } from "./room-keys.ts";

export const createEquipment = (input: CreateEquipmentInput) => api.post("/api/equipment", input, equipmentDto);

export function useCreateEquipment() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createEquipment,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: roomKeys.equipment() }),
  });
}
