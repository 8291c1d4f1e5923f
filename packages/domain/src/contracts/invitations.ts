import { z } from "zod";
import { roles } from "../auth/roles.ts";
import { password } from "./common.ts";
import { meDto } from "./me.ts";
import { defineRoute } from "./route.ts";

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

/** Invitation links: what one is for, and accepting it. */
export const invitationRoutes = {
  get: defineRoute({
    method: "get",
    path: "/api/invitations/:token",
    summary: "What an invitation link is for (who, which role, which studio)",
    access: "public",
    params: invitationTokenParams,
    response: invitationDto,
  }),
  accept: defineRoute({
    method: "post",
    path: "/api/invitations/:token/accept",
    summary: "Accept an invitation: set a password and sign in",
    access: "public",
    params: invitationTokenParams,
    body: acceptInvitationInput,
    status: 201,
    response: meDto,
  }),
};
