import { queryOptions, useQuery } from "@tanstack/react-query";
import { bookingDto } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { bookingKeys } from "./booking-keys.ts";

export const getBooking = (id: number, signal?: AbortSignal) => api.get(`/api/bookings/${id}`, bookingDto, signal);

export const bookingQueryOptions = (id: number) => queryOptions({ queryKey: bookingKeys.detail(id), queryFn: ({ signal }) => getBooking(id, signal) });

export const useBooking = (id: number) => useQuery(bookingQueryOptions(id));
