import { queryOptions, useQuery } from "@tanstack/react-query";
import { roomRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { roomKeys } from "./room-keys.ts";

/** Every version of a room's rate card, newest first. */
export const getRateCards = (roomId: number, signal?: AbortSignal) =>
  callApi(roomRoutes.rateCards, { params: { id: roomId }, signal });

export const rateCardsQueryOptions = (roomId: number) =>
  queryOptions({ queryKey: roomKeys.rateCards(roomId), queryFn: ({ signal }) => getRateCards(roomId, signal) });

export const useRateCards = (roomId: number, { enabled = true }: { enabled?: boolean } = {}) =>
  useQuery({ ...rateCardsQueryOptions(roomId), enabled });
