// `npm start`: everything from a fresh clone to a running Takeup on http://localhost:3000.
// `npm run dev` is the same with hot reload: Vite's dev server in front, `tsx watch` for the API.
import { ensureNodeModules, log, root, stopChildren, fail, startChild } from "./lib/proc.mjs";
import { buildWeb, dbTask, persistentSecret, startApi, startDatabase, startMailCatcher } from "./lib/stack.mjs";

const dev = process.argv.includes("--dev");

const port = Number(process.env.PORT ?? 3000);
const dbPort = Number(process.env.TAKEUP_DB_PORT ?? 3307);
const smtpPort = Number(process.env.TAKEUP_SMTP_PORT ?? 1025);
const mailHttpPort = Number(process.env.TAKEUP_MAIL_HTTP_PORT ?? 1080);
const appUrl = process.env.APP_URL ?? (dev ? "http://localhost:5173" : `http://localhost:${port}`);

ensureNodeModules();
const database = await startDatabase({ dir: `${root}/.data/mariadb`, port: dbPort, database: "takeup" });

let stopping = false;
async function shutdown(code = 0) {
  if (stopping) return;
  stopping = true;
  log("stopping …");
  await stopChildren();
  await database.stop();
  log("stopped.");
  process.exit(code);
}
process.on("SIGINT", () => void shutdown(0));
process.on("SIGTERM", () => void shutdown(0));

try {
  dbTask(database.url, "migrate");
  dbTask(database.url, "seed", "--if-empty");
  if (!dev) buildWeb();
  const mailEnv = process.env.SMTP_URL
    ? { SMTP_URL: process.env.SMTP_URL }
    : { SMTP_URL: `smtp://127.0.0.1:${smtpPort}`, MAIL_CATCHER_URL: `http://127.0.0.1:${mailHttpPort}` };
  if (!process.env.SMTP_URL) await startMailCatcher({ smtpPort, httpPort: mailHttpPort });
  const api = await startApi({
    port,
    watch: dev,
    env: {
      ...(dev ? { WEB_DIST: "", NODE_ENV: "development" } : {}),
      DATABASE_URL: database.url,
      APP_URL: appUrl,
      AUTH_SECRET: process.env.AUTH_SECRET ?? persistentSecret("auth-secret"),
      ...mailEnv,
    },
  });
  api.once("exit", (code) => {
    if (!stopping) {
      log(`the API exited (${code}); shutting down`);
      void shutdown(1);
    }
  });
  if (dev) startChild("web", `${root}/node_modules/.bin/vite`, ["--port", "5173", "--strictPort"], { env: { ...process.env, API_PORT: String(port) } });
  const { demoPassword, demoSignIns } = await import("./lib/demo-sign-ins.mjs");
  log("");
  log(`Takeup is running at ${appUrl}`);
  log(`Demo sign-ins (password for all: ${demoPassword}):`);
  for (const [email, who] of demoSignIns) log(`  ${email.padEnd(26)} ${who}`);
  if (mailEnv.MAIL_CATCHER_URL) log(`Caught e-mail: sign in as the owner and open ${appUrl}/dev/mail`);
  log("Press Ctrl-C to stop.");
} catch (error) {
  process.stderr.write(`${error instanceof Error ? error.message : error}\n`);
  await stopChildren();
  await database.stop();
  fail("start-up failed");
}
