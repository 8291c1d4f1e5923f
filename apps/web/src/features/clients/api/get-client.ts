import { queryOptions, useQuery } from "@tanstack/react-query";
import { clientDetailDto } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { clientKeys } from "./client-keys.ts";

export const getClient = (id: number, signal?: AbortSignal) => api.get(`/api/clients/${id}`, clientDetailDto, signal);

export const clientQueryOptions = (id: number) =>
  queryOptions({ queryKey: clientKeys.detail(id), queryFn: ({ signal }) => getClient(id, signal) });

export const useClient = (id: number) => useQuery(clientQueryOptions(id));
