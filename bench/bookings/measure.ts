// Latency of the two hot booking reads, through the real service code:
//   conflict check  — bookingTx (READ COMMITTED) → lockResources → findConflicts, as a booking write does
//   calendar week   — listBookings for one room and 7 days (GET /api/bookings), and its raw SQL
import type { Pool, RowDataPacket } from "mysql2/promise";
import { drizzle } from "drizzle-orm/mysql2";
import { schema, type Db } from "@takeup/db";
import type { Actor } from "../../apps/api/src/lib/actor.ts";
import { bookingTx, listBookings } from "../../apps/api/src/routes/bookings/bookings.service.ts";
import { findConflicts, lockResources } from "../../apps/api/src/routes/bookings/occupancy.ts";
import { studioZone } from "./fixtures.ts";
import { calendarWeekRows } from "./calendar-sql.ts";
import type { LoadedSpan } from "./load.ts";
import { createRandom, type Random } from "./random.ts";

const minute = 60_000;
const hour = 60 * minute;
const day = 24 * hour;

export type Latency = { p50: number; p95: number; n: number; meanRows: number; pageReadsPerCall: number };
/** A global MariaDB status counter: buffer-pool misses (pages read from disk), or statements received. */
export type PageReadCounter = () => Promise<number>;

/** Nearest-rank percentile of an ascending list. */
function percentile(sorted: number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1))]!;
}

function summarise(times: number[], rows: number, pageReads: number): Latency {
  const sorted = [...times].sort((a, b) => a - b);
  return { p50: percentile(sorted, 50), p95: percentile(sorted, 95), n: times.length, meanRows: rows / times.length, pageReadsPerCall: pageReads / times.length };
}

/** Runs `warmUp` untimed rounds, then `iterations` timed ones; each round reports its own timings. */
async function repeat(warmUp: number, iterations: number, round: (timed: boolean) => Promise<void>) {
  for (let i = 0; i < warmUp; i++) await round(false);
  for (let i = 0; i < iterations; i++) await round(true);
}

export type Window = { roomId: number; engineerId: string; turnoverMinutes: number; startsAt: Date; endsAt: Date };

/** A 3–10 h session somewhere inside a room's data, on the half hour, with the room's first engineer. */
export function randomWindow(spans: LoadedSpan[], random: Random): Window {
  const span = spans[random.int(spans.length)]!;
  const slots = Math.floor((span.to - span.from - 10 * hour) / (30 * minute));
  const startsAt = span.from + random.int(slots) * 30 * minute;
  return { roomId: span.roomId, engineerId: span.engineerIds[0], turnoverMinutes: span.turnoverMinutes, startsAt: new Date(startsAt), endsAt: new Date(startsAt + (3 + random.int(8)) * hour) };
}

/** A studio week (Chicago midnight to midnight, standard time) inside a room's data. */
export function randomWeek(spans: LoadedSpan[], random: Random) {
  const span = spans[random.int(spans.length)]!;
  const firstMidnight = Math.ceil((span.from - 6 * hour) / day) * day + 6 * hour;
  const days = Math.floor((span.to - firstMidnight) / day) - 7;
  const from = firstMidnight + random.int(Math.max(1, days)) * day;
  return { roomId: span.roomId, from: new Date(from), to: new Date(from + 7 * day) };
}

const conflictInput = (w: Window, now: Date) => ({
  roomId: w.roomId,
  engineerIds: [w.engineerId],
  equipmentIds: [],
  startsAt: w.startsAt,
  endsAt: w.endsAt,
  turnoverMinutes: w.turnoverMinutes,
  timeZone: studioZone,
  now,
});

export async function measureConflictCheck(db: Db, spans: LoadedSpan[], random: Random, warmUp: number, iterations: number, pageReads: PageReadCounter, statements: PageReadCounter) {
  const whole: number[] = [];
  const query: number[] = [];
  let rows = 0;
  const before = { taken: false, reads: 0, statements: 0 };
  await repeat(warmUp, iterations, async (timed) => {
    if (timed && !before.taken) Object.assign(before, { taken: true, reads: await pageReads(), statements: await statements() });
    const w = randomWindow(spans, random);
    const started = performance.now();
    let checked = 0;
    const found = await bookingTx(db, async (tx) => {
      await lockResources(tx, { roomId: w.roomId, engineerIds: [w.engineerId], equipmentIds: [] });
      const checkStarted = performance.now();
      const conflicts = await findConflicts(tx, conflictInput(w, new Date()));
      checked = performance.now() - checkStarted;
      return conflicts.length;
    });
    if (!timed) return;
    whole.push(performance.now() - started);
    query.push(checked);
    rows += found;
  });
  const reads = (await pageReads()) - before.reads;
  // Less the two status queries sent after the first count.
  const sent = (await statements()) - before.statements - 2;
  return { transaction: summarise(whole, rows, reads), findConflicts: summarise(query, rows, reads), statementsPerCheck: sent / iterations };
}

