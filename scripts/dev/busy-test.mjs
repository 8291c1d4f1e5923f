// Proves the suite passes on a busy machine: runs `npm test` several times in a row with
// CPU-bound processes beside it, then reports each run's result line and wall time.
//   node scripts/dev/busy-test.mjs [--runs=3] [--burners=2] [-- extra npm test args]
import { spawn, spawnSync } from "node:child_process";
import { loadavg } from "node:os";

const option = (name, fallback) => Number(process.argv.find((a) => a.startsWith(`--${name}=`))?.split("=")[1] ?? fallback);
const runs = option("runs", 3);
const burnerCount = option("burners", 2);
const extra = process.argv.includes("--") ? process.argv.slice(process.argv.indexOf("--") + 1) : [];

// Each burner keeps one core busy hashing zeros until we stop it.
const burners = Array.from({ length: burnerCount }, () => spawn("sha256sum", ["/dev/zero"], { stdio: "ignore" }));
const stopBurners = () => burners.forEach((b) => b.kill("SIGKILL"));
process.on("SIGINT", () => {
  stopBurners();
  process.exit(130);
});

const results = [];
try {
  for (let run = 1; run <= runs; run += 1) {
    const started = Date.now();
    const result = spawnSync("npm", ["test", "--", ...extra], { encoding: "utf8", stdio: ["ignore", "pipe", "inherit"] });
    process.stdout.write(result.stdout);
    const line = result.stdout.trim().split("\n").filter((l) => /^\d+ passed, \d+ failed$/.test(l)).pop() ?? "no result line";
    results.push({ run, status: result.status, line, seconds: Math.round((Date.now() - started) / 1000), load: loadavg()[0].toFixed(1) });
  }
} finally {
  stopBurners();
}
process.stdout.write(`\nWith ${burnerCount} CPU-bound processes beside the suite:\n`);
for (const r of results) process.stdout.write(`run ${r.run}: ${r.line} in ${r.seconds} s (exit ${r.status}, load ${r.load})\n`);
process.exit(results.every((r) => r.status === 0) ? 0 : 1);
