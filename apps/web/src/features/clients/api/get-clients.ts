import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { clientSummaryDto } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { clientKeys } from "./client-keys.ts";

export const getClients = (signal?: AbortSignal) => api.get("/api/clients", z.array(clientSummaryDto), signal);

export const clientsQueryOptions = () => queryOptions({ queryKey: clientKeys.list(), queryFn: ({ signal }) => getClients(signal) });

export const useClients = ({ enabled = true }: { enabled?: boolean } = {}) => useQuery({ ...clientsQueryOptions(), enabled });
