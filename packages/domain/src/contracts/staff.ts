import { z } from "zod";
import { staffRoles } from "../auth/roles.ts";
import { emailAddress, personName, userIdParams } from "./common.ts";
import { defineRoute } from "./route.ts";

export const staffMemberDto = z.object({
  userId: z.string(),
  name: z.string(),
  email: z.string(),
  role: z.enum(staffRoles),
  active: z.boolean(),
  joinedAt: z.string(),
});
export type StaffMemberDto = z.infer<typeof staffMemberDto>;

export const pendingInvitationDto = z.object({
  id: z.number(),
  name: z.string(),
  email: z.string(),
  role: z.string(),
  expiresAt: z.string(),
});
export type PendingInvitationDto = z.infer<typeof pendingInvitationDto>;

export const staffListDto = z.object({
  members: z.array(staffMemberDto),
  invitations: z.array(pendingInvitationDto),
});
export type StaffListDto = z.infer<typeof staffListDto>;

export const inviteStaffInput = z.strictObject({
  name: personName,
  email: emailAddress,
  role: z.enum(staffRoles, "Choose owner, manager, engineer or bookkeeper"),
});
export type InviteStaffInput = z.infer<typeof inviteStaffInput>;

export const updateStaffInput = z
  .strictObject({
    role: z.enum(staffRoles, "Choose owner, manager, engineer or bookkeeper").optional(),
    active: z.boolean().optional(),
  })
  .refine((v) => v.role !== undefined || v.active !== undefined, {
    message: "Send a role or an active flag",
  });
export type UpdateStaffInput = z.infer<typeof updateStaffInput>;

export const staffRoutes = {
  list: defineRoute({
    method: "get",
    path: "/api/staff",
    summary: "Everyone on the team, and invitations not yet accepted",
    access: ["owner"],
    response: staffListDto,
  }),
  invite: defineRoute({
    method: "post",
    path: "/api/staff/invitations",
    summary: "Invite a member of staff by e-mail",
    access: ["owner"],
    body: inviteStaffInput,
    status: 201,
    response: pendingInvitationDto,
  }),
  update: defineRoute({
    method: "patch",
    path: "/api/staff/:userId",
    summary: "Change a member's role, or deactivate (ends their sessions at once) or reactivate them",
    access: ["owner"],
    params: userIdParams,
    body: updateStaffInput,
    response: staffMemberDto,
  }),
};
