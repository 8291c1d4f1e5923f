// Turns a run's numbers into Markdown: printed to stdout and written into docs/benchmarks.md
// between this benchmark's markers, so other benchmarks can share the file.
import type { Latency, Plan } from "./measure.ts";
import type { ApiProfile, Throughput } from "./throughput.ts";

export const conflictGoalMs = 5;
export const throughputGoalRatio = 0.5;

export type SizeResult = {
  bookings: number;
  loadSeconds: number;
  /** InnoDB's own (approximate) figures for the bookings table after the load. */
  tableMiB: { data: number; index: number };
  /** The host's 1-minute load average as measuring began and ended. */
  loadAverage: [number, number];
  conflict: { transaction: Latency; findConflicts: Latency; statementsPerCheck: number };
  calendar: { service: Latency; raw: Latency };
  throughput: { api: Throughput; bare: Throughput; ratio: number; bookingsPerWeek: number };
};

export type Machine = { cpus: string; memory: string; os: string; node: string; mariadb: string; server: string };
export type RunInfo = {
  date: string;
  machine: Machine;
  iterations: number;
  warmUp: number;
  throughput: { seconds: number; connections: number; weeks: number };
  sizes: SizeResult[];
  plans: { bookings: number; plans: Plan[] } | null;
  profile: (ApiProfile & { bookings: number }) | null;
  totalSeconds: number;
};

const ms = (v: number) => (v < 10 ? v.toFixed(2) : v.toFixed(1));
const count = (n: number) => n.toLocaleString("en-US");
const pair = (l: Latency) => `${ms(l.p50)} / ${ms(l.p95)}`;
/** A Markdown table; numbers read best right-aligned, so every column after the first is, unless `left`. */
const table = (header: string[], rows: (string | number)[][], left = false) =>
  [`| ${header.join(" | ")} |`, `| ${header.map((_, i) => (i === 0 || left ? "---" : "---:")).join(" | ")} |`, ...rows.map((r) => `| ${r.join(" | ")} |`)].join("\n");

