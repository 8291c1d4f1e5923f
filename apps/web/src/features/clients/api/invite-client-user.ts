import { useMutation, useQueryClient } from "@tanstack/react-query";
import { pendingInvitationDto, type InviteClientUserInput } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { clientKeys } from "./client-keys.ts";

export const inviteClientUser = (clientId: number, input: InviteClientUserInput) =>
  api.post(`/api/clients/${clientId}/invitations`, input, pendingInvitationDto);

export function useInviteClientUser(clientId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: InviteClientUserInput) => inviteClientUser(clientId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: clientKeys.detail(clientId) }),
  });
}
