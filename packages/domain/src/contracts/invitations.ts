import { z } from "zod";
import { roles } from "../auth/roles.ts";
import { password } from "./common.ts";

export const invitationTokenParams = z.strictObject({
  token: z.string().regex(/^[A-Za-z0-9_-]{32,64}$/, "Not an invitation token"),
});

export const invitationDto = z.object({
  name: z.string(),
  email: z.string(),
  role: z.enum(roles),
  studioName: z.string(),
  clientAccountName: z.string().nullable(),
  expiresAt: z.string(),
});
export type InvitationDto = z.infer<typeof invitationDto>;

export const acceptInvitationInput = z.strictObject({ password });
export type AcceptInvitationInput = z.infer<typeof acceptInvitationInput>;
