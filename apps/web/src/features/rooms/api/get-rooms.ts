import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { roomDto } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { roomKeys } from "./room-keys.ts";

export const getRooms = (signal?: AbortSignal) => api.get("/api/rooms", z.array(roomDto), signal);

export const roomsQueryOptions = () => queryOptions({ queryKey: roomKeys.list(), queryFn: ({ signal }) => getRooms(signal) });

export const useRooms = ({ enabled = true }: { enabled?: boolean } = {}) => useQuery({ ...roomsQueryOptions(), enabled });
