import { useMutation, useQueryClient } from "@tanstack/react-query";
import { roomRoutes, type UpdateRoomInput } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { roomKeys } from "./room-keys.ts";

export const updateRoom = (id: number, input: UpdateRoomInput) => callApi(roomRoutes.update, { params: { id }, body: input });

export function useUpdateRoom(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateRoomInput) => updateRoom(id, input),
    // Equipment lists show the home room's name, so they follow a rename too.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: roomKeys.all }),
  });
}
