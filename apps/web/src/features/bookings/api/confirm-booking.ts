import { useMutation, useQueryClient } from "@tanstack/react-query";
import { bookingRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { settleBooking } from "./booking-cache.ts";

/** A hold becomes a confirmed booking; the deposit may be marked received at the same time. */
export const confirmBooking = (id: number, input: { depositReceived?: boolean }) => callApi(bookingRoutes.confirm, { params: { id }, body: input });

export function useConfirmBooking(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: { depositReceived?: boolean }) => confirmBooking(id, input),
    onSuccess: (booking) => settleBooking(queryClient, booking),
  });
}
