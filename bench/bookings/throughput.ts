// Requests per second for the calendar week: the real API against a bare Express + mysql2
// endpoint running the same SQL, each in its own process, driven by autocannon from this one.
import { spawn, type ChildProcess } from "node:child_process";
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { createInterface } from "node:readline";
import { fileURLToPath } from "node:url";
import autocannon, { type Result } from "autocannon";
import { demoPassword } from "@takeup/db/seed";
import { randomWeek } from "./measure.ts";
import type { LoadedSpan } from "./load.ts";
import type { Random } from "./random.ts";

const servePath = fileURLToPath(new URL("./serve.ts", import.meta.url));

export type Throughput = { reqPerSec: number; p50: number; p99: number; requests: number; non2xx: number; errors: number; statementsPerRequest: number };
/** MariaDB's global count of statements received, to tell how many each request costs. */
export type StatementCounter = () => Promise<number>;
type Target = { kind: "api" | "bare"; appUrl: string; child: ChildProcess };

const running = new Set<ChildProcess>();

async function startTarget(kind: Target["kind"], databaseUrl: string, profileDir?: string): Promise<Target> {
  const profile = profileDir ? ["--cpu-prof", `--cpu-prof-dir=${profileDir}`] : [];
  const child = spawn(process.execPath, [...profile, "--import", "tsx", servePath, kind], {
    env: { ...process.env, TAKEUP_BENCH_DATABASE_URL: databaseUrl, NODE_ENV: "production" },
    stdio: ["ignore", "pipe", "inherit"],
  });
  running.add(child);
  child.once("exit", () => running.delete(child));
  const lines = createInterface({ input: child.stdout! });
  const appUrl = await new Promise<string>((resolve, reject) => {
    child.once("exit", (code) => reject(new Error(`the ${kind} server exited with ${code} before it was ready`)));
    lines.on("line", (line) => {
      try {
        const message = JSON.parse(line) as { ready?: boolean; appUrl?: string };
        if (message.ready && message.appUrl) resolve(message.appUrl);
      } catch {
        process.stdout.write(`[${kind}] ${line}\n`);
      }
    });
  });
  return { kind, appUrl, child };
}

function stopTarget(target: Target): Promise<void> {
  return new Promise((resolve) => {
    if (target.child.exitCode !== null) return resolve();
    target.child.once("exit", () => resolve());
    target.child.kill("SIGTERM");
  });
}

/** Stops any server still running (used when the run fails half way). */
export async function stopAllTargets() {
  await Promise.all(
    [...running].map(
      (child) =>
        new Promise<void>((resolve) => {
          child.once("exit", () => resolve());
          child.kill("SIGTERM");
        }),
    ),
  );
}

/** Signs in as the demo manager the way the web page does and returns the Cookie header. */
async function signIn(appUrl: string): Promise<string> {
  const response = await fetch(`${appUrl}/api/session`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: appUrl },
    body: JSON.stringify({ email: "manager@wrenfield.test", password: demoPassword }),
  });
  if (!response.ok) throw new Error(`sign-in failed: ${response.status} ${await response.text()}`);
  const cookie = response.headers
    .getSetCookie()
    .map((c) => c.split(";")[0])
    .join("; ");
  if (!cookie) throw new Error("sign-in set no cookie");
  return cookie;
}

function summarise(result: Result, statementsPerRequest: number): Throughput {
  return {
    reqPerSec: result.requests.average,
    p50: result.latency.p50,
    p99: result.latency.p99,
    requests: result.requests.total,
    non2xx: result.non2xx,
    errors: result.errors + result.timeouts,
    statementsPerRequest,
  };
}

async function hammer(url: string, paths: string[], headers: Record<string, string>, seconds: number, connections: number, statements?: StatementCounter) {
  const requests = paths.map((path) => ({ method: "GET", path, headers }));
  // A short untimed run first: JIT, connection pool and buffer pool all warm.
  await autocannon({ url, connections, duration: Math.min(3, seconds), requests });
  const before = statements ? await statements() : 0;
  const result = await autocannon({ url, connections, duration: seconds, requests });
  // Requests cut off at the end still ran some statements, so this is a slight overestimate.
  const perRequest = statements ? (await statements()) - before - 1 : 0;
  return summarise(result, perRequest / Math.max(1, result.requests.sent ?? result.requests.total));
}

/** A fixed set of room-weeks as query strings, cycled by every connection, shared by both targets. */
function weekQueries(spans: LoadedSpan[], random: Random, weeks: number) {
  return Array.from({ length: weeks }, () => {
    const w = randomWeek(spans, random);
    return `?from=${encodeURIComponent(w.from.toISOString())}&to=${encodeURIComponent(w.to.toISOString())}&roomId=${w.roomId}`;
  });
}

