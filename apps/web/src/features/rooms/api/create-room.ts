import { useMutation, useQueryClient } from "@tanstack/react-query";
import { roomDto, type CreateRoomInput } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { roomKeys } from "./room-keys.ts";

export const createRoom = (input: CreateRoomInput) => api.post("/api/rooms", input, roomDto);

export function useCreateRoom() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createRoom,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: roomKeys.lists() }),
  });
}
