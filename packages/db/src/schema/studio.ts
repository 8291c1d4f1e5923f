import { boolean, char, int, json, mysqlEnum, mysqlTable, text, tinyint, varchar } from "drizzle-orm/mysql-core";
import { overtimeRuleSets, payPeriodKinds, punchRoundings, type CancellationTier } from "@takeup/domain";
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
  /** Local hour the workweek (and every workday) starts at (29 CFR 778.105). */
  workweekStartHour: tinyint("workweek_start_hour").notNull().default(0),
  payPeriodKind: mysqlEnum("pay_period_kind", payPeriodKinds).notNull().default("weekly"),
  /** For fortnightly periods: the first day of any one period (YYYY-MM-DD). */
  payPeriodAnchor: char("pay_period_anchor", { length: 10 }).notNull().default("2026-01-05"),
  punchRounding: mysqlEnum("punch_rounding", punchRoundings).notNull().default("none"),
  overtimeRules: mysqlEnum("overtime_rules", overtimeRuleSets).notNull().default("federal_weekly"),
  roundRegularRateToCent: boolean("round_regular_rate_to_cent").notNull().default(false),
  /** An entry still open after this many hours is flagged for review (never closed silently). */
  openEntryLimitHours: int("open_entry_limit_hours").notNull().default(16),
  /** Vault: days a reel is kept free after its project's last session, then a fee per reel per month. */
  storageFreeDays: int("storage_free_days").notNull().default(90),
  storageMonthlyFeeCents: int("storage_monthly_fee_cents").notNull().default(500),
  /** Recorder care intervals in running hours [common practice; the owner's settings]. */
  alignmentIntervalHours: int("alignment_interval_hours").notNull().default(100),
  cleaningIntervalHours: int("cleaning_interval_hours").notNull().default(10),
  updatedAt: updatedAt(),
});

export type Studio = typeof studio.$inferSelect;
