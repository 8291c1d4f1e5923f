import { useMutation } from "@tanstack/react-query";
import type { PasswordResetInput } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";

export const resetPassword = (input: PasswordResetInput) => api.post("/api/session/password-resets", input);

export const useResetPassword = () => useMutation({ mutationFn: resetPassword });
