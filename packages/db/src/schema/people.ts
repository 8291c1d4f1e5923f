import { boolean, index, int, mysqlEnum, mysqlTable, text, varchar } from "drizzle-orm/mysql-core";
import { createdAt, id, refId, updatedAt, utc } from "./columns.ts";
import { user } from "./auth.ts";
import { clientKinds, engineerGrades, roles, staffRoles } from "@takeup/domain";

/** A member of staff: one row per staff user; the role decides what they may do. */
export const staffProfiles = mysqlTable("staff_profiles", {
  userId: varchar("user_id", { length: 36 })
    .primaryKey()
    .references(() => user.id, { onDelete: "cascade" }),
  role: mysqlEnum("role", staffRoles).notNull(),
  displayName: varchar("display_name", { length: 120 }).notNull(),
  /** For engineers: the grade clients are billed at (engineer or assistant). */
  engineerGrade: mysqlEnum("engineer_grade", engineerGrades),
  active: boolean("active").notNull().default(true),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
  /** Bumped by every booking write that checks this resource for overlaps: a write, so Galera certifies two such transactions against each other (decision 017). */
  lockVersion: int("lock_version", { unsigned: true }).notNull().default(0),
});

/** A band, producer or label the studio works for. */
export const clientAccounts = mysqlTable("client_accounts", {
  id: id(),
  name: varchar("name", { length: 120 }).notNull().unique(),
  kind: mysqlEnum("kind", clientKinds).notNull(),
  email: varchar("email", { length: 254 }),
  phone: varchar("phone", { length: 40 }),
  billingAddress: text("billing_address"),
  notes: text("notes"),
  active: boolean("active").notNull().default(true),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
});

/** People at a client account the studio talks to (they need not have a sign-in). */
export const clientContacts = mysqlTable(
  "client_contacts",
  {
    id: id(),
    clientAccountId: refId("client_account_id")
      .notNull()
      .references(() => clientAccounts.id),
    name: varchar("name", { length: 120 }).notNull(),
    email: varchar("email", { length: 254 }),
    phone: varchar("phone", { length: 40 }),
    note: varchar("note", { length: 120 }),
    isPrimary: boolean("is_primary").notNull().default(false),
    position: int("position").notNull().default(0),
  },
  (t) => [index("client_contacts_account_idx").on(t.clientAccountId)],
);

/** A client sign-in belongs to exactly one client account and sees nothing of any other. */
export const clientUsers = mysqlTable(
  "client_users",
  {
    userId: varchar("user_id", { length: 36 })
      .primaryKey()
      .references(() => user.id, { onDelete: "cascade" }),
    clientAccountId: refId("client_account_id")
      .notNull()
      .references(() => clientAccounts.id),
    active: boolean("active").notNull().default(true),
    createdAt: createdAt(),
  },
  (t) => [index("client_users_account_idx").on(t.clientAccountId)],
);

/** An e-mailed invitation to set a password; only the SHA-256 of its token is stored. */
export const invitations = mysqlTable(
  "invitations",
  {
    id: id(),
    email: varchar("email", { length: 254 }).notNull(),
    name: varchar("name", { length: 120 }).notNull(),
    role: mysqlEnum("role", roles).notNull(),
    clientAccountId: refId("client_account_id").references(() => clientAccounts.id),
    tokenHash: varchar("token_hash", { length: 64 }).notNull().unique(),
    invitedByUserId: varchar("invited_by_user_id", { length: 36 }).references(() => user.id),
    expiresAt: utc("expires_at").notNull(),
    acceptedAt: utc("accepted_at"),
    revokedAt: utc("revoked_at"),
    createdAt: createdAt(),
  },
  (t) => [index("invitations_email_idx").on(t.email)],
);

export type StaffProfile = typeof staffProfiles.$inferSelect;
export type ClientAccount = typeof clientAccounts.$inferSelect;
export type ClientContact = typeof clientContacts.$inferSelect;
export type Invitation = typeof invitations.$inferSelect;
