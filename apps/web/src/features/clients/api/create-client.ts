import { useMutation, useQueryClient } from "@tanstack/react-query";
import { clientDetailDto, type CreateClientInput } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { clientKeys } from "./client-keys.ts";

export const createClient = (input: CreateClientInput) => api.post("/api/clients", input, clientDetailDto);

export function useCreateClient() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createClient,
    onSuccess: (client) => {
      queryClient.setQueryData(clientKeys.detail(client.id), client);
      return queryClient.invalidateQueries({ queryKey: clientKeys.lists() });
    },
  });
}
