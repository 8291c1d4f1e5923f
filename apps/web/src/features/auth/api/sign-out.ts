import { useMutation } from "@tanstack/react-query";
import { api } from "../../../lib/api-client.ts";

export const signOut = () => api.delete("/api/session");

export function useSignOut({ onSuccess, onError }: { onSuccess?: () => void; onError?: (error: unknown) => void } = {}) {
  return useMutation({ mutationFn: signOut, onSuccess, onError });
}