function goals(run: RunInfo) {
  const largest = run.sizes.at(-1);
  if (!largest) return "No size was measured.";
  const conflict = largest.conflict.transaction;
  const t = largest.throughput;
  const conflictMet = conflict.p95 < conflictGoalMs;
  const ratioMet = t.ratio >= throughputGoalRatio;
  const atMillion = largest.bookings >= 1_000_000;
  const verdict = (met: boolean) => (atMillion ? (met ? "**met**" : "**missed**") : "not measured at 1 M");
  const rows = [
    [`Conflict check (lock + findConflicts, whole transaction) p95 under ${conflictGoalMs} ms at 1,000,000 bookings`, `${ms(conflict.p95)} ms at ${count(largest.bookings)}`, verdict(conflictMet)],
    [`API throughput at least ${throughputGoalRatio}× the bare Express + mysql2 baseline`, `${t.ratio.toFixed(2)}× at ${count(largest.bookings)}`, verdict(ratioMet)],
  ];
  const notes: string[] = [];
  if (atMillion && !conflictMet) {
    const first = run.sizes[0]!;
    const pool = run.machine.server.match(/innodb_buffer_pool_size (\d+) MiB/)?.[1] ?? "?";
    const reads = conflict.pageReadsPerCall;
    const roomPlan = run.plans?.plans.find((p) => p.title === "Conflict check, room");
    const chosen = roomPlan?.keys.find((k) => k.table === "bookings");
    const bookingsRow = roomPlan?.rows.find((r) => r.table === "bookings");
    // Does the chosen key hold every column the occupancy test reads? Then pushdown can filter in the index.
    const covering = Boolean(chosen && ["ends_at", "status", "queued_behind_id", "hold_expires_at"].every((c) => chosen.columns.includes(c)));
    const tableSize = `the table (${Math.round(largest.tableMiB.data)} MiB of rows, ${Math.round(largest.tableMiB.index)} MiB of indexes) is far larger than the ${pool} MiB buffer pool`;
    const cause =
      reads < 1
        ? `It reads nothing from disk (${reads.toFixed(1)} pages per check), so the time is the ${largest.conflict.statementsPerCheck.toFixed(0)} statements each check sends (isolation level, begin, two locking reads, two conflict queries, commit) on a host whose cores are shared with the rest of the run.`
        : covering
          ? `The key covers the occupancy test, so only matching rows are fetched, but ${tableSize}: a check still reads ${reads.toFixed(1)} pages from disk (${first.conflict.transaction.pageReadsPerCall.toFixed(1)} at ${count(first.bookings)}).`
          : `What changes is where those rows are: for each index entry InnoDB fetches the whole row (about 1 KiB, most of it the quote JSON) to test \`status\`, \`queued_behind_id\` and \`hold_expires_at\`, and at ${count(largest.bookings)} bookings ${tableSize}, so a check reads ${reads.toFixed(1)} pages from disk (${first.conflict.transaction.pageReadsPerCall.toFixed(1)} at ${count(first.bookings)}).`;
    const fixes = [
      ...(reads >= 1 ? [`give MariaDB a buffer pool that holds the bookings table — the ${pool} MiB that \`scripts/lib/mariadb.mjs\` starts with is a development default (\`npm run bench -- --buffer-pool-mb=2048 --no-doc\` shows the effect)`] : []),
      ...(covering ? [] : ["make the room index cover the occupancy test — `(room_id, starts_at, ends_at, status, queued_behind_id, hold_expires_at)` — so index condition pushdown drops the non-overlapping and non-occupying entries before any row is read, leaving one or two row reads per check whatever the pool size"]),
      "fewer round trips per check (the isolation level can be set once per pooled connection, and the two locking reads could be one)",
    ];
    notes.push(
      `**Why the conflict check misses, and the fix.** The plan is the intended one (below: \`bookings\` → \`${chosen?.key ?? "?"}\` (${chosen?.columns.join(", ") ?? "?"}), a range over the room's entries from 14 days before the window to its end${bookingsRow ? ` — about ${bookingsRow.rows} entries by the optimiser's estimate, ${bookingsRow.r_rows} rows actually read` : ""}), and that range is as long at ${count(first.bookings)} bookings as at ${count(largest.bookings)}. ${cause} Suggested fixes, outside this benchmark: ` +
        fixes.map((f, i) => `(${i + 1}) ${f}`).join("; ") +
        ".",
    );
  }
  if (atMillion && !ratioMet) {
    const drizzle = run.profile?.byOrigin.find((o) => o.name === "drizzle-orm");
    const busy = run.profile ? run.profile.busyMs / (run.profile.busyMs + run.profile.idleMs) : null;
    notes.push(
      `**Why the API misses the throughput goal, and the fix.** Each API request sends ${t.api.statementsPerRequest.toFixed(1)} statements to the baseline's ${t.bare.statementsPerRequest.toFixed(1)} (better-auth's session lookup and \`loadActor\` before the three calendar statements), and the API process is CPU-bound${busy !== null ? ` (busy ${Math.round(busy * 100)} % of the profiled run)` : ""}${drizzle ? `, ${Math.round(drizzle.share * 100)} % of it in drizzle building SQL` : ""}. Suggested fixes, outside this benchmark: ` +
        "(1) resolve session, user and role in one joined statement per request (still read from the database every time, so deactivation keeps taking effect at once); " +
        "(2) prepared drizzle statements (`.prepare()` with `sql.placeholder`) for `loadBookingDtos` and the actor lookup, so the SQL is not rebuilt on every request; " +
        "(3) fetch a week's engineers and kit in one statement instead of two.",
    );
  }
  return [table(["Goal", "Result", "Verdict"], rows, true), ...notes].join("\n\n");
}

function summaryTable(run: RunInfo) {
  return table(
    ["Bookings", "Conflict check p50 / p95 ms", "findConflicts p50 / p95 ms", "Calendar week listBookings p50 / p95 ms", "Calendar week raw SQL p50 / p95 ms", "DB share (p50)", "API req/s", "Bare req/s", "API ÷ bare"],
    run.sizes.map((s) => [
      count(s.bookings),
      pair(s.conflict.transaction),
      pair(s.conflict.findConflicts),
      pair(s.calendar.service),
      pair(s.calendar.raw),
      `${Math.round((s.calendar.raw.p50 / s.calendar.service.p50) * 100)} %`,
      Math.round(s.throughput.api.reqPerSec),
      Math.round(s.throughput.bare.reqPerSec),
      `${s.throughput.ratio.toFixed(2)}×`,
    ]),
  );
}

