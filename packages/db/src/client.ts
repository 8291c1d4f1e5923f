import mysql from "mysql2/promise";
import { drizzle } from "drizzle-orm/mysql2";
import * as schema from "./schema/index.ts";
import { withWriteRetry, type WriteRetryOptions } from "./write-retry.ts";

export * from "./write-retry.ts";
export * from "./errors.ts";

export function createDb(databaseUrl: string, options: { connectionLimit?: number; writeRetry?: WriteRetryOptions } = {}) {
  const pool = mysql.createPool({
    uri: databaseUrl,
    // Instants are UTC end to end: the server runs at +00:00 and mysql2 reads and writes "Z".
    timezone: "Z",
    connectionLimit: options.connectionLimit ?? 10,
    supportBigNumbers: true,
  });
  // "planetscale" mode keeps relational queries free of LATERAL joins, which MariaDB rejects.
  const db = drizzle({ client: pool, schema, mode: "planetscale", casing: "snake_case" });
  // Every top-level transaction is retried as a whole when InnoDB gives it up for a deadlock or a
  // lock-wait timeout (decision 010). A transaction's own `tx.transaction()` is a savepoint and is
  // not wrapped: only the outermost level can start over.
  const transaction = db.transaction.bind(db);
  db.transaction = ((work, config) => withWriteRetry(() => transaction(work, config), options.writeRetry)) as typeof db.transaction;
  return { db, pool };
}

export type Db = ReturnType<typeof createDb>["db"];
export type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];
/** A service may run on the pool or inside a caller's transaction. */
export type DbOrTx = Db | Tx;
