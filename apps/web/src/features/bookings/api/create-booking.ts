import { useMutation, useQueryClient } from "@tanstack/react-query";
import { bookingRoutes, type CreateBookingInput } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { settleBooking } from "./booking-cache.ts";

/** 409 booking_conflict when the slot was taken since the quote. */
export const createBooking = (input: CreateBookingInput) => callApi(bookingRoutes.create, { body: input });

export function useCreateBooking() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createBooking, onSuccess: (booking) => settleBooking(queryClient, booking) });
}
