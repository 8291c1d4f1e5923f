import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { bookingRoutes, type QuoteInput } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { quoteKeys } from "./booking-keys.ts";

/** A price and what is in the way, for a slot not booked yet. Nothing is stored. */
export const getQuote = (input: QuoteInput) => callApi(bookingRoutes.quote, { body: input });

/** Keeps the last answer on screen while the next one is on its way, so the panel does not flicker. */
export const useQuote = (input: QuoteInput | null) =>
  useQuery({
    queryKey: input ? quoteKeys.quote(input) : [...quoteKeys.all, "none"],
    queryFn: () => getQuote(input as QuoteInput),
    enabled: input !== null,
    placeholderData: keepPreviousData,
    staleTime: 10_000,
  });
