// The bookings benchmark: conflict-check and calendar-week latency, and API throughput against a
// bare baseline, at 10 k, 100 k and 1 M bookings in one growing database. `npm run bench` runs it;
// so does `npx tsx bench/bookings/run.ts [--sizes=10000,100000] [--iterations=500] [--seconds=10] [--no-doc]`.
import { spawnSync } from "node:child_process";
import os from "node:os";
import path from "node:path";
import type { RowDataPacket } from "mysql2/promise";
import { createDb } from "@takeup/db";
import { migrateDatabase } from "@takeup/db/migrate";
import { seedDemo } from "@takeup/db/seed";
import { loadActor } from "../../apps/api/src/lib/actor.ts";
import { benchFlag, benchOption as option, hostMachine, runBenchmark, sayAs, writeDocSection, type BenchContext } from "../lib/bench-run.ts";
import { createBenchFixtures } from "./fixtures.ts";
import { BookingLoader } from "./load.ts";
import { checkCalendarSqlAgrees, explainBookingReads, measureCalendarWeek, measureConflictCheck } from "./measure.ts";
import { createRandom } from "./random.ts";
import { renderMarkdown, type RunInfo, type SizeResult } from "./report.ts";
import { measureThroughput, profileApi, stopAllTargets } from "./throughput.ts";

const port = 3309;

const sizes = (option("sizes") ?? "10000,100000,1000000").split(",").map((s) => Number(s.replaceAll("_", "")));
const iterations = Number(option("iterations") ?? 1000);
const warmUp = Math.max(50, Math.round(iterations / 10));
const throughputOptions = { seconds: Number(option("seconds") ?? 10), connections: 10, weeks: 64 };
const writeTheDoc = !benchFlag("no-doc");
/** For trying a production-sized buffer pool; the recorded run uses the private server as it starts. */
const bufferPoolMb = option("buffer-pool-mb") === undefined ? null : Number(option("buffer-pool-mb"));
if (sizes.some((s) => !Number.isInteger(s) || s <= 0) || !(iterations >= 1) || !(throughputOptions.seconds >= 1) || (bufferPoolMb !== null && !(bufferPoolMb >= 128))) {
  throw new Error("usage: run.ts [--sizes=10000,100000,1000000] [--iterations=1000] [--seconds=10] [--buffer-pool-mb=2048] [--no-doc]");
}

const say = sayAs("bench");

