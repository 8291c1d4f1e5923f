import { useMutation, useQueryClient } from "@tanstack/react-query";
import { bookingDto } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { settleBooking } from "./booking-cache.ts";

/** Frees a held slot at no cost; the next second hold moves up. */
export const releaseBooking = (id: number) => api.post(`/api/bookings/${id}/release`, {}, bookingDto);

export function useReleaseBooking(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => releaseBooking(id),
    onSuccess: (booking) => settleBooking(queryClient, booking),
  });
}
