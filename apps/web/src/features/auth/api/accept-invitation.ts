import { useMutation, useQueryClient } from "@tanstack/react-query";
import { meDto, type AcceptInvitationInput, type MeDto } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { startSession } from "./get-me.ts";

export const acceptInvitation = (token: string, input: AcceptInvitationInput) =>
  api.post(`/api/invitations/${encodeURIComponent(token)}/accept`, input, meDto);

export function useAcceptInvitation(token: string, { onSuccess }: { onSuccess?: (me: MeDto) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: AcceptInvitationInput) => acceptInvitation(token, input),
    onSuccess: (me) => {
      startSession(queryClient, me);
      onSuccess?.(me);
    },
  });
}
