import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { auditEventDto } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { auditKeys } from "./audit-keys.ts";

export const getAuditEvents = (limit: number, signal?: AbortSignal) =>
  api.get(`/api/audit-events?limit=${limit}`, z.array(auditEventDto), signal);

export const auditEventsQueryOptions = (limit = 200) =>
  queryOptions({ queryKey: auditKeys.list(limit), queryFn: ({ signal }) => getAuditEvents(limit, signal) });

export const useAuditEvents = (limit = 200) => useQuery(auditEventsQueryOptions(limit));
