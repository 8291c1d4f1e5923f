import { useMutation } from "@tanstack/react-query";
import type { PasswordResetRequestInput } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";

export const requestPasswordReset = (input: PasswordResetRequestInput) =>
  api.post("/api/session/password-reset-requests", input);

export const useRequestPasswordReset = () => useMutation({ mutationFn: requestPasswordReset });
