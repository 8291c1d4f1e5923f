// Small process helpers for the start and test scripts (plain Node: they run before npm install).
import { spawn, spawnSync } from "node:child_process";
import { existsSync } from "node:fs";

export const root = new URL("../..", import.meta.url).pathname.replace(/\/$/, "");

export function log(message) {
  process.stdout.write(`[takeup] ${message}\n`);
}

export function fail(message) {
  process.stderr.write(`[takeup] ${message}\n`);
  process.exit(1);
}

/** Runs a command to completion, inheriting output; throws on a non-zero exit. */
export function run(command, args, options = {}) {
  const result = spawnSync(command, args, { stdio: "inherit", cwd: root, ...options });
  if (result.status !== 0) {
    throw new Error(`${command} ${args.join(" ")} exited with ${result.status ?? result.signal}`);
  }
}

export function which(command) {
  for (const dir of (process.env.PATH ?? "").split(":").concat(["/usr/sbin", "/usr/bin", "/sbin", "/bin"])) {
    if (existsSync(`${dir}/${command}`)) return `${dir}/${command}`;
  }
  return null;
}

const children = new Set();

/** Starts a long-running child; its output is prefixed so interleaved logs stay readable. */
export function startChild(name, command, args, options = {}) {
  const child = spawn(command, args, { cwd: root, stdio: ["ignore", "pipe", "pipe"], ...options });
  const prefix = (stream, out) =>
    stream.on("data", (chunk) => {
      if (options.quiet) return;
      for (const line of chunk.toString().split("\n")) if (line) out.write(`[${name}] ${line}\n`);
    });
  prefix(child.stdout, process.stdout);
  prefix(child.stderr, process.stderr);
  children.add(child);
  child.on("exit", () => children.delete(child));
  return child;
}

export async function stopChildren() {
  const waits = [...children].map(
    (child) =>
      new Promise((resolve) => {
        if (child.exitCode !== null) return resolve();
        child.once("exit", resolve);
        child.kill("SIGTERM");
        setTimeout(() => child.kill("SIGKILL"), 5000).unref();
      }),
  );
  await Promise.all(waits);
}

export async function waitFor(what, check, timeoutMs = 30000) {
  const started = Date.now();
  for (;;) {
    try {
      if (await check()) return;
    } catch {
      // not up yet
    }
    if (Date.now() - started > timeoutMs) throw new Error(`Timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 150));
  }
}

export async function httpOk(url) {
  const response = await fetch(url);
  return response.ok;
}

/** Installs Debian packages when a command is missing (needs root). */
export function ensureDebianPackage(command, pkg) {
  if (which(command)) return;
  if (process.getuid && process.getuid() !== 0) {
    fail(`${command} is missing. Install it with: sudo apt-get install -y ${pkg}  (or run this as root)`);
  }
  log(`installing Debian's ${pkg} (needed for ${command}) …`);
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  const quiet = { stdio: ["ignore", "ignore", "inherit"], env };
  // Another start or test run may be installing at the same moment: wait for dpkg's lock
  // instead of failing on it.
  const waitForLock = ["-o", "DPkg::Lock::Timeout=900"];
  const install = [...waitForLock, "install", "-y", "--no-install-recommends", pkg];
  const attempt = spawnSync("apt-get", install, quiet);
  if (attempt.status !== 0 && !which(command)) {
    run("apt-get", [...waitForLock, "update"], quiet);
    run("apt-get", install, quiet);
  }
  if (!which(command)) fail(`installed ${pkg} but ${command} is still missing`);
}

/** Runs `npm ci` when node_modules is missing or older than the lockfile. */
export function ensureNodeModules() {
  const marker = `${root}/node_modules/.package-lock.json`;
  if (existsSync(marker)) return;
  log("installing npm dependencies (npm ci) …");
  run("npm", ["ci", "--no-audit", "--no-fund"]);
}
