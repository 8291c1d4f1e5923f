import mysql from "mysql2/promise";
import { drizzle } from "drizzle-orm/mysql2";
import * as schema from "./schema/index.ts";

export function createDb(databaseUrl: string, options: { connectionLimit?: number } = {}) {
  const pool = mysql.createPool({
    uri: databaseUrl,
    // Instants are UTC end to end: the server runs at +00:00 and mysql2 reads and writes "Z".
    timezone: "Z",
    connectionLimit: options.connectionLimit ?? 10,
    supportBigNumbers: true,
  });
  // "planetscale" mode keeps relational queries free of LATERAL joins, which MariaDB rejects.
  const db = drizzle({ client: pool, schema, mode: "planetscale", casing: "snake_case" });
  return { db, pool };
}

export type Db = ReturnType<typeof createDb>["db"];
export type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];
/** A service may run on the pool or inside a caller's transaction. */
export type DbOrTx = Db | Tx;

export function isDuplicateKeyError(error: unknown): boolean {
  let cause: unknown = error;
  for (let depth = 0; cause && depth < 5; depth++) {
    if (typeof cause === "object" && "code" in cause && cause.code === "ER_DUP_ENTRY") return true;
    cause = typeof cause === "object" && "cause" in cause ? cause.cause : undefined;
  }
  return false;
}
