import { useMutation, useQueryClient } from "@tanstack/react-query";
import { clientDetailDto } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { clientKeys } from "./client-keys.ts";

type Change = { userId: string; active: boolean };

export const updateClientUser = (clientId: number, { userId, active }: Change) =>
  api.patch(`/api/clients/${clientId}/users/${encodeURIComponent(userId)}`, { active }, clientDetailDto);

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
