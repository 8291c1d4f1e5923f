import { useMutation } from "@tanstack/react-query";
import { sessionRoutes, type PasswordResetRequestInput } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";

export const requestPasswordReset = (input: PasswordResetRequestInput) =>
  callApi(sessionRoutes.requestPasswordReset, { body: input });

export const useRequestPasswordReset = () => useMutation({ mutationFn: requestPasswordReset });
