import { useMutation, useQueryClient } from "@tanstack/react-query";
import { roomRoutes, type CreateRateCardVersionInput } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { roomKeys } from "./room-keys.ts";

/** Adds a new version; bookings already quoted keep the version they were quoted on. */
export const createRateCard = (roomId: number, input: CreateRateCardVersionInput) =>
  callApi(roomRoutes.addRateCard, { params: { id: roomId }, body: input });

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
