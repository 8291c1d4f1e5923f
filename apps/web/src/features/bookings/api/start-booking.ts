import { useMutation, useQueryClient } from "@tanstack/react-query";
import { bookingDto } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { settleBooking } from "./booking-cache.ts";

/** The session has begun: owner, manager, or an engineer on the booking. */
export const startBooking = (id: number) => api.post(`/api/bookings/${id}/start`, {}, bookingDto);

export function useStartBooking(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => startBooking(id),
    onSuccess: (booking) => settleBooking(queryClient, booking),
  });
}
