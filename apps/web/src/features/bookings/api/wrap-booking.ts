import { useMutation, useQueryClient } from "@tanstack/react-query";
import { bookingDto } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { settleBooking } from "./booking-cache.ts";

/** The session is over. */
export const wrapBooking = (id: number) => api.post(`/api/bookings/${id}/wrap`, {}, bookingDto);

export function useWrapBooking(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => wrapBooking(id),
    onSuccess: (booking) => settleBooking(queryClient, booking),
  });
}
