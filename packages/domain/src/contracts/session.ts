import { z } from "zod";
import { emailAddress, password } from "./common.ts";

export const signInInput = z.strictObject({
  email: emailAddress,
  password: z.string().min(1, "Enter your password").max(128, "Use at most 128 characters"),
});
export type SignInInput = z.infer<typeof signInInput>;

export const passwordResetRequestInput = z.strictObject({ email: emailAddress });
export type PasswordResetRequestInput = z.infer<typeof passwordResetRequestInput>;

export const passwordResetInput = z.strictObject({
  token: z.string().min(10, "The reset link is incomplete").max(200),
  password,
});
export type PasswordResetInput = z.infer<typeof passwordResetInput>;
