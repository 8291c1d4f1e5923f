import { useMutation, useQueryClient } from "@tanstack/react-query";
import { meRoutes, type UpdateMeInput } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { authKeys } from "./auth-keys.ts";

export const updateMe = (input: UpdateMeInput) => callApi(meRoutes.update, { body: input });

export function useUpdateMe() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateMe,
    onSuccess: (me) => queryClient.setQueryData(authKeys.me(), me),
  });
}
