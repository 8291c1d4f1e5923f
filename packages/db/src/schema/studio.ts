import { char, int, json, mysqlTable, text, tinyint, varchar } from "drizzle-orm/mysql-core";
import type { CancellationTier } from "@takeup/domain";
import { updatedAt } from "./columns.ts";

/** The one studio this deployment serves: a single row with id 1. */
export const studio = mysqlTable("studio", {
  id: int("id").primaryKey(),
  name: varchar("name", { length: 120 }).notNull(),
  timeZone: varchar("time_zone", { length: 64 }).notNull(),
  currency: char("currency", { length: 3 }).notNull(),
  /** ISO weekday the workweek starts on: 1 = Monday … 7 = Sunday. */
  workweekStartDay: tinyint("workweek_start_day").notNull().default(1),
  address: text("address"),
  email: varchar("email", { length: 254 }),
  phone: varchar("phone", { length: 40 }),
  /** How long a hold lasts before it lapses on its own. */
  holdHours: int("hold_hours").notNull().default(48),
  /** The deposit that confirms a booking, as basis points of its quote (3000 = 30%). */
  depositBp: int("deposit_bp").notNull().default(3000),
  cancellationTiers: json("cancellation_tiers")
    .$type<CancellationTier[]>()
    .notNull()
    .$defaultFn(() => [
      { noticeUnderHours: 48, feeBp: 5000 },
      { noticeUnderHours: 168, feeBp: 2500 },
    ]),
  updatedAt: updatedAt(),
});

export type Studio = typeof studio.$inferSelect;
