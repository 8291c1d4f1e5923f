import { useMutation, useQueryClient } from "@tanstack/react-query";
import { bookingRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { settleBooking } from "./booking-cache.ts";

/** The session is over. */
export const wrapBooking = (id: number) => callApi(bookingRoutes.wrap, { params: { id } });

export function useWrapBooking(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => wrapBooking(id),
    onSuccess: (booking) => settleBooking(queryClient, booking),
  });
}
