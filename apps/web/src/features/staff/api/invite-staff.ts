import { useMutation, useQueryClient } from "@tanstack/react-query";
import { pendingInvitationDto, type InviteStaffInput } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { staffKeys } from "./staff-keys.ts";

export const inviteStaff = (input: InviteStaffInput) => api.post("/api/staff/invitations", input, pendingInvitationDto);

export function useInviteStaff() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: inviteStaff,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: staffKeys.all }),
  });
}
