import { fileURLToPath } from "node:url";
import path from "node:path";
import { migrate } from "drizzle-orm/mysql2/migrator";
import { createDb } from "./client.ts";

export const migrationsFolder = path.join(path.dirname(fileURLToPath(import.meta.url)), "migrations");

export async function migrateDatabase(databaseUrl: string): Promise<void> {
  const { db, pool } = createDb(databaseUrl, { connectionLimit: 1 });
  try {
    await migrate(db, { migrationsFolder });
  } finally {
    await pool.end();
  }
}
