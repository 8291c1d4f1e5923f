import { z } from "zod";
import { emailAddress, okDto, password } from "./common.ts";
import { meDto } from "./me.ts";
import { defineRoute } from "./route.ts";

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

/** Sign-in, sign-out and password reset, in front of better-auth (decision 008). */
export const sessionRoutes = {
  signIn: defineRoute({
    method: "post",
    path: "/api/session",
    summary: "Sign in with e-mail and password (429 after repeated failures)",
    access: "public",
    body: signInInput,
    response: meDto,
  }),
  signOut: defineRoute({ method: "delete", path: "/api/session", summary: "Sign out", access: "public", response: okDto }),
  requestPasswordReset: defineRoute({
    method: "post",
    path: "/api/session/password-reset-requests",
    summary: "E-mail a password-reset link (answers the same whether or not the address is known; 429 past 10 requests from one address in 15 minutes)",
    access: "public",
    body: passwordResetRequestInput,
    status: 202,
    response: okDto,
  }),
  resetPassword: defineRoute({
    method: "post",
    path: "/api/session/password-resets",
    summary: "Set a new password with the token from a reset e-mail",
    access: "public",
    body: passwordResetInput,
    response: okDto,
  }),
};
