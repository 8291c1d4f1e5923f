// The payroll benchmark: the rules engine over a 100 k-entry fortnight, and the XLSX export of
// that fortnight from the database, each timed with its peak memory in a fresh process.
// `npm run bench` runs it; so does
// `npx tsx bench/payroll/run.ts [--entries=100000] [--per-person=100] [--runs=3] [--no-profile] [--no-doc]`.
import { mkdirSync, mkdtempSync, rmSync } from "node:fs";
import { createServer } from "node:net";
import os from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";
import type { RowDataPacket } from "mysql2/promise";
import { createDb } from "@takeup/db";
import { migrateDatabase } from "@takeup/db/migrate";
import { seedDemo } from "@takeup/db/seed";
import { checkSameTotals } from "./checks.ts";
import { runCase, stopRunningCases } from "./child.ts";
import { loadFortnight } from "./load.ts";
import { profileStep } from "./profile.ts";
import { renderMarkdown, writeSection } from "./report.ts";
import type { EngineResult, EngineRun, ExportResult, PayrollRun } from "./results.ts";
import { engineRuleSets, exportRules, period, settingsFor } from "./scenario.ts";
import { generateFortnight } from "./shifts.ts";

const root = fileURLToPath(new URL("../..", import.meta.url));
/** Clear of the dev database (3307), the test databases (3308, 3310) and the bookings bench (3309). */
const port = 3320;

type MariaDb = { url: string; stop(): Promise<void> };
type MariaDbHelper = { startMariaDb(options: { dir: string; port: number; database: string }): Promise<MariaDb> };

// npm run bench passes the same options to every benchmark, so options meant for another are ignored.
function option(name: string): string | undefined {
  const prefix = `--${name}=`;
  return process.argv.find((a) => a.startsWith(prefix))?.slice(prefix.length);
}
const shape = { entries: Number((option("entries") ?? "100000").replaceAll("_", "")), perPerson: Number(option("per-person") ?? 100) };
const runs = Number(option("runs") ?? 3);
const profiling = !process.argv.includes("--no-profile");
const writeTheDoc = !process.argv.includes("--no-doc");
if (!(shape.entries > 0) || !Number.isInteger(shape.entries / shape.perPerson) || !(runs >= 1)) {
  throw new Error("usage: run.ts [--entries=100000] [--per-person=100 (must divide entries)] [--runs=3] [--no-profile] [--no-doc]");
}

const say = (message: string) => process.stdout.write(`[bench:payroll] ${message}\n`);

function portIsFree(p: number): Promise<boolean> {
  return new Promise((resolve) => {
    const probe = createServer()
      .once("error", () => resolve(false))
      .once("listening", () => probe.close(() => resolve(true)))
      .listen(p, "127.0.0.1");
  });
}

// bench.mjs hands us a temp dir (and removes it whatever happens); run alone, we make our own.
const dir = process.env.TAKEUP_BENCH_DIR ?? mkdtempSync(path.join(os.tmpdir(), "takeup-bench-"));
let mariadb: MariaDb | null = null;
let cleaned = false;

async function cleanUp() {
  if (cleaned) return;
  cleaned = true;
  stopRunningCases();
  await mariadb?.stop().catch((error: unknown) => say(`could not stop MariaDB: ${String(error)}`));
  rmSync(dir, { recursive: true, force: true });
}

for (const signal of ["SIGINT", "SIGTERM"] as const) {
  process.once(signal, () => {
    say(`${signal}: stopping`);
    void cleanUp().finally(() => process.exit(130));
  });
}

const seconds = (s: number) => `${s.toFixed(2)} s`;
const mib = (m: number) => `${Math.round(m)} MiB`;

