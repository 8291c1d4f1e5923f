import { useMutation, useQueryClient } from "@tanstack/react-query";
import { meDto, type UpdateMeInput } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { authKeys } from "./auth-keys.ts";

export const updateMe = (input: UpdateMeInput) => api.patch("/api/me", input, meDto);

export function useUpdateMe() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateMe,
    onSuccess: (me) => queryClient.setQueryData(authKeys.me(), me),
  });
}
