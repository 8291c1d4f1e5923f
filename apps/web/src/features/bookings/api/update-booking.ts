import { useMutation, useQueryClient } from "@tanstack/react-query";
import { bookingDto, type UpdateBookingInput } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { settleBooking } from "./booking-cache.ts";

export const updateBooking = (id: number, input: UpdateBookingInput) => api.patch(`/api/bookings/${id}`, input, bookingDto);

export function useUpdateBooking(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateBookingInput) => updateBooking(id, input),
    onSuccess: (booking) => settleBooking(queryClient, booking),
  });
}
