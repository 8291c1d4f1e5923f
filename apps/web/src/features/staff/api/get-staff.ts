import { queryOptions, useQuery } from "@tanstack/react-query";
import { staffListDto } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { staffKeys } from "./staff-keys.ts";

export const getStaff = (signal?: AbortSignal) => api.get("/api/staff", staffListDto, signal);

export const staffQueryOptions = () => queryOptions({ queryKey: staffKeys.list(), queryFn: ({ signal }) => getStaff(signal) });

export const useStaff = ({ enabled = true }: { enabled?: boolean } = {}) => useQuery({ ...staffQueryOptions(), enabled });
