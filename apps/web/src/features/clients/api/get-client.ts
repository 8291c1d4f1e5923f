import { queryOptions, useQuery } from "@tanstack/react-query";
import { clientRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { clientKeys } from "./client-keys.ts";

export const getClient = (id: number, signal?: AbortSignal) => callApi(clientRoutes.get, { params: { id }, signal });

export const clientQueryOptions = (id: number) =>
  queryOptions({ queryKey: clientKeys.detail(id), queryFn: ({ signal }) => getClient(id, signal) });

export const useClient = (id: number) => useQuery(clientQueryOptions(id));
