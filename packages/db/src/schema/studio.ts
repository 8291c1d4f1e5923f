import { char, int, mysqlTable, text, tinyint, varchar } from "drizzle-orm/mysql-core";
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
  updatedAt: updatedAt(),
});

export type Studio = typeof studio.$inferSelect;
