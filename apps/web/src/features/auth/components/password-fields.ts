import { z } from "zod";
import { acceptInvitationInput, passwordResetInput } from "@takeup/domain";

const mustMatch = {
  message: "The two passwords are not the same",
  path: ["confirmPassword"],
};

// The shared schemas decide what a good password is; the confirm field only guards against typos.
export const newPasswordForm = passwordResetInput
  .omit({ token: true })
  .extend({ confirmPassword: z.string() })
  .refine((v) => v.password === v.confirmPassword, mustMatch);

export const acceptInvitationForm = acceptInvitationInput
  .extend({ confirmPassword: z.string() })
  .refine((v) => v.password === v.confirmPassword, mustMatch);
