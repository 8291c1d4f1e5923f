// npm run bench: runs every benchmark in bench/ (today: bookings, payroll, then tape) and leaves nothing behind.
// Each benchmark gets a fresh temp dir for its private MariaDB; whatever way the benchmark
// ends (success, error, Ctrl-C, a crash), this script stops that server and removes the dir.
import { spawn, spawnSync } from "node:child_process";
import { existsSync, mkdtempSync, readFileSync, rmSync } from "node:fs";
import { setTimeout as sleep } from "node:timers/promises";
import os from "node:os";
import path from "node:path";
import { log, root, which } from "./lib/proc.mjs";

const benchmarks = ["bench/bookings/run.ts", "bench/payroll/run.ts", "bench/tape/run.ts"];
const passThrough = process.argv.slice(2);

function alive(pid) {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}

/** Stops a MariaDB the benchmark left running in `dir` (it normally stops its own). */
async function stopLeftoverServer(dir) {
  const pidFile = path.join(dir, "mysqld.pid");
  if (!existsSync(pidFile)) return;
  const pid = Number(readFileSync(pidFile, "utf8").trim());
  if (!(pid > 0) || !alive(pid)) return;
  log(`stopping the MariaDB the benchmark left running (pid ${pid})`);
  const admin = which("mariadb-admin");
  if (admin) spawnSync(admin, ["--no-defaults", `--socket=${dir}/mysqld.sock`, "-uroot", "shutdown"], { stdio: "ignore" });
  for (let waited = 0; alive(pid) && waited < 30000; waited += 200) await sleep(200);
  if (alive(pid)) process.kill(pid, "SIGKILL");
}

function runBenchmark(file, dir) {
  return new Promise((resolve) => {
    const child = spawn(path.join(root, "node_modules/.bin/tsx"), [file, ...passThrough], {
      cwd: root,
      stdio: "inherit",
      env: { ...process.env, TAKEUP_BENCH_DIR: dir },
    });
    // Ctrl-C reaches the child through the terminal; a TERM sent to us is passed on.
    const forward = () => child.kill("SIGTERM");
    process.on("SIGTERM", forward);
    process.on("SIGINT", () => {});
    child.on("exit", (code, signal) => {
      process.off("SIGTERM", forward);
      resolve(code ?? (signal ? 1 : 0));
    });
    child.on("error", (error) => {
      log(`could not start ${file}: ${error.message}`);
      resolve(1);
    });
  });
}

if (!existsSync(path.join(root, "node_modules/.bin/tsx"))) {
  log("node_modules is missing: run npm install first");
  process.exit(1);
}

let failed = 0;
for (const file of benchmarks) {
  const dir = mkdtempSync(path.join(os.tmpdir(), "takeup-bench-"));
  log(`running ${file}`);
  try {
    const code = await runBenchmark(file, dir);
    if (code !== 0) {
      failed++;
      log(`${file} failed (exit ${code})`);
    }
  } finally {
    await stopLeftoverServer(dir);
    rmSync(dir, { recursive: true, force: true });
  }
}
process.exit(failed ? 1 : 0);
