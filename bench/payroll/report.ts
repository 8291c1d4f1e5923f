// Turns a run's numbers into Markdown: printed to stdout and written into docs/benchmarks.md
// between this benchmark's markers, beside the other benchmarks' sections.
import { allSeries, count, goalInMiB, median, ruleNames, type PayrollRun, type Series } from "./results.ts";
import { exportRules, goalMB, goalSeconds, period } from "./scenario.ts";

const s2 = (v: number) => v.toFixed(2);
const m0 = (v: number) => String(Math.round(v));
const table = (header: string[], rows: (string | number)[][]) =>
  [`| ${header.join(" | ")} |`, `| ${header.map((_, i) => (i === 0 ? "---" : "---:")).join(" | ")} |`, ...rows.map((r) => `| ${r.join(" | ")} |`)].join("\n");
const verdict = (met: boolean) => (met ? "**met**" : "**missed**");

/**
 * The medians measured on this machine (100,000 entries) before the payroll calendar stopped
 * calling luxon per entry and computePeriod read whole periods. Kept so a reader sees what the
 * change did.
 */
const before = { federal: { seconds: 26.09, rss: 433 }, daily: { seconds: 28.49, rss: 424 }, export: { seconds: 62.74, rss: 667 } };
type Before = (typeof before)[keyof typeof before];

function sinceBefore(s: ReturnType<typeof allSeries>) {
  const times = (was: Before, now: Series) => `${(was.seconds / median(now.seconds)).toFixed(1)}×`;
  const rss = (was: Before, now: Series) => `${was.rss} to ${m0(median(now.peakRss))} MiB`;
  return `Since the previous measurement the payroll calendar no longer calls luxon for every entry (it was three quarters of the engine's CPU), \`computePeriod\` reads every entry of the period (the export's earlier figure came from a bench copy of it), its rate check uses an index, and the export formats times without luxon: the engine is ${times(before.federal, s.federal)} (federal) and ${times(before.daily, s.daily)} (daily rules) faster, the export ${times(before.export, s.whole)} faster, now measured on the route's own code. Peak RSS fell much less: from ${rss(before.daily, s.daily)} for the engine (daily rules), from ${rss(before.export, s.whole)} for the export.`;
}

function goals(run: PayrollRun) {
  const s = allSeries(run);
  const n = count(run.shape.entries);
  // The figures before the fix are for the full-size fortnight only.
  const row = (what: string, x: Series, was: Before) => {
    const seconds = median(x.seconds);
    const rss = median(x.peakRss);
    return [what, run.shape.entries === 100_000 ? `${s2(was.seconds)} s, ${was.rss} MiB` : "–", `${s2(seconds)} s`, verdict(seconds < goalSeconds), `${m0(rss)} MiB`, verdict(rss < goalInMiB)];
  };
  const checks = goalChecks(run);
  const met = checks.filter((g) => g.met).map((g) => `${g.name} (${g.measured})`);
  const missed = checks.filter((g) => !g.met).map((g) => `${g.name} (${g.measured})`);
  const header = ["Goal: under 5 s and 300 MB", "Before the fix (time, peak RSS)", "Time now", "Time", "Peak RSS now", "Memory"];
  return [
    `Medians of ${run.runs} runs. The memory goal is ${goalMB} MB, that is ${goalMB} × 10⁶ bytes = ${goalInMiB.toFixed(1)} MiB; memory is measured and compared in MiB, against ${m0(goalInMiB)} MiB. The figure compared is the process's peak RSS, which includes Node.js, tsx and the modules, and the step's input (both under "Results").`,
    `${met.length ? `**Met:** ${met.join(", ")}.` : "**No goal is met.**"} ${missed.length ? `**Missed:** ${missed.join(", ")}.` : "**Every goal is met.**"}`,
    table(header, [
      row(`Rules engine, ${n} entries, ${ruleNames.federal_weekly}`, s.federal, before.federal),
      row(`Rules engine, ${n} entries, ${ruleNames.daily_weekly_seventh_day}`, s.daily, before.daily),
      row(`XLSX export of the ${n}-entry period (compute + write)`, s.whole, before.export),
    ]),
    ...(run.shape.entries === 100_000 ? [sinceBefore(s)] : []),
  ].join("\n\n");
}

