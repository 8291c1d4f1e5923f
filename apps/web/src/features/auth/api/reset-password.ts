import { useMutation } from "@tanstack/react-query";
import { sessionRoutes, type PasswordResetInput } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";

export const resetPassword = (input: PasswordResetInput) => callApi(sessionRoutes.resetPassword, { body: input });

export const useResetPassword = () => useMutation({ mutationFn: resetPassword });
