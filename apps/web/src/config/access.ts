import type { Role } from "@takeup/domain";

/** Which roles may open each area; mirrors the API's own checks so nobody is shown a dead end. */
export const areaRoles = {
  clients: ["owner", "manager", "bookkeeper"],
  // Bookkeepers read the calendar and the bookings; only owner and manager book.
  calendar: ["owner", "manager", "bookkeeper"],
  bookings: ["owner", "manager", "bookkeeper"],
  rooms: ["owner", "manager", "bookkeeper"],
  tapeStock: ["owner", "manager", "bookkeeper"],
  tapePlanner: ["owner", "manager", "engineer", "bookkeeper"],
  vault: ["owner", "manager", "engineer", "bookkeeper", "client"],
  mySessions: ["engineer"],
  sessions: ["client"],
  team: ["owner"],
  settings: ["owner"],
  profile: ["owner", "manager", "engineer", "bookkeeper", "client"],
  activity: ["owner"],
  devMail: ["owner"],
  // Engineers have the clock on their home page; owner and manager clock in at /clock.
  clock: ["owner", "manager", "engineer"],
  myTimesheet: ["owner", "manager", "engineer"],
  approvals: ["owner", "manager"],
  payPeriods: ["owner", "manager", "bookkeeper"],
  payRates: ["owner", "bookkeeper"],
  payrollSettings: ["owner", "manager", "bookkeeper"],
  invoices: ["owner", "manager", "bookkeeper", "client"],
  billable: ["owner", "manager", "bookkeeper"],
  receivables: ["owner", "manager", "bookkeeper"],
  invoiceSettings: ["owner", "manager", "bookkeeper"],
} as const satisfies Record<string, readonly Role[]>;

/** Receiving, selling and counting tape is the manager's (and the owner's) work. */
export const canMoveTapeStock = (role: Role) => role === "owner" || role === "manager";

const clientEditors: readonly Role[] = ["owner", "manager"];

/** Bookkeepers read client accounts but never change them. */
export const canEditClients = (role: Role) => clientEditors.includes(role);

const bookers: readonly Role[] = ["owner", "manager"];

/** Who pencils holds, books, confirms and cancels. */
export const canBook = (role: Role) => bookers.includes(role);

/** Rooms, rate cards, equipment and engineer rates are the owner's to change. */
export const canEditRooms = (role: Role) => role === "owner";

/** Rate cards and engineer rates are money: owner, manager and bookkeeper may read them. */
export const canSeeRates = (role: Role) => role === "owner" || role === "manager" || role === "bookkeeper";

/** The equipment list is for the people who run sessions. */
export const canSeeEquipment = (role: Role) => role === "owner" || role === "manager" || role === "engineer";

/** Room calendar feeds are handed out by the owner and the manager. */
export const canManageRoomFeeds = (role: Role) => bookers.includes(role);

export const isAllowed = (role: Role, allowed: readonly Role[]) => allowed.includes(role);

// Time and payroll actions: nobody is offered a button that answers 403.

/** Who decides corrections (the API's own check on approve and reject). */
export const canDecideCorrections = (role: Role) => role === "owner" || role === "manager";
export const canApprovePeriods = (role: Role) => role === "owner" || role === "manager" || role === "bookkeeper";
export const canLockPeriods = (role: Role) => role === "owner" || role === "bookkeeper";
export const canUnlockPeriods = (role: Role) => role === "owner";
export const canExportPayroll = (role: Role) => role === "owner" || role === "bookkeeper";
export const canEditPayRates = (role: Role) => role === "owner";
export const canEditPayrollSettings = (role: Role) => role === "owner";
