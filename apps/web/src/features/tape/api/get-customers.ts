import { useQuery } from "@tanstack/react-query";
import { clientRoutes, equipmentRoutes, projectRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { tapeKeys } from "./tape-keys.ts";

/** The clients a sale can go to (tape's own query: features do not share hooks). */
export const useCustomers = () => useQuery({ queryKey: tapeKeys.customers(), queryFn: ({ signal }) => callApi(clientRoutes.list, { signal }) });

export const useCustomerProjects = (clientId: number | null) =>
  useQuery({
    queryKey: tapeKeys.projects(clientId ?? 0),
    queryFn: ({ signal }) => callApi(projectRoutes.list, { params: { id: clientId! }, signal }),
    enabled: clientId !== null && clientId > 0,
  });

/** Tape recorders and their speeds, for the planner's alternatives. */
export const useRecorders = ({ enabled = true }: { enabled?: boolean } = {}) =>
  useQuery({
    queryKey: tapeKeys.recorders(),
    queryFn: async ({ signal }) => (await callApi(equipmentRoutes.list, { signal })).filter((e) => e.kind === "tape_recorder" && e.active && e.speedsIps.length > 0),
    enabled,
  });