/** Only root (over the server's socket) may resize the pool; InnoDB then resizes in the background. */
async function resizeBufferPool(dir: string, mb: number) {
  const asRoot = (statement: string) => {
    const result = spawnSync("mariadb", ["--no-defaults", `--socket=${dir}/mysqld.sock`, "-uroot", "-N", "-e", statement], { encoding: "utf8" });
    if (result.status !== 0) throw new Error(`mariadb: ${result.stderr}`);
    return result.stdout.trim();
  };
  const bytes = mb * 2 ** 20;
  asRoot(`SET GLOBAL innodb_buffer_pool_size = ${bytes}`);
  const resizeStatus = () => asRoot("SHOW STATUS LIKE 'Innodb_buffer_pool_resize_status'").split("\t")[1] ?? "";
  for (let waited = 0; waited < 60_000; waited += 250) {
    const state = resizeStatus();
    if (/completed/i.test(state) || (state === "" && Number(asRoot("SELECT @@innodb_buffer_pool_size")) === bytes)) break;
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  say(`buffer pool now ${Number(asRoot("SELECT @@innodb_buffer_pool_size")) / 2 ** 20} MiB (${resizeStatus() || "no resize status"})`);
}

async function main({ dir, startServer, onCleanUp }: BenchContext) {
  const started = performance.now();
  onCleanUp(() => stopAllTargets());
  const mariadb = await startServer();
  if (bufferPoolMb !== null) await resizeBufferPool(dir, bufferPoolMb);
  await migrateDatabase(mariadb.url);
  const { db, pool } = createDb(mariadb.url, { connectionLimit: 10 });
  onCleanUp(() => pool.end());
  await seedDemo(db);
  const fixtures = await createBenchFixtures(db);
  const actor = await loadActor(db, fixtures.managerId);
  if (!actor) throw new Error("the demo manager has no actor");

  const [[server]] = await pool.query<RowDataPacket[]>(
    "SELECT VERSION() AS version, @@innodb_buffer_pool_size AS pool, @@innodb_flush_log_at_trx_commit AS flush, @@innodb_flush_method AS method",
  );
  const machine = {
    ...hostMachine(),
    mariadb: String(server!.version),
    server: `${bufferPoolMb === null ? "as scripts/lib/mariadb.mjs starts it" : "as scripts/lib/mariadb.mjs starts it, then resized by --buffer-pool-mb"}: innodb_buffer_pool_size ${Number(server!.pool) / 2 ** 20} MiB, innodb_flush_log_at_trx_commit ${server!.flush}, innodb_flush_method ${server!.method}`,
  };
  say(`${machine.cpus}, ${machine.memory}, Node ${machine.node}, MariaDB ${machine.mariadb}`);

  const status = async (name: string) => {
    const [[row]] = await pool.query<RowDataPacket[]>("SHOW GLOBAL STATUS LIKE ?", [name]);
    return Number(row!.Value);
  };
  const pageReads = () => status("Innodb_buffer_pool_reads");

  const loader = new BookingLoader(pool, fixtures);
  await loader.init();
  const results: SizeResult[] = [];
  let plans: RunInfo["plans"] = null;
  let profile: RunInfo["profile"] = null;
  for (const size of sizes) {
    if (size < loader.total) throw new Error(`sizes must grow: ${size} is below the ${loader.total} bookings already loaded`);
    say(`loading bookings up to ${size.toLocaleString("en-US")} …`);
    const loadStarted = performance.now();
    const from = loader.total;
    const step = Math.max(10_000, Math.round((size - from) / 10 / 10_000) * 10_000);
    let nextReport = from + step;
    await loader.growTo(size, (loaded, target) => {
      if (loaded < nextReport && loaded < target) return;
      const seconds = (performance.now() - loadStarted) / 1000;
      say(`  ${loaded.toLocaleString("en-US")} / ${target.toLocaleString("en-US")} bookings (${Math.round((loaded - from) / seconds).toLocaleString("en-US")} rows/s)`);
      while (nextReport <= loaded) nextReport += step;
    });
    const loadSeconds = (performance.now() - loadStarted) / 1000;
    // Fresh statistics, as InnoDB would have after its own background recalculation.
    await pool.query("ANALYZE TABLE bookings, booking_engineers");
    say(`loaded ${size.toLocaleString("en-US")} bookings in ${loadSeconds.toFixed(1)} s; measuring …`);

    const [[sizeRow]] = await pool.query<RowDataPacket[]>(
      "SELECT data_length AS data, index_length AS idx FROM information_schema.tables WHERE table_schema = DATABASE() AND table_name = 'bookings'",
    );
    const tableMiB = { data: Number(sizeRow!.data) / 2 ** 20, index: Number(sizeRow!.idx) / 2 ** 20 };
    // Other work on this host skews the numbers; the doc records how busy it was.
    const loadAverage = os.loadavg()[0]!;
    const spans = loader.spans();
    const random = createRandom(size);
    const conflict = await measureConflictCheck(db, spans, random, warmUp, iterations, pageReads, () => status("Questions"));
    say(`  conflict check p50 ${conflict.transaction.p50.toFixed(2)} ms, p95 ${conflict.transaction.p95.toFixed(2)} ms (findConflicts p95 ${conflict.findConflicts.p95.toFixed(2)} ms)`);
    await checkCalendarSqlAgrees(db, pool, actor, spans, random, 20);
    const calendar = await measureCalendarWeek(db, pool, actor, spans, size * 7, warmUp, iterations, pageReads);
    say(`  calendar week p50 ${calendar.service.p50.toFixed(2)} ms (raw SQL ${calendar.raw.p50.toFixed(2)} ms), p95 ${calendar.service.p95.toFixed(2)} ms`);
    const throughput = await measureThroughput(mariadb.url, spans, random, throughputOptions, () => status("Questions"));
    say(`  API ${Math.round(throughput.api.reqPerSec)} req/s, bare ${Math.round(throughput.bare.reqPerSec)} req/s (${throughput.ratio.toFixed(2)}×)`);
    results.push({ bookings: size, loadSeconds, tableMiB, loadAverage: [loadAverage, os.loadavg()[0]!], conflict, calendar, throughput });
    if (size === sizes.at(-1)) {
      plans = { bookings: size, plans: await explainBookingReads(pool, spans, random, actor) };
      say("profiling the API process (a separate, shorter run) …");
      profile = { bookings: size, ...(await profileApi(mariadb.url, spans, random, path.join(dir, "api-profile"), { ...throughputOptions, seconds: Math.min(5, throughputOptions.seconds) })) };
    }
  }

  const run: RunInfo = {
    date: new Date().toISOString().replace(/\.\d+Z$/, "Z"),
    machine,
    iterations,
    warmUp,
    throughput: throughputOptions,
    sizes: results,
    plans,
    profile,
    totalSeconds: (performance.now() - started) / 1000,
  };
  const markdown = renderMarkdown(run);
  process.stdout.write(`\n${markdown}\n\n`);
  if (writeTheDoc) {
    writeDocSection("bookings", markdown);
    say("wrote docs/benchmarks.md");
  }
}

await runBenchmark({ port, say }, main);
