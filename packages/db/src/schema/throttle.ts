import { index, int, mysqlTable, varchar } from "drizzle-orm/mysql-core";
import { utc } from "./columns.ts";

/**
 * Counters behind the sign-in and password-reset throttles (decision 009), shared by every API
 * process. One row per key ("sign-in:address:…", "sign-in:account:…" …): hits in the current
 * window, when that window began, and until when the key is refused.
 */
export const throttleCounters = mysqlTable(
  "throttle_counters",
  {
    key: varchar("key", { length: 191 }).primaryKey(),
    hits: int("hits", { unsigned: true }).notNull(),
    windowStartedAt: utc("window_started_at").notNull(),
    blockedUntil: utc("blocked_until"),
  },
  (t) => [index("throttle_counters_window_idx").on(t.windowStartedAt)],
);
