import { useMutation, useQueryClient } from "@tanstack/react-query";
import { bookingRoutes, type UpdateBookingInput } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { settleBooking } from "./booking-cache.ts";

export const updateBooking = (id: number, input: UpdateBookingInput) => callApi(bookingRoutes.update, { params: { id }, body: input });

export function useUpdateBooking(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateBookingInput) => updateBooking(id, input),
    onSuccess: (booking) => settleBooking(queryClient, booking),
  });
}
