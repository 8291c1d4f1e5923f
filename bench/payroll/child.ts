// Runs one measured case in a fresh Node process, so its peak memory is its own and its code
// starts cold, as it would in an API process that has not exported anything yet. --expose-gc
// only lets the engine case weigh what its result keeps, after the timed step.
import { fork } from "node:child_process";
import { readFileSync, readdirSync, statSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";

const here = path.dirname(fileURLToPath(import.meta.url));

export type CaseRun<T> = { result: T; profile: CpuProfile | null };
export type CpuProfile = {
  startTime: number;
  nodes: { id: number; callFrame: { functionName: string; url: string }; children?: number[] }[];
  samples: number[];
  timeDeltas: number[];
};

const running = new Set<ReturnType<typeof fork>>();

/** Stops a case still running (used when the run is interrupted). */
export function stopRunningCases() {
  for (const child of running) child.kill("SIGTERM");
}

/** Runs `file` with `args`; with `profileDir`, under --cpu-prof, and returns the main thread's profile. */
export function runCase<T>(file: string, args: string[], env: Record<string, string>, profileDir?: string): Promise<CaseRun<T>> {
  const profiling = profileDir ? ["--cpu-prof", `--cpu-prof-dir=${profileDir}`] : [];
  return new Promise((resolve, reject) => {
    const child = fork(path.join(here, file), args, { execArgv: ["--import", "tsx", "--expose-gc", ...profiling], env: { ...process.env, ...env }, stdio: ["ignore", "inherit", "inherit", "ipc"] });
    running.add(child);
    let result: T | undefined;
    child.on("message", (message) => (result = message as T));
    child.on("error", reject);
    child.on("exit", (code, signal) => {
      running.delete(child);
      if (code !== 0 || result === undefined) return reject(new Error(`${file} ${args.join(" ")} ended with ${signal ?? `exit ${code}`}${result === undefined ? " and no result" : ""}`));
      resolve({ result, profile: profileDir ? mainThreadProfile(profileDir) : null });
    });
  });
}

/** tsx's loader thread writes a profile too; the main thread's is by far the largest. */
function mainThreadProfile(dir: string): CpuProfile {
  const files = readdirSync(dir).filter((f) => f.endsWith(".cpuprofile"));
  const largest = files.sort((a, b) => statSync(path.join(dir, b)).size - statSync(path.join(dir, a)).size)[0];
  if (!largest) throw new Error(`no CPU profile was written to ${dir}`);
  return JSON.parse(readFileSync(path.join(dir, largest), "utf8")) as CpuProfile;
}
