import type { QueryClient } from "@tanstack/react-query";
import type { BookingDto } from "@takeup/domain";
import { bookingKeys, quoteKeys } from "./booking-keys.ts";

/**
 * After any change to a booking: keep its fresh copy, and refetch every list and quote, since
 * one change can move another booking too (a released hold lets the second hold move up).
 */
export function settleBooking(queryClient: QueryClient, booking: BookingDto) {
  queryClient.setQueryData(bookingKeys.detail(booking.id), booking);
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: bookingKeys.all }),
    queryClient.invalidateQueries({ queryKey: quoteKeys.all }),
  ]);
}
