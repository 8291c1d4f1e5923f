import { describe, expect, it } from "vitest";
import { computeOvertime } from "./compute-overtime.ts";
import { californiaStyle, days, jo, priya, rate, shift } from "./test-fixtures.ts";
import type { TimeEntry, WorkweekPay } from "./types.ts";

// Wrenfield tried with the daily, weekly and seventh-day rule set; workweek Mon 2026-02-02 – Sun 02-08.
function weeksOf(entries: TimeEntry[], centsPerHour = 2000): WorkweekPay[] {
  return computeOvertime({
    entries,
    payRates: [rate(priya, "engineer", centsPerHour), rate(jo, "assistant", centsPerHour)],
    settings: californiaStyle,
  }).workweeks;
}

function onlyWeek(entries: TimeEntry[], centsPerHour = 2000): WorkweekPay {
  const weeks = weeksOf(entries, centsPerHour);
  expect(weeks).toHaveLength(1);
  const [week] = weeks;
  if (!week) throw new Error("no workweek");
  return week;
}

const split = (w: WorkweekPay) => [w.regularMinutes / 60, w.overtimeMinutes / 60, w.doubleTimeMinutes / 60];
const minutesBy = (w: WorkweekPay, reason: string) =>
  w.allocations.filter((a) => a.reason === reason).reduce((s, a) => s + a.minutes, 0);

describe("daily, weekly and seventh-day overtime (California Labor Code §510(a))", () => {
  it("splits 14 h in one day into 8 regular, 4 at 1.5× and 2 at 2× (Lab. Code §510(a)) [D]", () => {
    const week = onlyWeek(days(priya, "2026-02-02", [14]));
    expect(split(week)).toEqual([8, 4, 2]);
    // [D] at $20: 8 × 20 + 4 × 30 + 2 × 40 = $360.
    expect(week.grossCents).toBe(36_000);
  });

  it("splits 10 h × 5 days into 40 / 10 / 0 (Lab. Code §510(a)) [D]", () => {
    expect(split(onlyWeek(days(priya, "2026-02-02", [10, 10, 10, 10, 10])))).toEqual([40, 10, 0]);
  });

  it("splits 8 h Mon–Sat then 9 h on day 7 into 40 / 16 / 1 (Lab. Code §510(a); Monzon v. Schaefer Ambulance, secondary source) [D]", () => {
    const week = onlyWeek(days(priya, "2026-02-02", [8, 8, 8, 8, 8, 8, 9]));
    expect(split(week)).toEqual([40, 16, 1]);
    expect(week.seventhDayRuleApplied).toBe(true);
    // Saturday's 8 h are over 40 in the week; Sunday's first 8 are 1.5× and its 9th 2×.
    expect(minutesBy(week, "over_40_in_workweek")).toBe(480);
    expect(week.allocations.filter((a) => a.workday === "2026-02-07").map((a) => a.reason)).toEqual(["over_40_in_workweek"]);
    expect(minutesBy(week, "seventh_day_first_8")).toBe(480);
    expect(minutesBy(week, "seventh_day_over_8")).toBe(60);
  });

  it("splits 9 h × 5 days + 6 h on day 6 into 40 / 11 / 0: 5 daily and 6 weekly, 51 in and 51 out (Lab. Code §510(a); Monzon v. Schaefer Ambulance) [D]", () => {
    const week = onlyWeek(days(priya, "2026-02-02", [9, 9, 9, 9, 9, 6]));
    expect(split(week)).toEqual([40, 11, 0]);
    expect(minutesBy(week, "over_8_in_workday")).toBe(300);
    expect(minutesBy(week, "over_40_in_workweek")).toBe(360);
    expect(week.workedMinutes).toBe(51 * 60);
  });

  it("pays a short seventh day wholly at 1.5× even under 40 h in the week (Lab. Code §510(a): first 8 h on the seventh day) [D]", () => {
    const week = onlyWeek(days(priya, "2026-02-02", [4, 4, 4, 4, 4, 4, 3]));
    expect(split(week)).toEqual([24, 3, 0]);
  });

  it("pays 2× after 8 h on the seventh day, not only after 12 (Lab. Code §510(a)) [D]", () => {
    expect(split(onlyWeek(days(priya, "2026-02-02", [1, 1, 1, 1, 1, 1, 13])))).toEqual([6, 8, 5]);
  });

  it("gives no seventh-day premium for a Sunday after a day off in the week (Lab. Code §510(a): seventh consecutive day in the workweek) [D]", () => {
    const week = onlyWeek(days(priya, "2026-02-02", [8, 8, 0, 8, 8, 8, 9]));
    expect(week.seventhDayRuleApplied).toBe(false);
    expect(split(week)).toEqual([40, 9, 0]);
  });

  it("does not carry a run of seven days across two workweeks (Lab. Code §510(a): \"the seventh day of work in any one workweek\", REFERENCES.md [S]; §500(b): a workweek is a fixed seven days starting the same day each week, from memory [M]) [D]", () => {
    const weeks = weeksOf(days(priya, "2026-02-05", [8, 8, 8, 8, 8, 8, 8]));
    expect(weeks.map((w) => w.seventhDayRuleApplied)).toEqual([false, false]);
    expect(weeks.map(split)).toEqual([[32, 0, 0], [24, 0, 0]]);
  });

  it("pays a shift from 20:00 to 06:00 as 4 h and 6 h on two workdays, with no daily overtime (Lab. Code §510(a); workday = local calendar day) [D]", () => {
    const week = onlyWeek([shift(jo, "2026-02-03T20:00", 600, { rateCode: "assistant" })]);
    expect(week.days.map((d) => [d.workday, d.workedMinutes])).toEqual([["2026-02-03", 240], ["2026-02-04", 360]]);
    expect(split(week)).toEqual([10, 0, 0]);
  });

  it("pays the double-time hours the whole regular rate again, so a two-rate week uses the weighted rate (Lab. Code §510(a); 29 CFR 778.115 method) [D]", () => {
    const week = computeOvertime({
      entries: [
        shift(jo, "2026-02-02T08:00", 480, { rateCode: "assistant" }),
        shift(jo, "2026-02-02T16:00", 360, { rateCode: "engineer" }),
      ],
      payRates: [rate(jo, "assistant", 1800), rate(jo, "engineer", 2400)],
      settings: californiaStyle,
    }).workweeks[0];
    // $288 ÷ 14 h = $20.5714…; 4 h × half of it = $41.14, and 2 h × all of it = $41.14 too.
    expect(week?.straightTimeCents).toBe(28_800);
    expect(week?.overtimePremiumCents).toBe(4_114);
    expect(week?.doubleTimePremiumCents).toBe(4_114);
    expect(week?.grossCents).toBe(37_028);
  });
});
