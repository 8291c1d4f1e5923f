import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import { bookingRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { bookingKeys, type BookingsParams } from "./booking-keys.ts";

/** Bookings overlapping [from, to); the API answers for at most 62 days at a time. */
export function getBookings(params: BookingsParams, signal?: AbortSignal) {
  return callApi(bookingRoutes.list, { query: params, signal });
}

export const bookingsQueryOptions = (params: BookingsParams) =>
  queryOptions({ queryKey: bookingKeys.list(params), queryFn: ({ signal }) => getBookings(params, signal) });

export const useBookings = (params: BookingsParams, { enabled = true, keepPrevious = false }: { enabled?: boolean; keepPrevious?: boolean } = {}) =>
  useQuery({ ...bookingsQueryOptions(params), enabled, placeholderData: keepPrevious ? keepPreviousData : undefined });
