import { useMutation, useQueryClient } from "@tanstack/react-query";
import { clientRoutes, type CreateClientInput } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { clientKeys } from "./client-keys.ts";

export const createClient = (input: CreateClientInput) => callApi(clientRoutes.create, { body: input });

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
