import { queryOptions, useQuery } from "@tanstack/react-query";
import { studioRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { studioKeys } from "./studio-keys.ts";

export const getStudio = (signal?: AbortSignal) => callApi(studioRoutes.get, { signal });

export const studioQueryOptions = () =>
  queryOptions({ queryKey: studioKeys.detail(), queryFn: ({ signal }) => getStudio(signal), staleTime: 5 * 60_000 });

export const useStudio = () => useQuery(studioQueryOptions());
