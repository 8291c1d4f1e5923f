import { useMutation, useQueryClient } from "@tanstack/react-query";
import { equipmentRoutes, type UpdateEquipmentInput } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { roomKeys } from "./room-keys.ts";

/** Moving kit to another room is a change of its home room. */
export const updateEquipment = (id: number, input: UpdateEquipmentInput) => callApi(equipmentRoutes.update, { params: { id }, body: input });

export function useUpdateEquipment(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateEquipmentInput) => updateEquipment(id, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: roomKeys.equipment() }),
  });
}
