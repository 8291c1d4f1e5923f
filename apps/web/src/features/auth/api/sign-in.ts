import { useMutation, useQueryClient } from "@tanstack/react-query";
import { sessionRoutes, type MeDto, type SignInInput } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { startSession } from "./get-me.ts";

export const signIn = (input: SignInInput) => callApi(sessionRoutes.signIn, { body: input });

export function useSignIn({ onSuccess }: { onSuccess?: (me: MeDto) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: (me) => {
      startSession(queryClient, me);
      onSuccess?.(me);
    },
  });
}
