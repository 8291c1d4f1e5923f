import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { computeOvertime } from "./compute-overtime.ts";
import { days, localTime, priya, rate, shift, wrenfield } from "./test-fixtures.ts";
import type { IsoWeekday, OvertimeInput, OvertimeRuleSet, PayrollSettings, PunchRounding, TimeEntry } from "./types.ts";

/**
 * Random fortnights of Priya's work at Wrenfield. Each entry lives in its own window of six
 * real hours counted from Monday 04:00 local, so no two entries overlap and one window a
 * day crosses midnight. Two of the fortnights hold a daylight-saving change.
 */
const hourMs = 3_600_000;
const fortnights = ["2026-02-02", "2026-03-02", "2026-10-26"];
const windows = 14 * 4;

interface EntrySpec {
  window: number;
  offsetSeconds: number;
  durationSeconds: number;
  assistant: boolean;
  breakKind: "none" | "interval" | "minutes";
  breakShare: number;
}

const entrySpec = fc.record({
  offsetSeconds: fc.integer({ min: 0, max: 3_600 }),
  // Mostly long stretches, so days pass 8 and 12 hours and weeks pass 40.
  durationSeconds: fc.oneof(
    { arbitrary: fc.integer({ min: 0, max: 18_000 }), weight: 1 },
    { arbitrary: fc.integer({ min: 14_000, max: 18_000 }), weight: 2 },
  ),
  assistant: fc.boolean(),
  breakKind: fc.constantFrom("none" as const, "interval" as const, "minutes" as const),
  breakShare: fc.double({ min: 0, max: 0.5, noNaN: true }),
});

/** Each window is worked with probability `load` %, so light and heavy fortnights both appear. */
const specsArb = fc
  .tuple(
    fc.integer({ min: 15, max: 100 }),
    fc.array(fc.tuple(fc.integer({ min: 0, max: 99 }), entrySpec), { minLength: windows, maxLength: windows }),
  )
  .map(([load, slots]) =>
    slots.flatMap(([draw, spec], window): EntrySpec[] => (draw < load ? [{ window, ...spec }] : [])),
  );

function toEntry(spec: EntrySpec, fortnight: string): TimeEntry {
  const base = localTime(`${fortnight}T04:00`).getTime();
  const startMs = base + spec.window * 6 * hourMs + spec.offsetSeconds * 1000;
  const endMs = startMs + spec.durationSeconds * 1000;
  const entry: TimeEntry = {
    id: `w${spec.window}`,
    staffId: priya,
    start: new Date(startMs),
    end: new Date(endMs),
    rateCode: spec.assistant ? "assistant" : "engineer",
  };
  const breakSeconds = Math.floor(spec.durationSeconds * spec.breakShare);
  if (spec.breakKind === "interval") {
    const breakStart = startMs + Math.floor((spec.durationSeconds - breakSeconds) / 2) * 1000;
    return { ...entry, unpaidBreaks: [{ start: new Date(breakStart), end: new Date(breakStart + breakSeconds * 1000) }] };
  }
  // Rounding can shorten an entry by up to one 15-minute step; keep the break inside that.
  const fits = Math.max(0, Math.floor(spec.durationSeconds / 60) - 16);
  return spec.breakKind === "minutes" ? { ...entry, unpaidBreaks: Math.min(fits, Math.floor(breakSeconds / 60)) } : entry;
}

const settingsArb = (rules: fc.Arbitrary<OvertimeRuleSet>) =>
  fc.record({
    timeZone: fc.constant(wrenfield.timeZone),
    workweekStart: fc.record({
      isoWeekday: fc.integer({ min: 1, max: 7 }).map((d) => d as IsoWeekday),
      hour: fc.integer({ min: 0, max: 23 }),
    }),
    punchRounding: fc.constantFrom<PunchRounding>("none", "5", "6", "15"),
    overtimeRules: rules,
    roundRegularRateToCent: fc.boolean(),
  });

const weekArb = (rules: fc.Arbitrary<OvertimeRuleSet>) =>
  fc.record({
    fortnight: fc.constantFrom(...fortnights),
    settings: settingsArb(rules),
    engineerCents: fc.integer({ min: 800, max: 10_000 }),
    assistantCents: fc.integer({ min: 800, max: 10_000 }),
    bonusCents: fc.integer({ min: 0, max: 50_000 }),
    specs: specsArb,
    /** Which entry the monotonicity checks take away. */
    pick: fc.nat(),
  });

type Week = { fortnight: string; settings: PayrollSettings; engineerCents: number; assistantCents: number; bonusCents: number };

function input(week: Week, specs: readonly EntrySpec[], sameRate = false): OvertimeInput {
  return {
    entries: specs.map((s) => toEntry(s, week.fortnight)),
    payRates: [
      rate(priya, "engineer", week.engineerCents),
      rate(priya, "assistant", sameRate ? week.engineerCents : week.assistantCents),
    ],
    settings: week.settings,
    bonuses: week.bonusCents > 0 ? [{ staffId: priya, workday: week.fortnight, cents: week.bonusCents }] : [],
  };
}

const withoutOne = <T>(list: readonly T[], pick: number) => list.filter((_, i) => i !== pick % Math.max(1, list.length));