function sizeSection(s: SizeResult) {
  const latency = table(
    ["Measure", "p50 ms", "p95 ms", "n", "rows per call", "pages read from disk per call"],
    [
      ["Conflict check: bookingTx → lockResources → findConflicts (room + 1 engineer)", ms(s.conflict.transaction.p50), ms(s.conflict.transaction.p95), s.conflict.transaction.n, s.conflict.transaction.meanRows.toFixed(2), s.conflict.transaction.pageReadsPerCall.toFixed(1)],
      ["… of which findConflicts", ms(s.conflict.findConflicts.p50), ms(s.conflict.findConflicts.p95), s.conflict.findConflicts.n, s.conflict.findConflicts.meanRows.toFixed(2), "—"],
      ["Calendar week: listBookings (one room, 7 days)", ms(s.calendar.service.p50), ms(s.calendar.service.p95), s.calendar.service.n, s.calendar.service.meanRows.toFixed(1), s.calendar.service.pageReadsPerCall.toFixed(1)],
      ["Calendar week: the same SQL through mysql2", ms(s.calendar.raw.p50), ms(s.calendar.raw.p95), s.calendar.raw.n, s.calendar.raw.meanRows.toFixed(1), s.calendar.raw.pageReadsPerCall.toFixed(1)],
    ],
  );
  const t = s.throughput;
  const http = table(
    ["Target", "req/s", "p50 ms", "p99 ms", "requests", "non-2xx", "errors", "SQL statements per request"],
    [
      ["API: GET /api/bookings (createApp, session cookie)", Math.round(t.api.reqPerSec), t.api.p50, t.api.p99, count(t.api.requests), t.api.non2xx, t.api.errors, t.api.statementsPerRequest.toFixed(1)],
      ["Bare: Express + mysql2, same SQL", Math.round(t.bare.reqPerSec), t.bare.p50, t.bare.p99, count(t.bare.requests), t.bare.non2xx, t.bare.errors, t.bare.statementsPerRequest.toFixed(1)],
    ],
  );
  return `### ${count(s.bookings)} bookings\n\nEach conflict check sends ${s.conflict.statementsPerCheck.toFixed(1)} SQL statements. Loaded in ${s.loadSeconds.toFixed(1)} s; the bookings table holds ${Math.round(s.tableMiB.data)} MiB of rows and ${Math.round(s.tableMiB.index)} MiB of indexes. Host load average while measuring: ${s.loadAverage[0].toFixed(1)} → ${s.loadAverage[1].toFixed(1)}.\n\n${latency}\n\n${http}\n\nAPI ÷ bare: **${t.ratio.toFixed(2)}×**; a calendar week of one room holds ${t.bookingsPerWeek} bookings in the probe week.`;
}

function planSection(plans: NonNullable<RunInfo["plans"]>) {
  const columns = ["table", "type", "possible_keys", "key", "key_len", "ref", "rows", "r_rows", "filtered", "r_filtered", "Extra"];
  const parts = plans.plans.map((p) => {
    const rows = p.rows.map((r) => columns.map((c) => String(r[c] ?? "").replaceAll("|", "\\|")));
    const keys = p.keys.map((k) => `\`${k.table}\` → ${k.key ? `\`${k.key}\` (${k.columns.join(", ")})` : "no key"}`).join(", ");
    return `#### ${p.title}\n\nKeys chosen: ${keys}.\n\n${table(columns, rows, true)}\n\n<details><summary>Statement</summary>\n\n\`\`\`sql\n${p.sql}\n\`\`\`\n</details>`;
  });
  return `### Query plans at ${count(plans.bookings)} bookings\n\nMariaDB \`ANALYZE\` of the statements the code sends (captured through a drizzle logger): \`rows\` is the optimiser's estimate, \`r_rows\` what it really read.\n\n${parts.join("\n\n")}`;
}

