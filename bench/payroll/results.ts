// A run's results as run.ts collects them, and the per-step series the report is built from.
import type { OvertimeRuleSet } from "@takeup/domain";
import type { PeriodTotals } from "./checks.ts";
import type { Loaded } from "./load.ts";
import type { StepProfile } from "./profile.ts";
import type { ReadBack } from "./read-back.ts";
import { goalMB, type Shape } from "./scenario.ts";
import type { StepResult } from "./step.ts";

export type EngineResult = { step: StepResult; baselineRssMiB: number; retainedHeapMiB: number; totals: PeriodTotals; payRates: number; entriesWithBreaks: number };
export type EngineRun = { rules: OvertimeRuleSet; round: number; result: EngineResult };
export type ExportResult = {
  baselineRssMiB: number;
  compute: StepResult;
  write: StepResult;
  bytes: number;
  listedEntries: number;
  noPaidTime: number;
  /** Entries that round to no paid time and have no note of their own, so the sheet says why. */
  expectedRows: Record<string, number>;
  totals: PeriodTotals;
  readBack: ReadBack | null;
};
export type PayrollRun = {
  date: string;
  machine: { cpus: string; memory: string; os: string; node: string; mariadb: string; loadAverages: number[] };
  shape: Shape;
  runs: number;
  loaded: Loaded;
  engine: EngineRun[];
  exports: ExportResult[];
  verified: ExportResult;
  profiles: { engine: StepProfile; compute: StepProfile; write: StepProfile } | null;
  totalSeconds: number;
};

/** The goal is in MB (10^6 bytes); Node.js and the kernel report memory in binary units, so the bench compares in MiB. */
export const goalInMiB = (goalMB * 1e6) / 2 ** 20;
export const ruleNames: Record<OvertimeRuleSet, string> = { federal_weekly: "federal weekly", daily_weekly_seventh_day: "daily, weekly and seventh-day" };
export const count = (n: number) => n.toLocaleString("en-US");

export function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}

/** One measured step across the rounds. */
export type Series = { name: string; seconds: number[]; peakRss: number[]; peakHeap: number[]; startRss: number[]; baselineRss: number[] };

const series = (name: string, steps: StepResult[], baselineRss: number[]): Series => ({
  name,
  baselineRss,
  seconds: steps.map((s) => s.seconds),
  peakRss: steps.map((s) => s.peakRssMiB),
  peakHeap: steps.map((s) => s.peakHeapMiB),
  startRss: steps.map((s) => s.startRssMiB),
});

export function allSeries(run: PayrollRun) {
  const engine = (rules: OvertimeRuleSet) => {
    const runs = run.engine.filter((e) => e.rules === rules).map((e) => e.result);
    return series(`Rules engine, ${ruleNames[rules]}`, runs.map((r) => r.step), runs.map((r) => r.baselineRssMiB));
  };
  const baseline = run.exports.map((e) => e.baselineRssMiB);
  const compute = series("Export: compute (loadPayroll, getPeriodRow, computePeriod)", run.exports.map((e) => e.compute), baseline);
  const write = series("Export: writeWorkbook", run.exports.map((e) => e.write), baseline);
  // One request: the times add up, the peaks are the higher of the two steps.
  const whole: Series = {
    name: "**Export: both**",
    seconds: compute.seconds.map((s, i) => s + write.seconds[i]!),
    peakRss: write.peakRss,
    peakHeap: compute.peakHeap.map((h, i) => Math.max(h, write.peakHeap[i]!)),
    startRss: compute.startRss,
    baselineRss: baseline,
  };
  return { federal: engine("federal_weekly"), daily: engine("daily_weekly_seventh_day"), compute, write, whole };
}
