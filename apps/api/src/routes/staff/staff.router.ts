import { staffRoutes } from "@takeup/domain";
import { ApiRouter } from "../../lib/api-router.ts";
import type { Deps } from "../../deps.ts";
import { inviteStaff, listStaff, updateStaff } from "./staff.service.ts";

export function staffRouter(deps: Deps) {
  return new ApiRouter("/api/staff", "Staff")
    .handle(staffRoutes.list, () => listStaff(deps.db))
    .handle(staffRoutes.invite, ({ actor, body }) => inviteStaff(deps, actor, body))
    .handle(staffRoutes.update, ({ actor, params, body }) => updateStaff(deps.db, actor, params.userId, body));
}
