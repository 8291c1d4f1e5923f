import { index, json, mysqlEnum, mysqlTable, text, varchar } from "drizzle-orm/mysql-core";
import { id, utc } from "./columns.ts";

/** Who did what to which row, with the row before and after: written by every mutating service. */
export const auditEvents = mysqlTable(
  "audit_events",
  {
    id: id(),
    actorUserId: varchar("actor_user_id", { length: 36 }),
    action: varchar("action", { length: 64 }).notNull(),
    entityType: varchar("entity_type", { length: 48 }).notNull(),
    entityId: varchar("entity_id", { length: 64 }).notNull(),
    before: json("before"),
    after: json("after"),
    at: utc("at")
      .notNull()
      .$defaultFn(() => new Date()),
  },
  (t) => [index("audit_events_entity_idx").on(t.entityType, t.entityId), index("audit_events_at_idx").on(t.at)],
);

/** Every e-mail the product tried to send, and how it went. */
export const emailMessages = mysqlTable(
  "email_messages",
  {
    id: id(),
    toAddress: varchar("to_address", { length: 254 }).notNull(),
    subject: varchar("subject", { length: 200 }).notNull(),
    template: varchar("template", { length: 48 }).notNull(),
    status: mysqlEnum("status", ["sent", "failed"]).notNull(),
    providerMessageId: varchar("provider_message_id", { length: 200 }),
    error: text("error"),
    sentAt: utc("sent_at")
      .notNull()
      .$defaultFn(() => new Date()),
  },
  (t) => [index("email_messages_sent_at_idx").on(t.sentAt)],
);

export type AuditEvent = typeof auditEvents.$inferSelect;
