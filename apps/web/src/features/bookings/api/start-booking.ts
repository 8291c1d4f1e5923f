import { useMutation, useQueryClient } from "@tanstack/react-query";
import { bookingRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { settleBooking } from "./booking-cache.ts";

/** The session has begun: owner, manager, or an engineer on the booking. */
export const startBooking = (id: number) => callApi(bookingRoutes.start, { params: { id } });

export function useStartBooking(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => startBooking(id),
    onSuccess: (booking) => settleBooking(queryClient, booking),
  });
}
