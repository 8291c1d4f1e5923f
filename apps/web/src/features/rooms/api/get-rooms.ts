import { queryOptions, useQuery } from "@tanstack/react-query";
import { roomRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { roomKeys } from "./room-keys.ts";

export const getRooms = (signal?: AbortSignal) => callApi(roomRoutes.list, { signal });

export const roomsQueryOptions = () => queryOptions({ queryKey: roomKeys.list(), queryFn: ({ signal }) => getRooms(signal) });

export const useRooms = ({ enabled = true }: { enabled?: boolean } = {}) => useQuery({ ...roomsQueryOptions(), enabled });
