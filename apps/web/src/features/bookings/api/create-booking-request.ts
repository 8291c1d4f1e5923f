import { useMutation, useQueryClient } from "@tanstack/react-query";
import { bookingRoutes, type BookingRequestInput } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { settleBooking } from "./booking-cache.ts";

/** A client asks for a slot; it arrives at the studio as a hold to confirm. */
export const createBookingRequest = (input: BookingRequestInput) => callApi(bookingRoutes.request, { body: input });

export function useCreateBookingRequest() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createBookingRequest, onSuccess: (booking) => settleBooking(queryClient, booking) });
}
