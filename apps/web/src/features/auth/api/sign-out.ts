import { useMutation } from "@tanstack/react-query";
import { sessionRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";

export const signOut = () => callApi(sessionRoutes.signOut);

export function useSignOut({ onSuccess, onError }: { onSuccess?: () => void; onError?: (error: unknown) => void } = {}) {
  return useMutation({ mutationFn: signOut, onSuccess, onError });
}
