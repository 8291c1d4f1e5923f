import { sql } from "drizzle-orm";
import { boolean, index, int, json, mysqlEnum, mysqlTable, text, unique, varchar } from "drizzle-orm/mysql-core";
import { createdAt, id, refId, updatedAt, utc } from "./columns.ts";
import { user } from "./auth.ts";
import { engineerGrades, equipmentKinds, roomColours } from "@takeup/domain";

export const rooms = mysqlTable("rooms", {
  id: id(),
  name: varchar("name", { length: 60 }).notNull().unique(),
  description: text("description"),
  capacity: int("capacity").notNull().default(1),
  colour: mysqlEnum("colour", roomColours).notNull(),
  /** Set-up and turnover time kept free between two bookings of this room. */
  turnoverMinutes: int("turnover_minutes").notNull().default(30),
  position: int("position").notNull().default(0),
  active: boolean("active").notNull().default(true),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
  /** Bumped by every booking write that checks this resource for overlaps: a write, so Galera certifies two such transactions against each other (decision 017). */
  lockVersion: int("lock_version", { unsigned: true }).notNull().default(0),
});

/** A bookable piece of kit; it lives in a room but can be booked into another room's session. */
export const equipment = mysqlTable("equipment", {
  id: id(),
  name: varchar("name", { length: 120 }).notNull(),
  kind: mysqlEnum("kind", equipmentKinds).notNull(),
  homeRoomId: refId("home_room_id").references(() => rooms.id),
  trackCount: int("track_count"),
  /** Tape width in thousandths of an inch (250 = 1/4 inch, 2000 = 2 inch). */
  tapeWidthMils: int("tape_width_mils"),
  /** Tape speeds it runs at, in inches per second. */
  speedsIps: json("speeds_ips").$type<number[]>(),
  notes: text("notes"),
  active: boolean("active").notNull().default(true),
  createdAt: createdAt(),
  updatedAt: updatedAt(),
  /** Bumped by every booking write that checks this resource for overlaps: a write, so Galera certifies two such transactions against each other (decision 017). */
  lockVersion: int("lock_version", { unsigned: true }).notNull().default(0),
});

/** One version of a room's prices. A new change is a new row; bookings point at the row they were quoted on. */
export const rateCardVersions = mysqlTable(
  "rate_card_versions",
  {
    id: id(),
    roomId: refId("room_id")
      .notNull()
      .references(() => rooms.id),
    version: int("version").notNull(),
    effectiveFrom: utc("effective_from").notNull(),
    hourlyRateCents: int("hourly_rate_cents").notNull(),
    dayRateCents: int("day_rate_cents").notNull(),
    dayCoversMinutes: int("day_covers_minutes").notNull(),
    minimumBillableMinutes: int("minimum_billable_minutes").notNull(),
    billingIncrementMinutes: int("billing_increment_minutes").notNull(),
    /** Minutes after local midnight; the window may wrap midnight (22:00–08:00 is 1320–480). */
    afterHoursStartMinute: int("after_hours_start_minute").notNull(),
    afterHoursEndMinute: int("after_hours_end_minute").notNull(),
    afterHoursPremiumBp: int("after_hours_premium_bp").notNull(),
    weekendPremiumBp: int("weekend_premium_bp").notNull(),
    /** What one lockout day costs; null means the day rate (docs/pricing.md, lockouts). */
    lockoutDayRateCents: int("lockout_day_rate_cents"),
    /** Whether a lockout day on a Saturday or Sunday carries the weekend premium. */
    lockoutWeekendPremium: boolean("lockout_weekend_premium").notNull().default(false),
    note: varchar("note", { length: 200 }),
    createdByUserId: varchar("created_by_user_id", { length: 36 }).references(() => user.id),
    createdAt: createdAt(),
  },
  (t) => [unique("rate_card_versions_room_version").on(t.roomId, t.version), index("rate_card_versions_room_effective").on(t.roomId, t.effectiveFrom)],
);

/** What the studio bills a client per hour of engineer time: per grade, or for one engineer. */
export const engineerRates = mysqlTable(
  "engineer_rates",
  {
    id: id(),
    grade: mysqlEnum("grade", engineerGrades).notNull(),
    staffUserId: varchar("staff_user_id", { length: 36 }).references(() => user.id),
    hourlyRateCents: int("hourly_rate_cents").notNull(),
    effectiveFrom: utc("effective_from").notNull(),
    /** The staff id, or "" for a grade's rate: a unique key treats NULLs as distinct, so it keys on this
     *  (MariaDB refuses NOT NULL on a generated column; coalesce never yields NULL). */
    staffKey: varchar("staff_key", { length: 36 }).generatedAlwaysAs(sql`coalesce(\`staff_user_id\`, '')`, { mode: "stored" }),
    createdByUserId: varchar("created_by_user_id", { length: 36 }).references(() => user.id),
    createdAt: createdAt(),
  },
  (t) => [index("engineer_rates_grade_effective").on(t.grade, t.effectiveFrom), unique("engineer_rates_grade_staff_from").on(t.grade, t.staffKey, t.effectiveFrom)],
);

export type Room = typeof rooms.$inferSelect;
export type Equipment = typeof equipment.$inferSelect;
export type RateCardVersion = typeof rateCardVersions.$inferSelect;
export type EngineerRate = typeof engineerRates.$inferSelect;