function profileSection(p: NonNullable<RunInfo["profile"]>) {
  const pct = (v: number) => `${(v * 100).toFixed(1)} %`;
  const byOrigin = table(["Layer (Node and V8 time charged to its caller)", "CPU ms", "share of busy"], p.byOrigin.map((o) => [o.name, Math.round(o.ms), pct(o.share)]));
  const functions = table(["Function (self time)", "CPU ms", "share of busy"], p.functions.map((f) => [f.name.replaceAll("|", "\\|"), Math.round(f.ms), pct(f.share)]));
  return `### Where the API's CPU goes (${count(p.bookings)} bookings)\n\nA separate ${p.seconds} s autocannon run (after the 3 s warm-up, start-up included) against the API started with \`--cpu-prof\`; the profiler slows the process, so only the shares matter. Busy ${Math.round(p.busyMs)} ms, idle ${Math.round(p.idleMs)} ms.\n\n${byOrigin}\n\n${functions}`;
}

export function renderMarkdown(run: RunInfo): string {
  const m = run.machine;
  return [
    "## Bookings",
    `Last run: ${run.date}, by \`npm run bench\` (\`bench/bookings/run.ts\`), ${Math.round(run.totalSeconds)} s in all.`,
    "### What is measured",
    [
      "A private MariaDB (port 3309, data in a temp dir) is migrated and seeded with the Wrenfield Sound demo, then 20 bench rooms (two bench engineers each, 50 bench clients) are filled with synthetic bookings by multi-row INSERTs of 5,000 rows: consecutive 3–10 h sessions per room with the turnover kept free and 0.5–4 h gaps (and a dark day now and then), from 1990 onwards; 50 % confirmed, 35 % wrapped, 8 % holds (lapsing two days before the session), 7 % cancelled; about half have booking_engineers rows. The same database grows to each size in turn; `ANALYZE TABLE` refreshes the statistics after each load.\n",
      `- **Conflict check**: the real \`bookingTx\` (READ COMMITTED) → \`lockResources\` → \`findConflicts\` for a random 3–10 h window in a random bench room with its engineer, timed as a whole and for \`findConflicts\` alone. ${run.warmUp} warm-up rounds, then ${run.iterations} timed.`,
      `- **Calendar week**: the real \`listBookings\` (the service behind \`GET /api/bookings?roomId=&from=&to=\`, as the manager) for a random room and studio week, and the same three statements written out for mysql2 (checked first to return the same bookings on 20 weeks), alternating, each on its own random weeks so neither reads pages the other has just cached; the ratio of their medians is the database's share. ${run.warmUp} warm-up rounds, then ${run.iterations} timed.`,
      `- **Throughput**: the real app (\`createApp\`, signed in as the manager, the session cookie on every request) and a bare Express + mysql2 endpoint running the same SQL, each in its own process on a free port, hit by autocannon with ${run.throughput.connections} connections for ${run.throughput.seconds} s after a 3 s warm-up, cycling ${run.throughput.weeks} fixed room-weeks (after the warm-up their pages are in the buffer pool, so this measures the layers above the disk).`,
      "\nLatencies are in milliseconds, measured in the bench process (so they include the round trips to MariaDB over loopback). Pages read from disk are InnoDB buffer-pool misses (`Innodb_buffer_pool_reads`) per call; statements per request are MariaDB's `Questions` over the timed run.",
    ].join("\n"),
    "### Machine",
    [`- CPU: ${m.cpus}`, `- RAM: ${m.memory}`, `- OS: ${m.os}`, `- Node.js ${m.node}`, `- MariaDB ${m.mariadb} (${m.server})`, "- Everything — MariaDB, the server under test and autocannon — shares these cores, so req/s is a lower bound of what a separate database host would give."].join("\n"),
    "### Goals",
    goals(run),
    "### Summary",
    summaryTable(run),
    ...run.sizes.map(sizeSection),
    ...(run.plans ? [planSection(run.plans)] : []),
    ...(run.profile ? [profileSection(run.profile)] : []),
  ].join("\n\n");
}
