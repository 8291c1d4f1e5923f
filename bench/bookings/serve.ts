// One HTTP target for the throughput run, in its own process so autocannon (in run.ts) does
// not share an event loop with the server it measures.
//   api:  the real app from createApp(), GET /api/bookings behind the session cookie
//   bare: Express + mysql2 running the same calendar-week SQL and returning the rows as JSON
import { createServer } from "node:http";
import type { AddressInfo } from "node:net";
import { randomBytes } from "node:crypto";
import express from "express";
import mysql from "mysql2/promise";
import { createDb } from "@takeup/db";
import { createApp } from "../../apps/api/src/app.ts";
import { discardingMailer } from "../../apps/api/src/lib/mailer.ts";
import { calendarWeekRows } from "./calendar-sql.ts";

const target = process.argv[2];
const databaseUrl = process.env.TAKEUP_BENCH_DATABASE_URL;
if ((target !== "api" && target !== "bare") || !databaseUrl) {
  throw new Error("usage: TAKEUP_BENCH_DATABASE_URL=mysql://… tsx bench/bookings/serve.ts api|bare");
}

const server = createServer();
await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
const { port } = server.address() as AddressInfo;
const appUrl = `http://127.0.0.1:${port}`;
let closeDb: () => Promise<void>;

if (target === "api") {
  const { db, pool } = createDb(databaseUrl);
  const app = createApp({
    db,
    config: { appUrl, authSecret: randomBytes(24).toString("hex"), smtpUrl: "smtp://127.0.0.1:9", mailFrom: "studio@takeup.test", trustProxy: false },
    // The calendar sends no mail; a mailer that drops everything keeps SMTP out of the numbers.
    mailer: discardingMailer,
  });
  server.on("request", app);
  closeDb = () => pool.end();
} else {
  // The same pool settings as createDb(), so the two targets differ only in the app around the SQL.
  const pool = mysql.createPool({ uri: databaseUrl, timezone: "Z", connectionLimit: 10, supportBigNumbers: true });
  const app = express();
  app.disable("x-powered-by");
  app.get("/bare/bookings", async (req, res) => {
    const { roomId, from, to } = req.query;
    res.json(await calendarWeekRows(pool, Number(roomId), new Date(String(from)), new Date(String(to))));
  });
  server.on("request", app);
  closeDb = () => pool.end();
}

process.stdout.write(`${JSON.stringify({ ready: true, appUrl })}\n`);

process.on("SIGTERM", () => {
  server.close();
  server.closeAllConnections();
  // autocannon hangs up with requests still in their handlers; let those finish their queries
  // before the pool goes, or they log errors that are only the shutdown's.
  setTimeout(() => void closeDb().finally(() => process.exit(0)), 1000);
});
