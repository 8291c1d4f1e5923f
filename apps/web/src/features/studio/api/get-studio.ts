import { queryOptions, useQuery } from "@tanstack/react-query";
import { studioDto } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { studioKeys } from "./studio-keys.ts";

export const getStudio = (signal?: AbortSignal) => api.get("/api/studio", studioDto, signal);

export const studioQueryOptions = () =>
  queryOptions({ queryKey: studioKeys.detail(), queryFn: ({ signal }) => getStudio(signal), staleTime: 5 * 60_000 });

export const useStudio = () => useQuery(studioQueryOptions());