export async function measureThroughput(databaseUrl: string, spans: LoadedSpan[], random: Random, options: { seconds: number; connections: number; weeks: number }, statements: StatementCounter) {
  const queries = weekQueries(spans, random, options.weeks);

  const api = await startTarget("api", databaseUrl);
  let apiResult: Throughput;
  let apiCount: number;
  try {
    const cookie = await signIn(api.appUrl);
    const headers = { cookie };
    const probe = await fetch(`${api.appUrl}/api/bookings${queries[0]}`, { headers });
    if (!probe.ok) throw new Error(`GET /api/bookings answered ${probe.status}: ${await probe.text()}`);
    apiCount = ((await probe.json()) as unknown[]).length;
    apiResult = await hammer(api.appUrl, queries.map((q) => `/api/bookings${q}`), headers, options.seconds, options.connections, statements);
  } finally {
    await stopTarget(api);
  }

  const bare = await startTarget("bare", databaseUrl);
  let bareResult: Throughput;
  try {
    const probe = await fetch(`${bare.appUrl}/bare/bookings${queries[0]}`);
    const body = (await probe.json()) as { bookings: unknown[] };
    // Both targets must be answering the same question, or the ratio means nothing.
    if (body.bookings.length !== apiCount) throw new Error(`the bare endpoint found ${body.bookings.length} bookings, the API ${apiCount}`);
    bareResult = await hammer(bare.appUrl, queries.map((q) => `/bare/bookings${q}`), {}, options.seconds, options.connections, statements);
  } finally {
    await stopTarget(bare);
  }
  return { api: apiResult, bare: bareResult, ratio: apiResult.reqPerSec / bareResult.reqPerSec, bookingsPerWeek: apiCount };
}

type CpuProfile = {
  nodes: { id: number; callFrame: { functionName: string; url: string; lineNumber: number }; children?: number[] }[];
  samples: number[];
  timeDeltas: number[];
};
export type ProfileShare = { name: string; ms: number; share: number };
export type ApiProfile = { seconds: number; busyMs: number; idleMs: number; byOrigin: ProfileShare[]; functions: ProfileShare[] };

/** Who a frame belongs to: a package, our own code, or null for Node.js itself and V8. */
function origin(url: string): string | null {
  if (!url || url.startsWith("node:")) return null;
  const inModules = url.split("/node_modules/").at(-1)!;
  if (inModules !== url) return inModules.startsWith("@") ? inModules.split("/").slice(0, 2).join("/") : inModules.split("/")[0]!;
  if (url.includes("/apps/api/src/")) return "our code: apps/api";
  if (url.includes("/packages/")) return "our code: packages";
  if (url.includes("/bench/")) return "bench/serve.ts";
  return "other";
}

/**
 * A separate, shorter run of the API under autocannon with --cpu-prof (the profiler slows it,
 * so its req/s is not reported): where the API process spends its CPU, by package.
 */
export async function profileApi(databaseUrl: string, spans: LoadedSpan[], random: Random, profileDir: string, options: { seconds: number; connections: number; weeks: number }): Promise<ApiProfile> {
  const queries = weekQueries(spans, random, options.weeks);
  const api = await startTarget("api", databaseUrl, profileDir);
  try {
    const headers = { cookie: await signIn(api.appUrl) };
    await hammer(api.appUrl, queries.map((q) => `/api/bookings${q}`), headers, options.seconds, options.connections);
  } finally {
    await stopTarget(api);
  }
  const file = readdirSync(profileDir).find((f) => f.endsWith(".cpuprofile"));
  if (!file) throw new Error("the API process wrote no CPU profile");
  const profile = JSON.parse(readFileSync(path.join(profileDir, file), "utf8")) as CpuProfile;
  const nodes = new Map(profile.nodes.map((n) => [n.id, n]));
  const parents = new Map<number, number>();
  for (const n of profile.nodes) for (const child of n.children ?? []) parents.set(child, n.id);
  // Time spent inside Node or V8 (socket writes, JSON, hashing) is charged to the innermost
  // package or file of ours that called it, so the table answers "which layer costs what".
  const owner = (id: number): string => {
    for (let at: number | undefined = id; at !== undefined; at = parents.get(at)) {
      const who = origin(nodes.get(at)!.callFrame.url);
      if (who) return who;
    }
    return nodes.get(id)!.callFrame.functionName === "(garbage collector)" ? "V8 garbage collector" : "Node.js / V8 with no JS caller";
  };
  const byOrigin = new Map<string, number>();
  const byFunction = new Map<string, number>();
  let idle = 0;
  let busy = 0;
  profile.samples.forEach((id, i) => {
    const micros = profile.timeDeltas[i] ?? 0;
    const frame = nodes.get(id)!.callFrame;
    if (frame.functionName === "(idle)") {
      idle += micros;
      return;
    }
    busy += micros;
    const who = owner(id);
    byOrigin.set(who, (byOrigin.get(who) ?? 0) + micros);
    const name = `${frame.functionName || "(anonymous)"} — ${frame.url ? path.basename(frame.url) : "native"}, for ${who}`;
    byFunction.set(name, (byFunction.get(name) ?? 0) + micros);
  });
  const top = (m: Map<string, number>, n: number) =>
    [...m]
      .sort((a, b) => b[1] - a[1])
      .slice(0, n)
      .map(([name, micros]) => ({ name, ms: micros / 1000, share: micros / busy }));
  return { seconds: options.seconds, busyMs: busy / 1000, idleMs: idle / 1000, byOrigin: top(byOrigin, 10), functions: top(byFunction, 10) };
}
