import { useMutation, useQueryClient } from "@tanstack/react-query";
import { bookingRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { settleBooking } from "./booking-cache.ts";

/** Cancels a confirmed booking; the fee is the one the cancellation preview showed. */
export const cancelBooking = (id: number, input: { reason?: string }) => callApi(bookingRoutes.cancel, { params: { id }, body: input });

export function useCancelBooking(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: { reason?: string }) => cancelBooking(id, input),
    onSuccess: (booking) => settleBooking(queryClient, booking),
  });
}
