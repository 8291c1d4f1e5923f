import { useQuery } from "@tanstack/react-query";
import { bookingRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { bookingKeys } from "./booking-keys.ts";

/** What cancelling now would cost, and why; asked afresh each time, since notice shrinks by the minute. */
export const getCancellationPreview = (id: number, signal?: AbortSignal) => callApi(bookingRoutes.cancellationPreview, { params: { id }, signal });

export const useCancellationPreview = (id: number, { enabled = true }: { enabled?: boolean } = {}) =>
  useQuery({
    queryKey: bookingKeys.cancellationPreview(id),
    queryFn: ({ signal }) => getCancellationPreview(id, signal),
    enabled,
    staleTime: 0,
    gcTime: 0,
  });
