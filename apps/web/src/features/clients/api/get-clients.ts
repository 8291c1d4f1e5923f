import { queryOptions, useQuery } from "@tanstack/react-query";
import { clientRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { clientKeys } from "./client-keys.ts";

export const getClients = (signal?: AbortSignal) => callApi(clientRoutes.list, { signal });

export const clientsQueryOptions = () => queryOptions({ queryKey: clientKeys.list(), queryFn: ({ signal }) => getClients(signal) });

export const useClients = ({ enabled = true }: { enabled?: boolean } = {}) => useQuery({ ...clientsQueryOptions(), enabled });
