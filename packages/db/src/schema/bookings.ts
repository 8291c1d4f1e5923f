import { boolean, index, int, json, mysqlEnum, mysqlTable, primaryKey, text, varchar } from "drizzle-orm/mysql-core";
import { createdAt, id, refId, updatedAt, utc } from "./columns.ts";
import { user } from "./auth.ts";
import { clientAccounts } from "./people.ts";
import { equipment, rateCardVersions, rooms } from "./rooms.ts";
import { bookingStatuses, type Quote } from "@takeup/domain";

/** An album, EP or single a client is making; bookings and reels may belong to one. */
export const projects = mysqlTable(
  "projects",
  {
    id: id(),
    clientAccountId: refId("client_account_id")
      .notNull()
      .references(() => clientAccounts.id),
    name: varchar("name", { length: 120 }).notNull(),
    notes: text("notes"),
    active: boolean("active").notNull().default(true),
    createdAt: createdAt(),
  },
  (t) => [index("projects_client_idx").on(t.clientAccountId)],
);

export const bookings = mysqlTable(
  "bookings",
  {
    id: id(),
    roomId: refId("room_id")
      .notNull()
      .references(() => rooms.id),
    clientAccountId: refId("client_account_id")
      .notNull()
      .references(() => clientAccounts.id),
    projectId: refId("project_id").references(() => projects.id),
    startsAt: utc("starts_at").notNull(),
    endsAt: utc("ends_at").notNull(),
    status: mysqlEnum("status", bookingStatuses).notNull(),
    /** The room is the client's around the clock for whole studio days (the span is stored widened to them). */
    lockout: boolean("lockout").notNull().default(false),
    /** A hold lapses at this instant unless it is confirmed first. */
    holdExpiresAt: utc("hold_expires_at"),
    /** A second hold waits behind this first hold and takes the slot when it lapses or is released. */
    queuedBehindId: refId("queued_behind_id"),
    rateCardVersionId: refId("rate_card_version_id")
      .notNull()
      .references(() => rateCardVersions.id),
    /** The quote exactly as the client was shown it, with the rate-card version it was priced on. */
    quote: json("quote").$type<Quote>().notNull(),
    quoteTotalCents: int("quote_total_cents").notNull(),
    depositRequiredCents: int("deposit_required_cents").notNull(),
    depositReceivedAt: utc("deposit_received_at"),
    title: varchar("title", { length: 120 }),
    notes: text("notes"),
    requestedByClient: boolean("requested_by_client").notNull().default(false),
    cancelledAt: utc("cancelled_at"),
    cancellationReason: varchar("cancellation_reason", { length: 200 }),
    cancellationFeeCents: int("cancellation_fee_cents"),
    reminderSentAt: utc("reminder_sent_at"),
    holdNoticeSentAt: utc("hold_notice_sent_at"),
    createdByUserId: varchar("created_by_user_id", { length: 36 }).references(() => user.id),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    // Overlap queries are bounded below by the longest allowed booking, so this index serves them;
    // it also covers the occupancy test, so index condition pushdown drops non-overlapping and
    // non-occupying entries before any (quote-sized) row is read.
    index("bookings_room_occupancy").on(t.roomId, t.startsAt, t.endsAt, t.status, t.queuedBehindId, t.holdExpiresAt),
    index("bookings_starts").on(t.startsAt),
    index("bookings_client_starts").on(t.clientAccountId, t.startsAt),
    index("bookings_hold_expiry").on(t.status, t.holdExpiresAt),
    index("bookings_queued_behind").on(t.queuedBehindId),
  ],
);

/** Engineers on a booking; the booking's times are copied here so per-engineer overlap checks use an index. */
export const bookingEngineers = mysqlTable(
  "booking_engineers",
  {
    bookingId: refId("booking_id")
      .notNull()
      .references(() => bookings.id),
    staffUserId: varchar("staff_user_id", { length: 36 })
      .notNull()
      .references(() => user.id),
    startsAt: utc("starts_at").notNull(),
    endsAt: utc("ends_at").notNull(),
  },
  (t) => [primaryKey({ columns: [t.bookingId, t.staffUserId] }), index("booking_engineers_staff_starts").on(t.staffUserId, t.startsAt)],
);

export const bookingEquipment = mysqlTable(
  "booking_equipment",
  {
    bookingId: refId("booking_id")
      .notNull()
      .references(() => bookings.id),
    equipmentId: refId("equipment_id")
      .notNull()
      .references(() => equipment.id),
    startsAt: utc("starts_at").notNull(),
    endsAt: utc("ends_at").notNull(),
  },
  (t) => [primaryKey({ columns: [t.bookingId, t.equipmentId] }), index("booking_equipment_item_starts").on(t.equipmentId, t.startsAt)],
);

/** A secret calendar-feed address for a room or an engineer; only the token's hash is kept. */
export const calendarFeedTokens = mysqlTable(
  "calendar_feed_tokens",
  {
    id: id(),
    roomId: refId("room_id").references(() => rooms.id),
    staffUserId: varchar("staff_user_id", { length: 36 }).references(() => user.id),
    tokenHash: varchar("token_hash", { length: 64 }).notNull().unique(),
    createdByUserId: varchar("created_by_user_id", { length: 36 }).references(() => user.id),
    createdAt: createdAt(),
    revokedAt: utc("revoked_at"),
  },
  (t) => [index("calendar_feed_tokens_room").on(t.roomId), index("calendar_feed_tokens_staff").on(t.staffUserId)],
);

export type Project = typeof projects.$inferSelect;
export type Booking = typeof bookings.$inferSelect;
