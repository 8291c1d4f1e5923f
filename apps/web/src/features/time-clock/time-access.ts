import type { Role } from "@takeup/domain";

/** Who may open each screen (ready for config/access.ts) and use each action; mirrors the API's checks. */
export const timeAreaRoles = {
  // Engineers see the clock at "/" as their home; owner and manager clock in at /clock.
  clock: ["owner", "manager", "engineer"],
  myTimesheet: ["owner", "manager", "engineer"],
  approvals: ["owner", "manager"],
} as const satisfies Record<string, readonly Role[]>;

/** Who decides corrections (the API's own check on approve and reject). */
export const canDecideCorrections = (role: Role) => role === "owner" || role === "manager";
