import type { Role } from "@takeup/domain";

/** Which roles may open each area; mirrors the API's own checks so nobody is shown a dead end. */
export const areaRoles = {
  clients: ["owner", "manager", "bookkeeper"],
  team: ["owner"],
  settings: ["owner"],
  activity: ["owner"],
  devMail: ["owner"],
} as const satisfies Record<string, readonly Role[]>;

const clientEditors: readonly Role[] = ["owner", "manager"];

/** Bookkeepers read client accounts but never change them. */
export const canEditClients = (role: Role) => clientEditors.includes(role);

export const isAllowed = (role: Role, allowed: readonly Role[]) => allowed.includes(role);
