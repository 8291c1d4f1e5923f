import { describe, expect, it } from "vitest";
import { computeOvertime } from "./compute-overtime.ts";
import { days, priya, rate, sam, wrenfield } from "./test-fixtures.ts";
import type { OvertimeInput, PayrollSettings, WorkweekPay } from "./types.ts";

function onlyWeek(input: Partial<OvertimeInput> & Pick<OvertimeInput, "entries" | "payRates">, settings: Partial<PayrollSettings> = {}): WorkweekPay {
  const result = computeOvertime({ ...input, settings: { ...wrenfield, ...settings } });
  expect(result.workweeks).toHaveLength(1);
  const [week] = result.workweeks;
  if (!week) throw new Error("no workweek");
  return week;
}

const hoursOf = (w: WorkweekPay) => [w.regularMinutes / 60, w.overtimeMinutes / 60, w.doubleTimeMinutes / 60];

describe("federal weekly overtime", () => {
  // Wrenfield's workweek of Monday 2026-02-02; Priya at the source's $12 an hour.
  const fortySix = () => days(priya, "2026-02-02", [8, 8, 8, 8, 8, 6]);

  it("pays $588 for 46 hours at $12: 46 × 12 + 6 × 6 (29 CFR 778.110(a)) [S]", () => {
    const week = onlyWeek({ entries: fortySix(), payRates: [rate(priya, "engineer", 1200)] });
    expect(hoursOf(week)).toEqual([40, 6, 0]);
    expect(week.straightTimeCents).toBe(55_200);
    expect(week.overtimePremiumCents).toBe(3_600);
    expect(week.grossCents).toBe(58_800);
  });

  it("folds a $46 bonus into a $13 regular rate and pays $637 (29 CFR 778.110(b)) [S]", () => {
    const week = onlyWeek({
      entries: fortySix(),
      payRates: [rate(priya, "engineer", 1200)],
      bonuses: [{ staffId: priya, workday: "2026-02-05", cents: 4_600 }],
    });
    expect(week.regularRate?.centsPerHour).toBe(1_300);
    expect(week.overtimePremiumCents).toBe(3_900);
    expect(week.grossCents).toBe(63_700);
  });

  it("owes 10 h overtime for 30 h then 50 h: each workweek stands alone (29 CFR 778.104) [S]", () => {
    const result = computeOvertime({
      entries: [...days(priya, "2026-02-02", [6, 6, 6, 6, 6]), ...days(priya, "2026-02-09", [10, 10, 10, 10, 10])],
      payRates: [rate(priya, "engineer", 1200)],
      settings: wrenfield,
    });
    expect(result.workweeks.map(hoursOf)).toEqual([[30, 0, 0], [40, 10, 0]]);
    // [D] at the $12 of 778.110(a): 360 + (600 + 60) = $1,020 across the two weeks.
    expect(result.workweeks.map((w) => w.grossCents)).toEqual([36_000, 66_000]);
  });

  it("pays a bonus for a week with no hours as it stands, with no rate to derive (29 CFR 778.110(b) needs hours to divide by) [D]", () => {
    const week = onlyWeek({ entries: [], payRates: [], bonuses: [{ staffId: priya, workday: "2026-02-04", cents: 5_000 }] });
    expect(week.regularRate).toBeNull();
    expect(week.grossCents).toBe(5_000);
  });

  it("pays exactly 40 hours at straight time (29 CFR 778.107: overtime only over 40) [D]", () => {
    const week = onlyWeek({ entries: days(priya, "2026-02-02", [8, 8, 8, 8, 8]), payRates: [rate(priya, "engineer", 1200)] });
    expect(hoursOf(week)).toEqual([40, 0, 0]);
    expect(week.grossCents).toBe(48_000);
  });

  it("counts the last hours worked as the ones over 40 (29 CFR 778.107 applied in time order) [D]", () => {
    const week = onlyWeek({ entries: fortySix(), payRates: [rate(priya, "engineer", 1200)] });
    const overtime = week.allocations.filter((a) => a.category === "overtime");
    expect(overtime.map((a) => [a.workday, a.minutes, a.reason])).toEqual([["2026-02-07", 360, "over_40_in_workweek"]]);
  });
});

