// Test harness for API tests: a throw-away MariaDB database per test file (migrated and seeded
// with the demo studio), the real app through supertest, and an in-process SMTP catcher.
import { randomBytes } from "node:crypto";
import { mkdtemp, rm } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import mysql from "mysql2/promise";
import request from "supertest";
import { createDb } from "@takeup/db";
import { migrateDatabase } from "@takeup/db/migrate";
import { demoPassword, seedDemo } from "@takeup/db/seed";
import { startMailCatcher, type CaughtMessage } from "@takeup/mail-catcher";
import { createApp } from "../app.ts";
import type { AppConfig } from "../config.ts";
import { createMailer } from "../lib/mailer.ts";
import type { ThrottlePolicy } from "../lib/sign-in-throttle.ts";

export const appUrl = "http://localhost:3100";
export { demoPassword };

function serverUrl(): URL {
  const url = process.env.TEST_DATABASE_URL;
  if (!url) throw new Error("TEST_DATABASE_URL is not set: run the tests with `npm test`");
  return new URL(url);
}

export async function createTestApp(options: { throttlePolicy?: Partial<ThrottlePolicy>; seed?: boolean } = {}) {
  const base = serverUrl();
  const name = `takeup_test_${randomBytes(5).toString("hex")}`;
  const admin = await mysql.createConnection({ uri: base.toString(), multipleStatements: false });
  await admin.query(`CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
  await admin.end();
  const url = new URL(base);
  url.pathname = `/${name}`;
  await migrateDatabase(url.toString());
  const { db, pool } = createDb(url.toString(), { connectionLimit: 60 });
  const uploadsDir = await mkdtemp(path.join(os.tmpdir(), "takeup-uploads-"));
  if (options.seed !== false) await seedDemo(db, { uploadsDir });

  const catcher = await startMailCatcher({ smtpPort: 0, httpPort: 0 });
  const config: AppConfig = {
    appUrl,
    authSecret: "test-secret-test-secret-test-secret-0123",
    smtpUrl: `smtp://127.0.0.1:${catcher.smtpPort}`,
    mailFrom: "studio@takeup.test",
    mailCatcherUrl: `http://127.0.0.1:${catcher.httpPort}`,
    trustProxy: false,
    uploadsDir,
  };
  const mailer = createMailer(db, config.smtpUrl, config.mailFrom, async () => "Wrenfield Sound");
  const app = createApp({ db, config, mailer, throttlePolicy: options.throttlePolicy });

  /** A cookie-keeping client that behaves like our own web page (same Origin). */
  const client = () => request.agent(app).set("Origin", appUrl);

  async function signIn(email: string, password = demoPassword) {
    const agent = client();
    const response = await agent.post("/api/session").send({ email, password });
    if (response.status !== 200) throw new Error(`sign-in as ${email} failed: ${response.status} ${JSON.stringify(response.body)}`);
    return agent;
  }

  function mailTo(address: string): CaughtMessage[] {
    return catcher.messages.filter((m) => m.to.includes(address.toLowerCase()));
  }

  async function close() {
    mailer.close();
    await catcher.close();
    await pool.query(`DROP DATABASE \`${name}\``);
    await pool.end();
    await rm(config.uploadsDir!, { recursive: true, force: true });
  }

  return { app, db, pool, config, mailer, catcher, client, signIn, mailTo, close, databaseName: name };
}

export type TestApp = Awaited<ReturnType<typeof createTestApp>>;

/** The first link in an e-mail's text that starts with the given path. */
export function linkIn(message: CaughtMessage, pathPrefix: string): string {
  const match = message.text.match(new RegExp(`${appUrl.replace(/[.:/]/g, "\\$&")}${pathPrefix}[^\\s]+`));
  if (!match) throw new Error(`no ${pathPrefix} link in: ${message.text}`);
  return match[0];
}
