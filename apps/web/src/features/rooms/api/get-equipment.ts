import { queryOptions, useQuery } from "@tanstack/react-query";
import { equipmentRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { roomKeys } from "./room-keys.ts";

export const getEquipment = (signal?: AbortSignal) => callApi(equipmentRoutes.list, { signal });

export const equipmentQueryOptions = () => queryOptions({ queryKey: roomKeys.equipment(), queryFn: ({ signal }) => getEquipment(signal) });

export const useEquipment = ({ enabled = true }: { enabled?: boolean } = {}) => useQuery({ ...equipmentQueryOptions(), enabled });
