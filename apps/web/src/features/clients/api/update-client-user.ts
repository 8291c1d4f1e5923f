import { useMutation, useQueryClient } from "@tanstack/react-query";
import { clientRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { clientKeys } from "./client-keys.ts";

type Change = { userId: string; active: boolean };

export const updateClientUser = (clientId: number, { userId, active }: Change) =>
  callApi(clientRoutes.setUserActive, { params: { id: clientId, userId }, body: { active } });

export function useUpdateClientUser(clientId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (change: Change) => updateClientUser(clientId, change),
    onSuccess: (client) => {
      queryClient.setQueryData(clientKeys.detail(clientId), client);
      return queryClient.invalidateQueries({ queryKey: clientKeys.lists() });
    },
  });
}
