import { useMutation, useQueryClient } from "@tanstack/react-query";
import { staffRoutes, type InviteStaffInput } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { staffKeys } from "./staff-keys.ts";

export const inviteStaff = (input: InviteStaffInput) => callApi(staffRoutes.invite, { body: input });

export function useInviteStaff() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: inviteStaff,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: staffKeys.all }),
  });
}
