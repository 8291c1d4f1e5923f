import { useMutation, useQueryClient } from "@tanstack/react-query";
import { staffRoutes, type UpdateStaffInput } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { staffKeys } from "./staff-keys.ts";

export const updateStaff = ({ userId, ...input }: UpdateStaffInput & { userId: string }) =>
  callApi(staffRoutes.update, { params: { userId }, body: input });

export function useUpdateStaff() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateStaff,
    onSettled: () => queryClient.invalidateQueries({ queryKey: staffKeys.all }),
  });
}