function resultsTables(run: PayrollRun) {
  const s = allSeries(run);
  const ordered = [s.federal, s.daily, s.compute, s.write, s.whole];
  const range = (values: number[], f: (v: number) => string) => (values.length > 1 ? `${f(median(values))} (${f(Math.min(...values))}–${f(Math.max(...values))})` : f(values[0]!));
  const medians = table(
    ["Step", "Time (s)", "Peak RSS (MiB)", "Peak heap used (MiB)", "RSS of Node.js and the modules / at the step's start (MiB)"],
    ordered.map((x) => [x.name, range(x.seconds, s2), range(x.peakRss, m0), range(x.peakHeap, m0), `${m0(median(x.baselineRss))} / ${m0(median(x.startRss))}`]),
  );
  const each = table(
    ["Step", ...Array.from({ length: run.runs }, (_, i) => `Run ${i + 1}: s / RSS / heap (MiB)`)],
    ordered.map((x) => [x.name, ...x.seconds.map((sec, i) => `${s2(sec)} / ${m0(x.peakRss[i]!)} / ${m0(x.peakHeap[i]!)}`)]),
  );
  const loads = run.machine.loadAverages.map((l) => l.toFixed(2)).join(", ");
  return `Median (range) of ${run.runs} runs. The peak RSS of a compute or write step is the process's high-water mark at the end of that step, so the write's is the whole export's.\n\n${medians}\n\nEach run:\n\n${each}\n\nThe host's 1-minute load average after each round: ${loads} (the bench itself keeps about one core busy).`;
}

function dataTable(run: PayrollRun) {
  const rows = (["federal_weekly", "daily_weekly_seventh_day"] as const).map((rules) => {
    const t = run.engine.find((e) => e.rules === rules)!.result.totals;
    const pct = (m: number) => `${((100 * m) / t.workedMinutes).toFixed(1)} %`;
    return [ruleNames[rules], count(Math.round(t.workedMinutes / 60)), pct(t.regularMinutes), pct(t.overtimeMinutes), pct(t.doubleTimeMinutes), t.seventhDayWeeks, `$${count(Math.round(t.grossCents / 100))}`];
  });
  return table(["Rules", "Hours worked", "Regular", "Overtime", "Double time", "Weeks with the seventh-day rule", "Gross pay"], rows);
}

function workbookSection(run: PayrollRun) {
  const v = run.verified;
  const sizes = run.exports.map((e) => e.bytes);
  const [least, most] = [Math.min(...sizes), Math.max(...sizes)];
  const size = `${(most / 2 ** 20).toFixed(1)} MiB (${count(least)}${most > least ? `–${count(most)}` : ""} bytes)`;
  const rows = Object.entries(v.expectedRows).map(([sheet, lastRow]) => [sheet, count(lastRow), count(v.readBack?.sheets.find((x) => x.name === sheet)?.rows ?? 0)]);
  return [
    `The workbook is ${size}${most > least ? ", a few bytes apart between runs" : " in every run"}. One more run wrote it to a file and opened it with exceljs's streaming reader; the sheets, their last rows (header rows included) and the summary's gross total (${String(v.readBack?.totalGross ?? "?")}) are as computed. (Row 3 of the summary is blank, so the reader does not return it.)`,
    table(["Sheet", "Last row", "Rows read back"], rows),
    `The Entries sheet lists all ${count(v.listedEntries)} entries of the period, as many as the database holds for it (the bench fortnight is two whole workweeks, so none waits for the next period's file). ${count(v.noPaidTime)} of them round to no paid time; each is listed with 0 worked hours (${count(v.readBack?.zeroHourEntries ?? 0)} such rows read back), and ${count(v.readBack?.roundsToNothingNotes ?? 0)} say "Rounds to no paid time" first in the Note column (before any note of the entry's own).`,
    `The export's totals equal the rules engine's under the same rules (${ruleNames[exportRules]}) to the minute and the cent, in every run and in the file read back.`,
  ].join("\n\n");
}

