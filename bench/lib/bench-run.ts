// What every benchmark in bench/ does around its measurements: read its options, start a
// private MariaDB in a temp dir, stop it and remove the dir however the run ends, describe the
// machine, and rewrite its own section of docs/benchmarks.md.
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { createServer } from "node:net";
import os from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";

export const root = fileURLToPath(new URL("../..", import.meta.url));
export const benchmarksDoc = path.join(root, "docs/benchmarks.md");

export type MariaDb = { url: string; stop(): Promise<void> };
type MariaDbHelper = { startMariaDb(options: { dir: string; port: number; database: string }): Promise<MariaDb> };

/** `--name=value` from the command line. npm run bench passes the same options to every benchmark, so each ignores the others'. */
export function benchOption(name: string): string | undefined {
  const prefix = `--${name}=`;
  return process.argv.find((a) => a.startsWith(prefix))?.slice(prefix.length);
}

export const benchFlag = (name: string) => process.argv.includes(`--${name}`);

export const sayAs = (tag: string) => (message: string) => process.stdout.write(`[${tag}] ${message}\n`);

function portIsFree(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const probe = createServer()
      .once("error", () => resolve(false))
      .once("listening", () => probe.close(() => resolve(true)))
      .listen(port, "127.0.0.1");
  });
}

export type BenchContext = {
  /** The run's temp dir: bench.mjs hands one over (and removes it whatever happens); run alone, we make our own. */
  dir: string;
  /** Starts the private MariaDB on the benchmark's port; it is stopped when the run ends. */
  startServer(): Promise<MariaDb>;
  /** Work to undo when the run ends, before the server stops (child processes, pools). */
  onCleanUp(step: () => Promise<void> | void): void;
};

/**
 * Runs a benchmark's `main` and cleans up after it: on success, on an error (exit code 1) and
 * on Ctrl-C or SIGTERM (exit code 130), the cleanup steps run, then MariaDB stops and the dir goes.
 */
export async function runBenchmark(options: { port: number; say: (message: string) => void }, main: (context: BenchContext) => Promise<void>) {
  const { port, say } = options;
  const dir = process.env.TAKEUP_BENCH_DIR ?? mkdtempSync(path.join(os.tmpdir(), "takeup-bench-"));
  const steps: (() => Promise<void> | void)[] = [];
  let mariadb: MariaDb | null = null;
  let cleaned = false;
  const cleanUp = async () => {
    if (cleaned) return;
    cleaned = true;
    for (const step of steps.reverse()) await Promise.resolve(step()).catch(() => undefined);
    await mariadb?.stop().catch((error: unknown) => say(`could not stop MariaDB: ${String(error)}`));
    rmSync(dir, { recursive: true, force: true });
  };
  for (const signal of ["SIGINT", "SIGTERM"] as const) {
    process.once(signal, () => {
      say(`${signal}: stopping`);
      void cleanUp().finally(() => process.exit(130));
    });
  }
  const context: BenchContext = {
    dir,
    async startServer() {
      if (!(await portIsFree(port))) throw new Error(`port ${port} is taken; the bench needs it for its private MariaDB`);
      // The helper is plain Node (it runs before npm install), so it is loaded untyped and typed here.
      const helperUrl = new URL("../../scripts/lib/mariadb.mjs", import.meta.url).href;
      const { startMariaDb } = (await import(helperUrl)) as MariaDbHelper;
      say(`starting a private MariaDB on port ${port} in ${dir}`);
      mariadb = await startMariaDb({ dir, port, database: "takeup_bench" });
      return mariadb;
    },
    onCleanUp: (step) => steps.push(step),
  };
  try {
    await main(context);
  } catch (error) {
    process.exitCode = 1;
    say(`failed: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}`);
  } finally {
    await cleanUp();
  }
}

/** The host, as each benchmark's "Machine" list gives it (MariaDB's version is the benchmark's to add). */
export function hostMachine() {
  const cpus = os.cpus();
  return {
    cpus: `${cpus.length} × ${cpus[0]?.model.trim() ?? "unknown"}`,
    memory: `${(os.totalmem() / 2 ** 30).toFixed(1)} GiB`,
    os: `${os.type()} ${os.release()} (${os.arch()})`,
    node: process.version,
  };
}

const intro = `# Benchmarks

Speed is measured by the scripts in \`bench/\` and recorded here, never by timed assertions in tests. Run them all from the repository root with:

\`\`\`sh
npm run bench        # every benchmark; rewrites its own section of this file
npm run bench -- --sizes=10000,100000 --no-doc   # a quicker look that leaves this file alone
\`\`\`

Each section below is written by its benchmark between its markers; edit the benchmark, not the numbers.
`;

/** Replaces the benchmark's section of docs/benchmarks.md (between its markers), creating the file or the section as needed. */
export function writeDocSection(name: string, markdown: string, file = benchmarksDoc) {
  const start = `<!-- bench:${name}:start -->`;
  const end = `<!-- bench:${name}:end -->`;
  const section = `${start}\n${markdown}\n${end}`;
  let text = existsSync(file) ? readFileSync(file, "utf8") : intro;
  const from = text.indexOf(start);
  const to = text.indexOf(end);
  text = from >= 0 && to > from ? text.slice(0, from) + section + text.slice(to + end.length) : `${text.trimEnd()}\n\n${section}\n`;
  writeFileSync(file, text);
}
