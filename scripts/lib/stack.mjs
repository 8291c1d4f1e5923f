// Brings up the pieces both `npm start` and `npm test` need: database, schema, fakes, API.
import { existsSync, mkdirSync, readFileSync, writeFileSync } from "node:fs";
import { randomBytes } from "node:crypto";
import { httpOk, log, root, run, startChild, StartupFailure, waitFor } from "./proc.mjs";
import { startMariaDb } from "./mariadb.mjs";

export const tsx = `${root}/node_modules/.bin/tsx`;

/** A secret kept under .data so sessions survive a restart of `npm start`. */
export function persistentSecret(name) {
  mkdirSync(`${root}/.data`, { recursive: true });
  const file = `${root}/.data/${name}`;
  if (!existsSync(file)) writeFileSync(file, randomBytes(32).toString("base64url"), { mode: 0o600 });
  return readFileSync(file, "utf8").trim();
}

export async function startDatabase({ dir, port, database }) {
  if (process.env.DATABASE_URL) {
    log("using the MariaDB at DATABASE_URL (no private server started)");
    return { url: process.env.DATABASE_URL, stop: async () => {}, external: true };
  }
  const server = await startMariaDb({ dir, port, database });
  log(`MariaDB is up on 127.0.0.1:${port} (data in ${dir})`);
  return server;
}

export function dbTask(url, ...args) {
  run(tsx, ["packages/db/src/cli.ts", ...args], { env: { ...process.env, DATABASE_URL: url } });
}

export function buildWeb() {
  log("building the web app …");
  run(`${root}/node_modules/.bin/vite`, ["build", "--logLevel", "warn"]);
}

export async function startMailCatcher({ smtpPort, httpPort }) {
  startChild("mail", tsx, ["apps/mail-catcher/src/server.ts"], {
    env: { ...process.env, SMTP_PORT: String(smtpPort), HTTP_PORT: String(httpPort) },
  });
  await waitFor("the mail catcher", () => httpOk(`http://127.0.0.1:${httpPort}/health`));
}

export async function startApi({ port, env, quiet = false, watch = false }) {
  const child = startChild("api", tsx, [...(watch ? ["watch"] : []), "apps/api/src/server.ts"], {
    env: { ...process.env, NODE_ENV: "production", PORT: String(port), ...env },
    quiet,
  });
  let exited = false;
  child.once("exit", () => (exited = true));
  await waitFor("the API", () => {
    if (exited) throw new StartupFailure(`the API exited during start-up; its last lines:\n${child.lastLines.join("\n")}`);
    return httpOk(`http://127.0.0.1:${port}/api/health`);
  }, 60000);
  return child;
}
