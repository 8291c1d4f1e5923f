import { useMutation, useQueryClient } from "@tanstack/react-query";
import { invitationRoutes, type AcceptInvitationInput, type MeDto } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { startSession } from "./get-me.ts";

export const acceptInvitation = (token: string, input: AcceptInvitationInput) =>
  callApi(invitationRoutes.accept, { params: { token }, body: input });

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