describe("the regular rate when two pay rates were worked (29 CFR 778.115)", () => {
  it("gives $14.00, a $56 premium and $728 for 40 h at $15 and 8 h at $9 (Univ. of Tennessee MTAS, Employee working two or more rates) [S]", () => {
    const week = onlyWeek({
      entries: [...days(sam, "2026-02-02", [8, 8, 8, 8, 8]), ...days(sam, "2026-02-07", [8], "assistant")],
      payRates: [rate(sam, "engineer", 1500), rate(sam, "assistant", 900)],
    });
    expect(week.straightTimeCents).toBe(67_200);
    expect(week.regularRate).toMatchObject({ centsPerHour: 1_400, weightedAverage: true, premiumBasis: "exact" });
    expect(week.overtimePremiumCents).toBe(5_600);
    expect(week.grossCents).toBe(72_800);
  });

  // 44.5 h at $10 as five days of 8 h 54 min, then 8 h at $8 on Saturday.
  const texas = (): Pick<OvertimeInput, "entries" | "payRates"> => ({
    entries: [...days(sam, "2026-02-02", [8.9, 8.9, 8.9, 8.9, 8.9]), ...days(sam, "2026-02-07", [8], "assistant")],
    payRates: [rate(sam, "engineer", 1000), rate(sam, "assistant", 800)],
  });

  it("gives a $60.60 premium for 12.5 h over 40 at half of $509 ÷ 52.5, unrounded (Texas Workforce Commission, Employees working two rates) [S]", () => {
    const week = onlyWeek(texas());
    expect(week.straightTimeCents).toBe(50_900);
    expect(week.overtimeMinutes).toBe(750);
    expect(week.regularRate?.centsPerHour).toBe(970);
    expect(week.overtimePremiumCents).toBe(6_060);
    expect(week.grossCents).toBe(56_960);
  });

  it("gives $60.63 when the studio rounds the regular rate to $9.70 before halving (Texas Workforce Commission) [S]", () => {
    const week = onlyWeek(texas(), { roundRegularRateToCent: true });
    expect(week.regularRate?.premiumBasis).toBe("rounded_to_cent");
    expect(week.overtimePremiumCents).toBe(6_063);
  });

  const oregon = (): Pick<OvertimeInput, "entries" | "payRates"> => ({
    entries: [...days(priya, "2026-02-02", [8, 8], "assistant"), ...days(priya, "2026-02-04", [10, 10, 10], "engineer")],
    payRates: [rate(priya, "assistant", 1000), rate(priya, "engineer", 1200)],
  });

  it("gives $11.30 and a $33.91 premium for 6 h over 40 from 16 h at $10 and 30 h at $12, unrounded (Oregon BOLI column) [S]", () => {
    const week = onlyWeek(oregon());
    expect(week.straightTimeCents).toBe(52_000);
    expect(week.regularRate?.centsPerHour).toBe(1_130);
    expect(week.overtimePremiumCents).toBe(3_391);
  });

  it("gives $33.90 from the rate first rounded to $11.30 (Oregon BOLI column) [S]", () => {
    expect(onlyWeek(oregon(), { roundRegularRateToCent: true }).overtimePremiumCents).toBe(3_390);
  });

  it("does not call one rate a weighted average (29 CFR 778.115 applies to two or more rates) [D]", () => {
    const week = onlyWeek({ entries: days(priya, "2026-02-02", [9, 9, 9, 9, 9]), payRates: [rate(priya, "engineer", 1500)] });
    expect(week.regularRate).toMatchObject({ centsPerHour: 1_500, weightedAverage: false });
  });
});
