import { boolean, char, index, int, json, mysqlEnum, mysqlTable, unique, varchar } from "drizzle-orm/mysql-core";
import { createdAt, id, refId, updatedAt, utc } from "./columns.ts";
import { user } from "./auth.ts";
import { bookings } from "./bookings.ts";
import { editStatuses, payPeriodKinds, payPeriodStatuses, timeEntryKinds, timeEntrySources, type PayRate, type PayrollSettings } from "@takeup/domain";

/** What a member of staff is paid per hour for one kind of work, from a date. */
export const payRates = mysqlTable(
  "pay_rates",
  {
    id: id(),
    staffUserId: varchar("staff_user_id", { length: 36 })
      .notNull()
      .references(() => user.id),
    /** e.g. "engineer", "assistant", "shop". */
    code: varchar("code", { length: 32 }).notNull(),
    hourlyRateCents: int("hourly_rate_cents").notNull(),
    /** Studio-local date (YYYY-MM-DD) the rate applies from. */
    effectiveFrom: char("effective_from", { length: 10 }).notNull(),
    createdByUserId: varchar("created_by_user_id", { length: 36 }).references(() => user.id),
    createdAt: createdAt(),
  },
  // One rate per person, code and date: two would leave the rules engine no way to choose (422 on every period).
  (t) => [unique("pay_rates_staff_code_from").on(t.staffUserId, t.code, t.effectiveFrom)],
);

/** Time worked: a clocked or manual span, against a booked session or as shop time. */
export const timeEntries = mysqlTable(
  "time_entries",
  {
    id: id(),
    staffUserId: varchar("staff_user_id", { length: 36 })
      .notNull()
      .references(() => user.id),
    bookingId: refId("booking_id").references(() => bookings.id),
    kind: mysqlEnum("kind", timeEntryKinds).notNull(),
    payRateCode: varchar("pay_rate_code", { length: 32 }).notNull(),
    startedAt: utc("started_at").notNull(),
    /** Null while the person is still clocked in. */
    endedAt: utc("ended_at"),
    source: mysqlEnum("source", timeEntrySources).notNull(),
    note: varchar("note", { length: 500 }),
    createdByUserId: varchar("created_by_user_id", { length: 36 }).references(() => user.id),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("time_entries_staff_started").on(t.staffUserId, t.startedAt), index("time_entries_started").on(t.startedAt)],
);

/** Unpaid breaks within an entry. */
export const timeEntryBreaks = mysqlTable(
  "time_entry_breaks",
  {
    id: id(),
    timeEntryId: refId("time_entry_id")
      .notNull()
      .references(() => timeEntries.id),
    startedAt: utc("started_at").notNull(),
    endedAt: utc("ended_at"),
  },
  (t) => [index("time_entry_breaks_entry").on(t.timeEntryId)],
);

export type ProposedEntry = {
  startedAt: string;
  endedAt: string;
  breaks: { startedAt: string; endedAt: string }[];
  bookingId: number | null;
};

/** A correction (or a missing entry) to a person's time; someone other than that person approves or rejects it (decision 011). */
export const timeEntryEdits = mysqlTable(
  "time_entry_edits",
  {
    id: id(),
    /** Null when the proposal adds a manual entry. */
    timeEntryId: refId("time_entry_id").references(() => timeEntries.id),
    /** Whose time it is (the entry's person), not who proposed the change. */
    staffUserId: varchar("staff_user_id", { length: 36 })
      .notNull()
      .references(() => user.id),
    proposedByUserId: varchar("proposed_by_user_id", { length: 36 }).references(() => user.id),
    proposed: json("proposed").$type<ProposedEntry>().notNull(),
    reason: varchar("reason", { length: 500 }).notNull(),
    status: mysqlEnum("status", editStatuses).notNull().default("pending"),
    decidedByUserId: varchar("decided_by_user_id", { length: 36 }).references(() => user.id),
    decidedAt: utc("decided_at"),
    decisionNote: varchar("decision_note", { length: 500 }),
    /** The entry an approval wrote: the corrected one, or the one it added. */
    resultEntryId: refId("result_entry_id").references(() => timeEntries.id),
    /** An owner approved a change to their own time (no other owner to ask); shown to the bookkeeper. */
    selfApproved: boolean("self_approved").notNull().default(false),
    createdAt: createdAt(),
  },
  (t) => [index("time_entry_edits_status").on(t.status), index("time_entry_edits_staff").on(t.staffUserId)],
);

/** A pay period the bookkeeper reviews, approves and locks. Dates are studio-local, inclusive. */
export const payPeriods = mysqlTable(
  "pay_periods",
  {
    id: id(),
    kind: mysqlEnum("kind", payPeriodKinds).notNull(),
    startDate: char("start_date", { length: 10 }).notNull(),
    endDate: char("end_date", { length: 10 }).notNull(),
    status: mysqlEnum("status", payPeriodStatuses).notNull().default("open"),
    approvedByUserId: varchar("approved_by_user_id", { length: 36 }).references(() => user.id),
    approvedAt: utc("approved_at"),
    lockedByUserId: varchar("locked_by_user_id", { length: 36 }).references(() => user.id),
    lockedAt: utc("locked_at"),
    /** What the figures were computed with when the period was locked, so later setting or rate changes cannot alter it. */
    lockedSettings: json("locked_settings").$type<PayrollSettings>(),
    lockedPayRates: json("locked_pay_rates").$type<PayRate[]>(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [unique("pay_periods_kind_start").on(t.kind, t.startDate)],
);

export type TimeEntry = typeof timeEntries.$inferSelect;
export type TimeEntryEdit = typeof timeEntryEdits.$inferSelect;
export type PayPeriodRow = typeof payPeriods.$inferSelect;
export type PayRateRow = typeof payRates.$inferSelect;
