import { useMutation, useQueryClient } from "@tanstack/react-query";
import { meDto, type MeDto, type SignInInput } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { startSession } from "./get-me.ts";

export const signIn = (input: SignInInput) => api.post("/api/session", input, meDto);

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
