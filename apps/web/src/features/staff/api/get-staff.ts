import { queryOptions, useQuery } from "@tanstack/react-query";
import { staffRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { staffKeys } from "./staff-keys.ts";

export const getStaff = (signal?: AbortSignal) => callApi(staffRoutes.list, { signal });

export const staffQueryOptions = () => queryOptions({ queryKey: staffKeys.list(), queryFn: ({ signal }) => getStaff(signal) });

export const useStaff = ({ enabled = true }: { enabled?: boolean } = {}) => useQuery({ ...staffQueryOptions(), enabled });
