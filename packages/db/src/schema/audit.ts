import { index, int, json, mediumtext, mysqlEnum, mysqlTable, text, uniqueIndex, varchar } from "drizzle-orm/mysql-core";
import { createdAt, id, utc } from "./columns.ts";

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

/**
 * Every e-mail the product sent or tried to send, and how it went. Scheduled work does not send
 * directly: it queues a message here under a unique key in the same transaction as the change it
 * reports (status `queued`), so a repeat run or a second API process queues nothing new; the
 * delivery job then claims queued rows and sends them (lib/outbox.ts, decision 017).
 */
export const emailMessages = mysqlTable(
  "email_messages",
  {
    id: id(),
    toAddress: varchar("to_address", { length: 254 }).notNull(),
    subject: varchar("subject", { length: 200 }).notNull(),
    template: varchar("template", { length: 48 }).notNull(),
    status: mysqlEnum("status", ["queued", "sent", "failed"]).notNull(),
    providerMessageId: varchar("provider_message_id", { length: 200 }),
    error: text("error"),
    /** Set for queued mail: what the message is about, e.g. `booking-reminder:42:ada@example.test`. */
    dedupeKey: varchar("dedupe_key", { length: 191 }),
    textBody: mediumtext("text_body"),
    htmlBody: mediumtext("html_body"),
    /** Queued attachments, base64-encoded. */
    attachments: json("attachments").$type<{ filename: string; contentBase64: string; contentType?: string }[]>(),
    attempts: int("attempts", { unsigned: true }).notNull().default(0),
    claimToken: varchar("claim_token", { length: 36 }),
    claimedUntil: utc("claimed_until"),
    createdAt: createdAt(),
    sentAt: utc("sent_at"),
  },
  (t) => [
    index("email_messages_sent_at_idx").on(t.sentAt),
    uniqueIndex("email_messages_dedupe_key_uq").on(t.dedupeKey),
    index("email_messages_queue_idx").on(t.status, t.claimedUntil),
    index("email_messages_claim_idx").on(t.claimToken),
  ],
);

/**
 * One row per scheduled job: when it may next run, and who ran it last. A process runs a job only
 * after moving `next_run_at` forward itself (an UPDATE, so Galera certifies it), so however many
 * API processes tick, each job runs once per interval (decision 017).
 */
export const scheduledJobs = mysqlTable("scheduled_jobs", {
  name: varchar("name", { length: 64 }).primaryKey(),
  nextRunAt: utc("next_run_at").notNull(),
  lastHolder: varchar("last_holder", { length: 64 }),
  lastStartedAt: utc("last_started_at"),
  lastFinishedAt: utc("last_finished_at"),
  lastResult: int("last_result"),
  lastError: text("last_error"),
});

export type AuditEvent = typeof auditEvents.$inferSelect;
