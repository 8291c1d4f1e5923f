import { useMutation, useQueryClient } from "@tanstack/react-query";
import { clientRoutes, type InviteClientUserInput } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { clientKeys } from "./client-keys.ts";

export const inviteClientUser = (clientId: number, input: InviteClientUserInput) => callApi(clientRoutes.inviteUser, { params: { id: clientId }, body: input });

export function useInviteClientUser(clientId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: InviteClientUserInput) => inviteClientUser(clientId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: clientKeys.detail(clientId) }),
  });
}
