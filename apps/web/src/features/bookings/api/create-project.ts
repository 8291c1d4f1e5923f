import { useMutation, useQueryClient } from "@tanstack/react-query";
import { projectDto, type CreateProjectInput } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { projectKeys } from "./booking-keys.ts";

export const createProject = (clientId: number, input: CreateProjectInput) => api.post(`/api/clients/${clientId}/projects`, input, projectDto);

export function useCreateProject(clientId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateProjectInput) => createProject(clientId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: projectKeys.list(clientId) }),
  });
}
