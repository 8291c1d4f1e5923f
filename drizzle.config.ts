import { defineConfig } from "drizzle-kit";

// Generation only: migrations are applied by the app with drizzle's migrator, never by `push`
// (drizzle-kit misreads MariaDB's information schema).
export default defineConfig({
  dialect: "mysql",
  schema: "./packages/db/src/schema/index.ts",
  out: "./packages/db/src/migrations",
  casing: "snake_case",
});
