import { useMutation, useQueryClient } from "@tanstack/react-query";
import { clientRoutes, type UpdateClientInput } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { clientKeys } from "./client-keys.ts";

export const updateClient = (id: number, input: UpdateClientInput) => callApi(clientRoutes.update, { params: { id }, body: input });

export function useUpdateClient(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateClientInput) => updateClient(id, input),
    onSuccess: (client) => {
      queryClient.setQueryData(clientKeys.detail(id), client);
      return queryClient.invalidateQueries({ queryKey: clientKeys.lists() });
    },
  });
}
