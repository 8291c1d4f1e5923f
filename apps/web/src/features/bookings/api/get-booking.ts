import { queryOptions, useQuery } from "@tanstack/react-query";
import { bookingRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { bookingKeys } from "./booking-keys.ts";

export const getBooking = (id: number, signal?: AbortSignal) => callApi(bookingRoutes.get, { params: { id }, signal });

export const bookingQueryOptions = (id: number) => queryOptions({ queryKey: bookingKeys.detail(id), queryFn: ({ signal }) => getBooking(id, signal) });

export const useBooking = (id: number) => useQuery(bookingQueryOptions(id));
