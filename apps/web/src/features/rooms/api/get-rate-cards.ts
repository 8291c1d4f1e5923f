import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { rateCardVersionDto } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { roomKeys } from "./room-keys.ts";

/** Every version of a room's rate card, newest first. */
export const getRateCards = (roomId: number, signal?: AbortSignal) =>
  api.get(`/api/rooms/${roomId}/rate-cards`, z.array(rateCardVersionDto), signal);

export const rateCardsQueryOptions = (roomId: number) =>
  queryOptions({ queryKey: roomKeys.rateCards(roomId), queryFn: ({ signal }) => getRateCards(roomId, signal) });

export const useRateCards = (roomId: number, { enabled = true }: { enabled?: boolean } = {}) =>
  useQuery({ ...rateCardsQueryOptions(roomId), enabled });
