// The engine case, in its own process: the pure rules engine over the generated fortnight, called
// as computePeriod calls it (computeOvertime, then summarisePayPeriod), then checked.
//   tsx bench/payroll/engine-case.ts <rules> <entries> <per-person>
import { computeOvertime, summarisePayPeriod, type OvertimeRuleSet } from "@takeup/domain";
import { checkConservation } from "./checks.ts";
import { engineRuleSets, period, settingsFor } from "./scenario.ts";
import { engineEntries, generateFortnight } from "./shifts.ts";
import { measureStep, report } from "./step.ts";

/** Node.js, tsx and the modules, before any data exists. */
const baselineRssMiB = process.memoryUsage().rss / 2 ** 20;
const [rules, entriesArg, perPersonArg] = process.argv.slice(2);
if (!engineRuleSets.includes(rules as OvertimeRuleSet)) throw new Error(`usage: engine-case.ts ${engineRuleSets.join("|")} <entries> <per-person>`);
const settings = settingsFor(rules as OvertimeRuleSet);
const data = generateFortnight(period, settings, { entries: Number(entriesArg ?? 100_000), perPerson: Number(perPersonArg ?? 100) });
const input = { entries: engineEntries(data.entries), payRates: data.payRates, settings };

const { value, step } = await measureStep(() => {
  const result = computeOvertime(input);
  return { result, summary: summarisePayPeriod(period, result.workweeks) };
});
// What the result keeps, once the garbage of the step is collected (child.ts runs cases with --expose-gc).
(globalThis as unknown as { gc: () => void }).gc();
const retainedHeapMiB = process.memoryUsage().heapUsed / 2 ** 20 - step.startHeapMiB;
const totals = checkConservation(value.result, value.summary);
if (totals.entriesComputed !== data.entries.length) throw new Error(`the engine traced ${totals.entriesComputed} of ${data.entries.length} entries`);
report({ step, baselineRssMiB, retainedHeapMiB, totals, payRates: data.payRates.length, entriesWithBreaks: data.entries.filter((e) => e.breaks.length > 0).length });
