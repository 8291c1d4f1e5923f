import { useMutation, useQueryClient } from "@tanstack/react-query";
import { staffMemberDto, type UpdateStaffInput } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { staffKeys } from "./staff-keys.ts";

export const updateStaff = ({ userId, ...input }: UpdateStaffInput & { userId: string }) =>
  api.patch(`/api/staff/${encodeURIComponent(userId)}`, input, staffMemberDto);

export function useUpdateStaff() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateStaff,
    onSettled: () => queryClient.invalidateQueries({ queryKey: staffKeys.all }),
  });
}
