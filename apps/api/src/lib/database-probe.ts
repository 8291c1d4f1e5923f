import { sql } from "drizzle-orm";
import type { Db } from "@takeup/db";

export type DatabaseProbe = () => Promise<boolean>;

/**
 * Asks MariaDB for `SELECT 1`, giving up after `timeoutMs`. The error handler calls it for an
 * error it does not recognise (better-auth, for one, replaces a failed query with its own
 * "Failed to get session"), so a database outage reads as 503 rather than 500 on every route.
 */
export function databaseProbe(db: Db, timeoutMs = 2000): DatabaseProbe {
  return async () => {
    let timer: NodeJS.Timeout | undefined;
    const timeout = new Promise<false>((resolve) => {
      timer = setTimeout(() => resolve(false), timeoutMs);
    });
    try {
      return await Promise.race([db.execute(sql`SELECT 1`).then(() => true), timeout]);
    } catch {
      return false;
    } finally {
      clearTimeout(timer);
    }
  };
}

/** Seconds a client should wait before trying again: a database restart, or a busy moment. */
export const retryAfterSeconds = { unavailable: 5, busy: 1 } as const;
