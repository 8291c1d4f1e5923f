import { queryOptions, useQuery } from "@tanstack/react-query";
import { auditRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { auditKeys } from "./audit-keys.ts";

export const getAuditEvents = (limit: number, signal?: AbortSignal) => callApi(auditRoutes.list, { query: { limit }, signal });

export const auditEventsQueryOptions = (limit = 200) =>
  queryOptions({ queryKey: auditKeys.list(limit), queryFn: ({ signal }) => getAuditEvents(limit, signal) });

export const useAuditEvents = (limit = 200) => useQuery(auditEventsQueryOptions(limit));
