import { useMutation, useQueryClient } from "@tanstack/react-query";
import { projectRoutes, type CreateProjectInput } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { projectKeys } from "./booking-keys.ts";

export const createProject = (clientId: number, input: CreateProjectInput) => 
  callApi(projectRoutes.create, { params: { id: clientId }, body: input });

export function useCreateProject(clientId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateProjectInput) => createProject(clientId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: projectKeys.list(clientId) }),
  });
}
