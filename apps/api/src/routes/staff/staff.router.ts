import { inviteStaffInput, pendingInvitationDto, staffListDto, staffMemberDto, updateStaffInput, userIdParams } from "@takeup/domain";
import { ApiRouter } from "../../lib/api-router.ts";
import type { Deps } from "../../deps.ts";
import { inviteStaff, listStaff, updateStaff } from "./staff.service.ts";

export function staffRouter(deps: Deps) {
  return new ApiRouter("/api/staff", "Staff")
    .route({
      method: "get",
      path: "/",
      summary: "Everyone on the team, and invitations not yet accepted",
      access: ["owner"],
      response: staffListDto,
      handler: () => listStaff(deps.db),
    })
    .route({
      method: "post",
      path: "/invitations",
      summary: "Invite a member of staff by e-mail",
      access: ["owner"],
      body: inviteStaffInput,
      status: 201,
      response: pendingInvitationDto,
      handler: ({ actor, body }) => inviteStaff(deps, actor, body),
    })
    .route({
      method: "patch",
      path: "/:userId",
      summary: "Change a member's role, or deactivate (ends their sessions at once) or reactivate them",
      access: ["owner"],
      params: userIdParams,
      body: updateStaffInput,
      response: staffMemberDto,
      handler: ({ actor, params, body }) => updateStaff(deps.db, actor, params.userId, body),
    });
}