async function main() {
  const started = performance.now();
  if (!(await portIsFree(port))) throw new Error(`port ${port} is taken; the bench needs it for its private MariaDB`);
  const helperUrl = new URL("../../scripts/lib/mariadb.mjs", import.meta.url).href;
  const { startMariaDb } = (await import(helperUrl)) as MariaDbHelper;
  say(`starting a private MariaDB on port ${port} in ${dir}`);
  mariadb = await startMariaDb({ dir, port, database: "takeup_bench" });
  await migrateDatabase(mariadb.url);
  const { db, pool } = createDb(mariadb.url);
  let loaded;
  let serverVersion: string;
  try {
    await seedDemo(db);
    const data = generateFortnight(period, settingsFor(exportRules), shape);
    say(`loading ${data.entries.length.toLocaleString("en-US")} entries of ${data.staff.length} staff …`);
    loaded = await loadFortnight(db, pool, data, exportRules);
    say(`loaded in ${seconds(loaded.seconds)} (${loaded.breaks} breaks)`);
    const [[server]] = await pool.query<RowDataPacket[]>("SELECT VERSION() AS version");
    serverVersion = String(server!.version);
  } finally {
    await pool.end();
  }
  const env = { TAKEUP_BENCH_DATABASE_URL: mariadb.url };
  const engineArgs = (rules: string) => [rules, String(shape.entries), String(shape.perPerson)];
  const loadAverages: number[] = [];

  const engine: EngineRun[] = [];
  const exports: ExportResult[] = [];
  // Rounds rather than case after case, so a busy spell on the shared host spreads across cases.
  for (let round = 1; round <= runs; round++) {
    for (const rules of engineRuleSets) {
      const { result } = await runCase<EngineResult>("engine-case.ts", engineArgs(rules), env);
      engine.push({ rules, round, result });
      say(`round ${round}: engine, ${rules}: ${seconds(result.step.seconds)}, peak RSS ${mib(result.step.peakRssMiB)}, heap ${mib(result.step.peakHeapMiB)}`);
    }
    const { result } = await runCase<ExportResult>("export-case.ts", [String(loaded.periodId)], env);
    exports.push(result);
    say(`round ${round}: export: compute ${seconds(result.compute.seconds)} + write ${seconds(result.write.seconds)}, peak RSS ${mib(result.write.peakRssMiB)}, ${result.listedEntries} entries listed, ${result.bytes} bytes`);
    loadAverages.push(os.loadavg()[0]!);
  }

  say("writing the workbook to a file and reading it back …");
  const verified = (await runCase<ExportResult>("export-case.ts", [String(loaded.periodId), path.join(dir, "payroll-export.xlsx")], env)).result;

  // The engine is deterministic, and the database round trip must not change a minute or a cent.
  const reference = engine.find((e) => e.rules === exportRules)!.result.totals;
  for (const e of engine.filter((e) => e.rules === exportRules)) checkSameTotals(e.result.totals, reference, `engine round ${e.round} against round 1`);
  for (const [i, e] of [...exports, verified].entries()) checkSameTotals(e.totals, reference, `export ${i < runs ? `round ${i + 1}` : "read back"} against the engine`);

  let profiles: PayrollRun["profiles"] = null;
  if (profiling) {
    say("one more engine and export run each under the CPU profiler …");
    const engineDir = path.join(dir, "profile-engine");
    const exportDir = path.join(dir, "profile-export");
    mkdirSync(engineDir);
    mkdirSync(exportDir);
    const engineProfiled = await runCase<EngineResult>("engine-case.ts", engineArgs(exportRules), env, engineDir);
    const exportProfiled = await runCase<ExportResult>("export-case.ts", [String(loaded.periodId)], env, exportDir);
    profiles = {
      engine: profileStep(engineProfiled.profile!, engineProfiled.result.step.windowMicros),
      compute: profileStep(exportProfiled.profile!, exportProfiled.result.compute.windowMicros),
      write: profileStep(exportProfiled.profile!, exportProfiled.result.write.windowMicros),
    };
  }

  const cpus = os.cpus();
  const run: PayrollRun = {
    date: new Date().toISOString().replace(/\.\d+Z$/, "Z"),
    machine: {
      cpus: `${cpus.length} × ${cpus[0]?.model.trim() ?? "unknown"}`,
      memory: `${(os.totalmem() / 2 ** 30).toFixed(1)} GiB`,
      os: `${os.type()} ${os.release()} (${os.arch()})`,
      node: process.version,
      mariadb: serverVersion,
      loadAverages,
    },
    shape,
    runs,
    loaded,
    engine,
    exports,
    verified,
    profiles,
    totalSeconds: (performance.now() - started) / 1000,
  };
  const markdown = renderMarkdown(run);
  process.stdout.write(`\n${markdown}\n\n`);
  if (writeTheDoc) {
    writeSection(path.join(root, "docs/benchmarks.md"), markdown);
    say("wrote docs/benchmarks.md");
  }
}

try {
  await main();
} catch (error) {
  process.exitCode = 1;
  say(`failed: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}`);
} finally {
  await cleanUp();
}
