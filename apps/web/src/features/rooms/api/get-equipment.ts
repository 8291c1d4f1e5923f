import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { equipmentDto } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { roomKeys } from "./room-keys.ts";

export const getEquipment = (signal?: AbortSignal) => api.get("/api/equipment", z.array(equipmentDto), signal);

export const equipmentQueryOptions = () => queryOptions({ queryKey: roomKeys.equipment(), queryFn: ({ signal }) => getEquipment(signal) });

export const useEquipment = ({ enabled = true }: { enabled?: boolean } = {}) => useQuery({ ...equipmentQueryOptions(), enabled });
