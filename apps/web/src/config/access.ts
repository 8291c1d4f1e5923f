import type { Role } from "@takeup/domain";

/** Which roles may open each area; mirrors the API's own checks so nobody is shown a dead end. */
export const areaRoles = {
  clients: ["owner", "manager", "bookkeeper"],
  // Bookkeepers read the calendar and the bookings; only owner and manager book.
  calendar: ["owner", "manager", "bookkeeper"],
  bookings: ["owner", "manager", "bookkeeper"],
  rooms: ["owner", "manager", "bookkeeper"],
  mySessions: ["engineer"],
  sessions: ["client"],
  team: ["owner"],
  settings: ["owner"],
  activity: ["owner"],
  devMail: ["owner"],
} as const satisfies Record<string, readonly Role[]>;

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
