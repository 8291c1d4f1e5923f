import { createDb } from "@takeup/db";
import { createApp } from "./app.ts";
import { readConfig } from "./config.ts";
import { createMailer } from "./lib/mailer.ts";
import { logger } from "./lib/logger.ts";
import { loadStudio } from "./routes/studio/studio.service.ts";
import { startScheduler } from "./lib/scheduler.ts";
import { backgroundJobs } from "./jobs.ts";
import { settleAfterResponseWork } from "./lib/after-response.ts";

const { config, databaseUrl, port, host } = readConfig();
const { db, pool } = createDb(databaseUrl, {
  writeRetry: { onRetry: ({ attempt, errno, delayMs }) => logger.warn("transaction retried", { attempt, errno, delayMs }) },
});
const mailer = createMailer(db, config.smtpUrl, config.mailFrom, async () => (await loadStudio(db)).name);
const app = createApp({ db, config, mailer });

const stopScheduler = startScheduler({ db, mailer, appUrl: config.appUrl }, backgroundJobs);
const server = app.listen(port, host, () => logger.info("takeup api listening", { host, port, appUrl: config.appUrl }));

let closing = false;
async function shutdown(signal: string) {
  if (closing) return;
  closing = true;
  logger.info("shutting down", { signal });
  stopScheduler();
  server.close();
  server.closeAllConnections();
  // E-mails owed to requests already answered (password resets) go out before the pool closes.
  await settleAfterResponseWork();
  mailer.close();
  await pool.end();
  process.exit(0);
}
process.on("SIGTERM", () => void shutdown("SIGTERM"));
process.on("SIGINT", () => void shutdown("SIGINT"));
