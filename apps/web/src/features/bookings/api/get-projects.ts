import { queryOptions, useQuery } from "@tanstack/react-query";
import { projectRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { projectKeys } from "./booking-keys.ts";

export const getProjects = (clientId: number, signal?: AbortSignal) => 
  callApi(projectRoutes.list, { params: { id: clientId }, signal });

export const projectsQueryOptions = (clientId: number) =>
  queryOptions({ queryKey: projectKeys.list(clientId), queryFn: ({ signal }) => getProjects(clientId, signal) });

export const useProjects = (clientId: number | null) =>
  useQuery({ ...projectsQueryOptions(clientId ?? 0), enabled: clientId !== null && clientId > 0 });
