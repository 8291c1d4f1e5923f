// The payroll benchmark: the rules engine over a 100 k-entry fortnight, and the XLSX export of
// that fortnight from the database, each timed with its peak memory in a fresh process.
// `npm run bench` runs it; so does
// `npx tsx bench/payroll/run.ts [--entries=100000] [--per-person=100] [--runs=3] [--no-profile] [--no-doc]`.
import { mkdirSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import type { RowDataPacket } from "mysql2/promise";
import { createDb } from "@takeup/db";
import { migrateDatabase } from "@takeup/db/migrate";
import { seedDemo } from "@takeup/db/seed";
import { benchFlag, benchOption as option, hostMachine, runBenchmark, sayAs, writeDocSection, type BenchContext } from "../lib/bench-run.ts";
import { checkSameTotals } from "./checks.ts";
import { runCase, stopRunningCases } from "./child.ts";
import { loadFortnight } from "./load.ts";
import { profileStep } from "./profile.ts";
import { renderMarkdown } from "./report.ts";
import type { EngineResult, EngineRun, ExportResult, PayrollRun } from "./results.ts";
import { engineRuleSets, exportRules, period, settingsFor } from "./scenario.ts";
import { generateFortnight } from "./shifts.ts";

/** Clear of the dev database (3307), the test databases (3308, 3310) and the bookings bench (3309). */
const port = 3320;

const shape = { entries: Number((option("entries") ?? "100000").replaceAll("_", "")), perPerson: Number(option("per-person") ?? 100) };
const runs = Number(option("runs") ?? 3);
const profiling = !benchFlag("no-profile");
const writeTheDoc = !benchFlag("no-doc");
if (!(shape.entries > 0) || !Number.isInteger(shape.entries / shape.perPerson) || !(runs >= 1)) {
  throw new Error("usage: run.ts [--entries=100000] [--per-person=100 (must divide entries)] [--runs=3] [--no-profile] [--no-doc]");
}

const say = sayAs("bench:payroll");

const seconds = (s: number) => `${s.toFixed(2)} s`;
const mib = (m: number) => `${Math.round(m)} MiB`;

async function main({ dir, startServer, onCleanUp }: BenchContext) {
  const started = performance.now();
  onCleanUp(stopRunningCases);
  const mariadb = await startServer();
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

  const run: PayrollRun = {
    date: new Date().toISOString().replace(/\.\d+Z$/, "Z"),
    machine: {
      ...hostMachine(),
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
    writeDocSection("payroll", markdown);
    say("wrote docs/benchmarks.md");
  }
}

await runBenchmark({ port, say }, main);
