import type { Role } from "@takeup/domain";

/** Who may open each screen (ready for config/access.ts) and use each action; mirrors the API's checks. */
export const payrollAreaRoles = {
  payPeriods: ["owner", "manager", "bookkeeper"],
  payRates: ["owner", "bookkeeper"],
  payrollSettings: ["owner", "manager", "bookkeeper"],
} as const satisfies Record<string, readonly Role[]>;

// Nobody is offered a button that answers 403.
export const canApprovePeriods = (role: Role) => role === "owner" || role === "manager" || role === "bookkeeper";
export const canLockPeriods = (role: Role) => role === "owner" || role === "bookkeeper";
export const canUnlockPeriods = (role: Role) => role === "owner";
export const canExportPayroll = (role: Role) => role === "owner" || role === "bookkeeper";
export const canEditPayRates = (role: Role) => role === "owner";
export const canEditPayrollSettings = (role: Role) => role === "owner";