const grossOf = (i: OvertimeInput) => computeOvertime(i).workweeks.reduce((s, w) => s + w.grossCents, 0);

describe("the random fortnights", () => {
  it("reach daily and weekly overtime, double time and the seventh day often enough to test them, and light weeks too", () => {
    const results = fc
      .sample(weekArb(fc.constant<OvertimeRuleSet>("daily_weekly_seventh_day")), { numRuns: 100, seed: 20260202 })
      .map((week) => computeOvertime(input(week, week.specs)).workweeks);
    const share = (test: (reasons: Set<string>) => boolean) =>
      results.filter((weeks) => test(new Set(weeks.flatMap((w) => w.allocations.map((a) => a.reason))))).length;
    expect(share((r) => r.has("over_8_in_workday"))).toBeGreaterThan(30);
    expect(share((r) => r.has("over_12_in_workday"))).toBeGreaterThan(10);
    expect(share((r) => r.has("over_40_in_workweek"))).toBeGreaterThan(10);
    expect(share((r) => r.has("seventh_day_first_8"))).toBeGreaterThan(10);
    expect(share((r) => !r.has("seventh_day_first_8") && !r.has("over_40_in_workweek"))).toBeGreaterThan(10);
  });
});

describe("conservation of hours (regular + overtime + double time = minutes worked)", () => {
  it.each(["federal_weekly", "daily_weekly_seventh_day"] as const)(
    "holds for every workweek, day and entry under %s (29 CFR 778.104 / Lab. Code §510(a): an hour is counted once) [D]",
    (rules) => {
      fc.assert(
        fc.property(weekArb(fc.constant(rules)), (week) => {
          const result = computeOvertime(input(week, week.specs));
          for (const w of result.workweeks) {
            expect(w.regularMinutes + w.overtimeMinutes + w.doubleTimeMinutes).toBe(w.workedMinutes);
            expect(w.allocations.reduce((s, a) => s + a.minutes, 0)).toBe(w.workedMinutes);
            expect(w.days.reduce((s, d) => s + d.workedMinutes, 0)).toBe(w.workedMinutes);
            expect(w.regularMinutes).toBeLessThanOrEqual(40 * 60);
            if (rules === "daily_weekly_seventh_day") {
              for (const d of w.days) expect(d.regularMinutes).toBeLessThanOrEqual(8 * 60);
            }
            expect(w.straightTimeCents + w.bonusCents + w.overtimePremiumCents + w.doubleTimePremiumCents).toBe(w.grossCents);
          }
          for (const t of result.entries) {
            const allocated = result.workweeks.flatMap((w) => w.allocations).filter((a) => a.entryId === t.entryId);
            expect(allocated.reduce((s, a) => s + a.minutes, 0)).toBe(t.workedMinutes);
            expect(t.workedMinutes + t.breakMinutes).toBe((t.roundedEnd.getTime() - t.roundedStart.getTime()) / 60_000);
            for (const a of allocated) {
              expect(a.start >= t.roundedStart && a.end <= t.roundedEnd).toBe(true);
            }
          }
        }),
        { numRuns: 150 },
      );
    },
  );
});

describe("monotonicity (adding work never lowers gross pay)", () => {
  it("holds under federal weekly rules with two rates, a bonus and either rate-rounding setting (29 CFR 778.107, 778.110(b), 778.115 applied) [D]", () => {
    fc.assert(
      fc.property(weekArb(fc.constant("federal_weekly")), (week) => {
        const withExtra = input(week, week.specs);
        const without = input(week, withoutOne(week.specs, week.pick));
        expect(grossOf(withExtra)).toBeGreaterThanOrEqual(grossOf(without));
      }),
      { numRuns: 200 },
    );
  });

  it("holds under daily, weekly and seventh-day rules at one rate with no bonus (Lab. Code §510(a) applied) [D]", () => {
    fc.assert(
      fc.property(weekArb(fc.constant("daily_weekly_seventh_day")), (week) => {
        const single = { ...week, bonusCents: 0 };
        const withExtra = input(single, week.specs, true);
        const without = input(single, withoutOne(week.specs, week.pick), true);
        expect(grossOf(withExtra)).toBeGreaterThanOrEqual(grossOf(without));
      }),
      { numRuns: 200 },
    );
  });

  it("can fail under daily rules with two far-apart rates: a low-rate hour dilutes the weighted regular rate of a 14-hour day (29 CFR 778.115 method; Lab. Code §510(a)) [D]", () => {
    const settings: PayrollSettings = { ...wrenfield, overtimeRules: "daily_weekly_seventh_day" };
    const payRates = [rate(priya, "engineer", 5000), rate(priya, "assistant", 500)];
    const long = days(priya, "2026-02-02", [14]);
    const extra = shift(priya, "2026-02-03T09:00", 60, { rateCode: "assistant" });
    // 14 h at $50: $700 + $100 + $100 = $900. With the $5 hour the rate is $705 ÷ 15 h = $47,
    // so the premiums fall to $94 + $94 and gross to $893: adding an hour cost $7.
    expect(grossOf({ entries: long, payRates, settings })).toBe(90_000);
    expect(grossOf({ entries: [...long, extra], payRates, settings })).toBe(89_300);
  });
});
