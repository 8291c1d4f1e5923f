// Database tasks for the scripts: migrate, seed [--if-empty], reset.
import path from "node:path";
import { fileURLToPath } from "node:url";
import { createDb } from "./client.ts";
import { migrateDatabase } from "./migrate.ts";
import { isSeeded, seedDemo } from "./seed/demo.ts";

const url = process.env.DATABASE_URL;
if (!url) throw new Error("DATABASE_URL is not set");
const [task, flag] = process.argv.slice(2);

async function seed(ifEmpty: boolean) {
  const { db, pool } = createDb(url!, { connectionLimit: 2 });
  try {
    if (await isSeeded(db)) {
      if (ifEmpty) return console.log("[db] demo data already present: nothing seeded");
      throw new Error("the database already holds a studio; use db:reset to start over");
    }
    // The same place the API keeps uploads (UPLOADS_DIR, or .data/uploads at the repository root).
    const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../../..");
    await seedDemo(db, { uploadsDir: process.env.UPLOADS_DIR ? path.resolve(process.env.UPLOADS_DIR) : path.join(repoRoot, ".data/uploads") });
    console.log("[db] seeded the demo studio (Wrenfield Sound)");
  } finally {
    await pool.end();
  }
}

async function reset() {
  const { pool } = createDb(url!, { connectionLimit: 1 });
  const [rows] = await pool.query("SELECT DATABASE() AS name");
  const name = (rows as { name: string }[])[0]!.name;
  await pool.query(`DROP DATABASE \`${name}\``);
  await pool.query(`CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
  await pool.end();
}

if (task === "migrate") {
  await migrateDatabase(url);
  console.log("[db] migrations applied");
} else if (task === "seed") {
  await seed(flag === "--if-empty");
} else if (task === "reset") {
  await reset();
  await migrateDatabase(url);
  await seed(false);
} else {
  throw new Error(`unknown task ${task}; use migrate, seed or reset`);
}
