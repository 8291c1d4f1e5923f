import { useMutation, useQueryClient } from "@tanstack/react-query";
import { bookingRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { settleBooking } from "./booking-cache.ts";

/** Frees a held slot at no cost; the next second hold moves up. */
export const releaseBooking = (id: number) => callApi(bookingRoutes.release, { params: { id } });

export function useReleaseBooking(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => releaseBooking(id),
    onSuccess: (booking) => settleBooking(queryClient, booking),
  });
}