function profileTable(run: PayrollRun) {
  const p = run.profiles!;
  const steps = [p.engine, p.compute, p.write];
  const origins = [...new Set(steps.flatMap((x) => Object.keys(x.byOrigin)))];
  const share = (x: (typeof steps)[number], o: string) => (x.byOrigin[o] ?? 0) / x.busyMs;
  const shown = origins.filter((o) => steps.some((x) => share(x, o) >= 0.01)).sort((a, b) => Math.max(...steps.map((x) => share(x, b))) - Math.max(...steps.map((x) => share(x, a))));
  const cell = (x: (typeof steps)[number], o: string) => (x.byOrigin[o] ? `${m0(x.byOrigin[o])} ms (${Math.round(100 * share(x, o))} %)` : "–");
  const rows = [...shown.map((o) => [o, ...steps.map((x) => cell(x, o))]), ["everything else", ...steps.map((x) => `${m0(x.busyMs - shown.reduce((t, o) => t + (x.byOrigin[o] ?? 0), 0))} ms`)], ["**busy in all**", ...steps.map((x) => `${m0(x.busyMs)} ms`)]];
  return [
    `One more run of the engine (${ruleNames[exportRules]}) and of the export under \`--cpu-prof\`; only the samples inside each step count, and the profiler slows the code, so read the shares. Time in Node.js or V8 is charged to the package (or workspace of ours) that called it; packages under 1 % everywhere are left out.`,
    table(["Package or workspace", "Rules engine", "Export: compute", "Export: writeWorkbook"], rows),
  ].join("\n\n");
}

type Goal = { name: string; measured: string; met: boolean; why: string };

/** The four goals, with the cause of a miss and the next step, from this run's own figures. */
function goalChecks(run: PayrollRun): Goal[] {
  const s = allSeries(run);
  const p = run.profiles;
  const share = (step: keyof NonNullable<typeof p>, ...names: string[]) => (p ? Math.round((100 * names.reduce((t, n) => t + (p[step].byOrigin[n] ?? 0), 0)) / p[step].busyMs) : 0);
  const worstRules = median(s.daily.peakRss) >= median(s.federal.peakRss) ? "daily_weekly_seventh_day" : "federal_weekly";
  const worst = worstRules === "federal_weekly" ? s.federal : s.daily;
  const engineSeconds = Math.max(median(s.federal.seconds), median(s.daily.seconds));
  const retained = median(run.engine.filter((e) => e.rules === worstRules).map((e) => e.result.retainedHeapMiB));
  const computeRss = median(s.compute.peakRss);
  return [
    {
      name: "rules engine time",
      measured: `${s2(engineSeconds)} s`,
      met: engineSeconds < goalSeconds,
      why: `${p ? `${share("engine", "packages/domain")} % of its CPU is our domain code, ${share("engine", "V8 garbage collector")} % garbage collection and ${share("engine", "luxon")} % luxon. ` : ""}*Next step:* a by-function profile of the engine; the calendar's date-string helpers (\`addDays\` parses and formats an ISO date on every call) were the hottest of ours after the luxon fix.`,
    },
    {
      name: "rules engine memory",
      measured: `${m0(median(worst.peakRss))} MiB`,
      met: median(worst.peakRss) < goalInMiB,
      why: `Of the peak, ${m0(median(worst.baselineRss))} MiB is Node.js, tsx and the modules before any data exists, ${m0(median(worst.startRss) - median(worst.baselineRss))} MiB the generated fortnight and the engine's input, and ${m0(median(worst.peakRss) - median(worst.startRss))} MiB what the step adds; its heap peaks at ${m0(median(worst.peakHeap))} MiB, and once collected the result still holds ${m0(retained)} MiB (a trace per entry with four \`Date\`s, an allocation per stretch of work, entry-id lists per day and per rate line). *Next step:* make the result smaller — instants as epoch milliseconds, the id lists built only where they are read — and settle whether the goal covers the whole process, as measured here, or what the engine adds to it.`,
    },
    {
      name: "export time",
      measured: `${s2(median(s.whole.seconds))} s`,
      met: median(s.whole.seconds) < goalSeconds,
      why: `Computing the period takes ${s2(median(s.compute.seconds))} s and writing the workbook ${s2(median(s.write.seconds))} s.${p ? ` In the profile, ${share("write", "exceljs")} % of the write's CPU is exceljs; of the compute, ${share("compute", "drizzle-orm", "mysql2")} % is reading rows (drizzle-orm, mysql2), ${share("compute", "packages/domain")} % our domain code (the rules engine) and ${share("compute", "V8 garbage collector")} % garbage collection.` : ""} The cells of a column already share one style object, so exceljs's style cache hits (the write took 11.1 s at 100,000 entries before that); what is left is exceljs's own cost for each of the ${count(14 * run.verified.listedEntries)} Entries cells. *Next step:* write the Entries sheet's XML straight into the zip (exceljs for the two small sheets only). On the compute side, \`loadEntryDtos\` maps every column of ${count(run.verified.listedEntries)} joined rows through drizzle; selecting only the columns the DTO needs, page by page, cuts both the time and the memory.`,
    },
    {
      name: "export memory",
      measured: `${m0(median(s.whole.peakRss))} MiB`,
      met: median(s.whole.peakRss) < goalInMiB,
      why: `The compute step alone reaches ${m0(computeRss)} MiB (heap ${m0(median(s.compute.peakHeap))} MiB): \`loadEntryDtos\` holds all the period's raw rows while it builds the DTOs, and the DTOs, the engine's input and its result are all alive when the engine finishes; \`writeWorkbook\` then adds ${m0(median(s.whole.peakRss) - computeRss)} MiB. *Next step:* read the entries in pages (by start time and id) so that only one page of raw rows is alive at a time, then the engine's memory steps above.`,
    },
  ];
}

