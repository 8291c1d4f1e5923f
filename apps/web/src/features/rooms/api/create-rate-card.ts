import { useMutation, useQueryClient } from "@tanstack/react-query";
import { rateCardVersionDto, type CreateRateCardVersionInput } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { roomKeys } from "./room-keys.ts";

/** Adds a new version; bookings already quoted keep the version they were quoted on. */
export const createRateCard = (roomId: number, input: CreateRateCardVersionInput) =>
  api.post(`/api/rooms/${roomId}/rate-cards`, input, rateCardVersionDto);

export function useCreateRateCard(roomId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateRateCardVersionInput) => createRateCard(roomId, input),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: roomKeys.rateCards(roomId) }),
        // The room's current prices may have changed with it.
        queryClient.invalidateQueries({ queryKey: roomKeys.lists() }),
      ]),
  });
}