export async function measureCalendarWeek(db: Db, pool: Pool, actor: Actor, spans: LoadedSpan[], seed: number, warmUp: number, iterations: number, pageReads: PageReadCounter) {
  const service: number[] = [];
  const raw: number[] = [];
  let serviceRows = 0;
  let rawRows = 0;
  let serviceReads = 0;
  let rawReads = 0;
  // Alternating calls, but each side on its own random weeks: on the same week the second call
  // would find the pages the first had just read into the buffer pool.
  const serviceWeeks = createRandom(seed);
  const rawWeeks = createRandom(seed + 1);
  await repeat(warmUp, iterations, async (timed) => {
    const a = randomWeek(spans, serviceWeeks);
    const readsBefore = timed ? await pageReads() : 0;
    let started = performance.now();
    const list = await listBookings(db, actor, { from: a.from.toISOString(), to: a.to.toISOString(), roomId: a.roomId });
    const serviceTime = performance.now() - started;
    const readsBetween = timed ? await pageReads() : 0;
    const b = randomWeek(spans, rawWeeks);
    started = performance.now();
    const rows = await calendarWeekRows(pool, b.roomId, b.from, b.to);
    const rawTime = performance.now() - started;
    if (!timed) return;
    // SHOW STATUS reads no InnoDB pages, so each delta is the call's own.
    serviceReads += readsBetween - readsBefore;
    rawReads += (await pageReads()) - readsBetween;
    service.push(serviceTime);
    raw.push(rawTime);
    serviceRows += list.length;
    rawRows += rows.bookings.length;
  });
  return { service: summarise(service, serviceRows, serviceReads), raw: summarise(raw, rawRows, rawReads) };
}

/** The raw SQL must answer exactly what listBookings answers, or its share means nothing. */
export async function checkCalendarSqlAgrees(db: Db, pool: Pool, actor: Actor, spans: LoadedSpan[], random: Random, weeks: number) {
  for (let i = 0; i < weeks; i++) {
    const w = randomWeek(spans, random);
    const list = await listBookings(db, actor, { from: w.from.toISOString(), to: w.to.toISOString(), roomId: w.roomId });
    const rows = await calendarWeekRows(pool, w.roomId, w.from, w.to);
    const fromService = list.map((b) => b.id).join(",");
    const fromSql = rows.bookings.map((r) => Number(r.id)).join(",");
    if (fromService !== fromSql) throw new Error(`raw SQL and listBookings disagree on room ${w.roomId}, week of ${w.from.toISOString()}`);
  }
}

export type PlanRow = Record<string, string | number | null>;
/** A key the optimiser chose for a table, with its columns in order. */
export type ChosenKey = { table: string; key: string | null; columns: string[] };
export type Plan = { title: string; sql: string; rows: PlanRow[]; keys: ChosenKey[] };

/**
 * The plans of the statements the real code sends: a drizzle instance on the same pool with a
 * logger records them, then MariaDB's ANALYZE runs each one and reports estimated and actual rows.
 */
export async function explainBookingReads(pool: Pool, spans: LoadedSpan[], random: Random, actor: Actor): Promise<Plan[]> {
  const captured: { sql: string; params: unknown[] }[] = [];
  const logged: Db = drizzle({ client: pool, schema, mode: "planetscale", casing: "snake_case", logger: { logQuery: (sql, params) => captured.push({ sql, params }) } });
  const w = randomWindow(spans, random);
  await bookingTx(logged, async (tx) => {
    await lockResources(tx, { roomId: w.roomId, engineerIds: [w.engineerId], equipmentIds: [] });
    await findConflicts(tx, conflictInput(w, new Date()));
  });
  const week = randomWeek(spans, random);
  await listBookings(logged, actor, { from: week.from.toISOString(), to: week.to.toISOString(), roomId: week.roomId });

  const pick = (title: string, test: (sql: string) => boolean) => {
    const found = captured.find((q) => test(q.sql));
    if (!found) throw new Error(`no captured statement for ${title}`);
    return { title, ...found };
  };
  const statements = [
    pick("Conflict check, room", (s) => s.startsWith("select") && s.includes("from `bookings` inner join `rooms`") && !s.includes("order by")),
    pick("Conflict check, engineers", (s) => s.startsWith("select") && s.includes("from `booking_engineers` inner join `bookings`")),
    pick("Calendar week (listBookings)", (s) => s.startsWith("select") && s.includes("from `bookings` inner join `rooms`") && s.includes("order by")),
  ];
  // The schema changes under us (indexes get added), so the doc names each key's columns as found.
  const [indexes] = await pool.query<RowDataPacket[]>(
    "SELECT table_name AS t, index_name AS i, GROUP_CONCAT(column_name ORDER BY seq_in_index) AS c FROM information_schema.statistics WHERE table_schema = DATABASE() GROUP BY table_name, index_name",
  );
  const columnsOf = new Map(indexes.map((r) => [`${r.t}.${r.i}`, String(r.c).split(",")]));
  const plans: Plan[] = [];
  for (const s of statements) {
    const [rows] = await pool.query<RowDataPacket[]>(`ANALYZE ${s.sql}`, s.params);
    const keys = rows.map((r) => ({ table: String(r.table), key: r.key ? String(r.key) : null, columns: r.key ? (columnsOf.get(`${r.table}.${r.key}`) ?? []) : [] }));
    plans.push({ title: s.title, sql: pool.format(s.sql, s.params), rows: rows.map((r) => ({ ...r }) as PlanRow), keys });
  }
  return plans;
}