export function renderMarkdown(run: PayrollRun): string {
  const m = run.machine;
  const t = run.engine[0]!.result;
  const staff = run.shape.entries / run.shape.perPerson;
  return [
    "## Payroll",
    `Last run: ${run.date}, by \`bench/payroll/run.ts\` (which \`npm run bench\` runs), ${Math.round(run.totalSeconds)} s in all. A quicker look that leaves this file alone: \`npx tsx bench/payroll/run.ts --entries=10000 --runs=1 --no-profile --no-doc\`.`,
    "### Goals",
    goals(run),
    ...goalChecks(run)
      .filter((g) => !g.met)
      .flatMap((g, i) => [...(i === 0 ? ["### Goals missed: the measured cause and the next step"] : []), `**${g.name[0]!.toUpperCase()}${g.name.slice(1)}: ${g.measured}.** ${g.why}`]),
    "### Results",
    resultsTables(run),
    "### What is measured",
    [
      `One fortnight, ${period.startDate} to ${period.endDate} (America/Chicago; it ends on the day the clocks spring forward), generated by \`bench/payroll/shifts.ts\`: ${count(staff)} invented staff ("Bench staff 1" …) with ${count(run.shape.entries)} closed entries, about ${run.shape.perPerson} each — four to seven working days a week, each day's session blocks clocked one by one, 3–14 h days, one day in ten starting in the evening (${count(t.totals.entriesPastMidnight)} entries run past midnight) — ${count(t.entriesWithBreaks)} of them with an unpaid break, and ${count(t.payRates)} pay rates (an engineer or assistant rate and a shop rate each, a quarter with a raise from the period's tenth day). Punches are rounded to the quarter hour.\n`,
      `- **Rules engine**: each run, in a fresh Node.js process, builds the engine's input the way \`computePeriod\` does (untimed), then times \`computeOvertime\` and \`summarisePayPeriod\` together, once per rule set, and checks the result: regular + overtime + double time = worked for every workweek, person and the period; each entry's allocations add up to its minutes; the period's totals are its workweeks'; every entry with time worked is paid.`,
      `- **XLSX export**: the fortnight is loaded once into a private MariaDB (port 3320, data in a temp dir, seeded with the demo studio first) under the ${ruleNames[exportRules]} rules, by multi-row INSERTs. **Loading took ${s2(run.loaded.seconds)} s** (${count(run.loaded.entries)} entries, ${count(run.loaded.breaks)} breaks) and is part of no measurement. Each run, in a fresh process, does what the export route does: \`loadPayroll\`, \`getPeriodRow\` and \`computePeriod\` (the "compute" step), then \`writeWorkbook\` streaming into a Writable that only counts the bytes (the "write" step).`,
      "- **Memory**: peak RSS is the kernel's high-water mark for the process (`process.resourceUsage().maxRSS`), read at the end of each step. Peak heap used is V8's own figure just before each garbage collection (`v8.GCProfiler`), when the heap is fullest, and at the step's start and end; a sampling timer could not see it, since the engine runs synchronously. RSS includes Node.js, the loaded modules and the input built before the step.",
      "- Runs go in rounds (each case once, then again), so a busy spell on the shared host is spread over the cases.",
    ].join("\n"),
    "### Machine",
    [`- CPU: ${m.cpus}`, `- RAM: ${m.memory}`, `- OS: ${m.os}`, `- Node.js ${m.node}`, `- MariaDB ${m.mariadb} (as scripts/lib/mariadb.mjs starts it), on the same cores as the bench`].join("\n"),
    "### What the data exercises",
    dataTable(run),
    "### The workbook",
    workbookSection(run),
    ...(run.profiles ? ["### Where the time goes", profileTable(run)] : []),
  ].join("\n\n");
}
