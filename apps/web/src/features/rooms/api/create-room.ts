import { useMutation, useQueryClient } from "@tanstack/react-query";
import { roomRoutes, type CreateRoomInput } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { roomKeys } from "./room-keys.ts";

export const createRoom = (input: CreateRoomInput) => callApi(roomRoutes.create, { body: input });

export function useCreateRoom() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createRoom,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: roomKeys.lists() }),
  });
}
