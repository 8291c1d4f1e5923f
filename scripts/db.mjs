// db:migrate, db:seed, db:reset against the private development MariaDB (or DATABASE_URL).
import { ensureNodeModules, root } from "./lib/proc.mjs";
import { dbTask, startDatabase } from "./lib/stack.mjs";

const task = process.argv[2];
ensureNodeModules();
const database = await startDatabase({
  dir: `${root}/.data/mariadb`,
  port: Number(process.env.TAKEUP_DB_PORT ?? 3307),
  database: "takeup",
});
try {
  if (task === "seed") dbTask(database.url, "seed", "--if-empty");
  else dbTask(database.url, task);
} finally {
  await database.stop();
}
