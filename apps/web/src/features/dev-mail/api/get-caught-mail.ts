import { queryOptions, useQuery } from "@tanstack/react-query";
import { devMailRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { devMailKeys } from "./dev-mail-keys.ts";

export const getCaughtMail = (signal?: AbortSignal) => callApi(devMailRoutes.list, { signal });

export const caughtMailQueryOptions = () =>
  queryOptions({ queryKey: devMailKeys.list(), queryFn: ({ signal }) => getCaughtMail(signal), staleTime: 0 });

export const useCaughtMail = () => useQuery(caughtMailQueryOptions());
