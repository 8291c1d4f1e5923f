// `npm test`: the same bootstrapping as `npm start`, on a throw-away MariaDB, then typecheck,
// lint and every Vitest project (domain, api, web, and browser journeys against a running app).
// Ends with one plain line: "N passed, N failed".
import { mkdtempSync, readFileSync, rmSync, existsSync, mkdirSync } from "node:fs";
import { spawnSync } from "node:child_process";
import { randomBytes } from "node:crypto";
import { ensureDebianPackage, ensureNodeModules, log, root, stopChildren } from "./lib/proc.mjs";
import { buildWeb, dbTask, startApi, startMailCatcher } from "./lib/stack.mjs";
import { startMariaDb } from "./lib/mariadb.mjs";

const only = process.argv.find((a) => a.startsWith("--only="))?.slice("--only=".length);
// Anything else on the command line narrows the run to matching test files (vitest filters).
const fileFilters = process.argv.slice(2).filter((a) => !a.startsWith("--"));
const port = Number(process.env.TAKEUP_TEST_PORT ?? 3100);
const dbPort = Number(process.env.TAKEUP_TEST_DB_PORT ?? 3308);
const smtpPort = Number(process.env.TAKEUP_TEST_SMTP_PORT ?? 2525);
const mailHttpPort = Number(process.env.TAKEUP_TEST_MAIL_HTTP_PORT ?? 2580);
const appUrl = `http://localhost:${port}`;

// `--only=<project>` starts only what that project needs: domain and web need no server at all.
const needsDatabase = !only || only === "api" || only === "e2e";
const needsApp = !only || only === "e2e";

ensureNodeModules();
if (needsApp) ensureDebianPackage("chromium", "chromium");

const problems = [];
const step = (name, command, args, env = {}) => {
  log(`${name} …`);
  const result = spawnSync(command, args, { cwd: root, stdio: "inherit", env: { ...process.env, ...env } });
  if (result.status !== 0) problems.push(name);
  return result.status === 0;
};
const bin = (name) => `${root}/node_modules/.bin/${name}`;

const dataDir = mkdtempSync("/tmp/takeup-test-db-");
let database;
let exitCode = 1;
try {
  if (needsDatabase) database = await startMariaDb({ dir: dataDir, port: dbPort, database: "takeup_test" });
  if (!only) {
    step("typecheck", "npm", ["run", "--silent", "typecheck"]);
    step("lint", bin("eslint"), [".", "--max-warnings=0"]);
  }

  // The browser journeys run against a real app on its own seeded database.
  if (needsApp) {
    const e2eUrl = database.url.replace(/\/takeup_test$/, "/takeup_test_e2e");
    database.createDatabase("takeup_test_e2e");
    dbTask(e2eUrl, "migrate");
    dbTask(e2eUrl, "seed");
    buildWeb();
    await startMailCatcher({ smtpPort, httpPort: mailHttpPort });
    await startApi({
      port,
      quiet: !process.env.TAKEUP_LOG,
      env: {
        DATABASE_URL: e2eUrl,
        APP_URL: appUrl,
        AUTH_SECRET: randomBytes(32).toString("base64url"),
        SMTP_URL: `smtp://127.0.0.1:${smtpPort}`,
        MAIL_CATCHER_URL: `http://127.0.0.1:${mailHttpPort}`,
      },
    });
  }

  mkdirSync(`${root}/.tmp`, { recursive: true });
  const results = `${root}/.tmp/vitest-results.json`;
  rmSync(results, { force: true });
  step(
    "tests",
    bin("vitest"),
    ["run", "--reporter=default", "--reporter=json", `--outputFile.json=${results}`, ...(only ? ["--project", only] : []), ...fileFilters],
    {
      ...(database ? { TEST_DATABASE_URL: database.url } : {}),
      E2E_BASE_URL: appUrl,
      E2E_MAIL_URL: `http://127.0.0.1:${mailHttpPort}`,
    },
  );
  let passed = 0;
  let failed = 0;
  if (existsSync(results)) {
    const report = JSON.parse(readFileSync(results, "utf8"));
    passed = report.numPassedTests;
    failed = report.numFailedTests + filesThatFailedToRun(report);
  } else {
    failed = 1;
  }
  for (const problem of problems.filter((p) => p !== "tests")) log(`${problem} failed (see above)`);
  exitCode = problems.length === 0 && failed === 0 ? 0 : 1;
  process.stdout.write(`${passed} passed, ${failed} failed\n`);
} catch (error) {
  process.stderr.write(`${error instanceof Error ? error.stack : error}\n`);
  process.stdout.write("0 passed, 1 failed\n");
} finally {
  await stopChildren();
  await database?.stop();
  rmSync(dataDir, { recursive: true, force: true });
}
process.exit(exitCode);

/** A test file that failed without a failed test (it did not load, or a hook threw) counts once. */
function filesThatFailedToRun(report) {
  return report.testResults.filter(
    (file) => file.status === "failed" && !file.assertionResults.some((a) => a.status === "failed"),
  ).length;
}
