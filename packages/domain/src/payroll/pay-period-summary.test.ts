import { describe, expect, it } from "vitest";
import { computeOvertime } from "./compute-overtime.ts";
import { summarisePayPeriod } from "./pay-period-summary.ts";
import { payPeriodForWorkday } from "./pay-periods.ts";
import { days, jo, priya, rate, wrenfield } from "./test-fixtures.ts";

// January 2026 at Wrenfield: Priya 40 h in the week of the 5th, 45 h in the week of the 12th
// (which straddles the 15th), 8 h in the week of the 19th; Jo 6 h on the 14th.
const result = computeOvertime({
  entries: [
    ...days(priya, "2026-01-05", [8, 8, 8, 8, 8]),
    ...days(priya, "2026-01-12", [8, 8, 8, 8, 8, 5]),
    ...days(priya, "2026-01-19", [8]),
    ...days(jo, "2026-01-14", [6], "assistant"),
  ],
  payRates: [rate(priya, "engineer", 2000), rate(jo, "assistant", 1600)],
  settings: wrenfield,
});

describe("summarisePayPeriod", () => {
  it("adds up the two workweeks of a fortnight, overtime kept per week (29 CFR 778.104: each workweek stands alone) [D]", () => {
    const period = payPeriodForWorkday("2026-01-10", { kind: "fortnightly", anchorDate: "2026-01-05" }, wrenfield);
    const summary = summarisePayPeriod(period, result.workweeks);
    const totals = summary.staff.find((s) => s.staffId === priya);
    expect(totals?.workweekStarts).toEqual(["2026-01-05", "2026-01-12"]);
    expect([totals?.regularMinutes, totals?.overtimeMinutes]).toEqual([80 * 60, 5 * 60]);
    // [D] 85 h × $20 + 5 h × $10 = $1,750.
    expect(totals?.grossCents).toBe(175_000);
    expect(summary.staff.map((s) => s.staffId)).toEqual([jo, priya]);
  });

  it("pays a semi-monthly period's straddling workweek whole in the period it closes in (29 CFR 778.106: overtime due on the next payday after the week) [D]", () => {
    const first = summarisePayPeriod(payPeriodForWorkday("2026-01-15", { kind: "semi_monthly" }, wrenfield), result.workweeks);
    const second = summarisePayPeriod(payPeriodForWorkday("2026-01-16", { kind: "semi_monthly" }, wrenfield), result.workweeks);
    expect(first.staff.map((s) => [s.staffId, s.workweekStarts])).toEqual([[priya, ["2026-01-05"]]]);
    const priyaSecond = second.staff.find((s) => s.staffId === priya);
    expect(priyaSecond?.workweekStarts).toEqual(["2026-01-12", "2026-01-19"]);
    expect(priyaSecond?.workweeksBegunEarlier).toEqual(["2026-01-12"]);
    expect(priyaSecond?.overtimeMinutes).toBe(300);
    // Jo's hours on the 14th fall in a week that closes on the 18th.
    expect(second.staff.find((s) => s.staffId === jo)?.workedMinutes).toBe(360);
  });

  it("keeps hours and money equal to the sum of its workweeks (conservation of hours) [D]", () => {
    const period = payPeriodForWorkday("2026-01-20", { kind: "semi_monthly" }, wrenfield);
    const totals = summarisePayPeriod(period, result.workweeks).staff.find((s) => s.staffId === priya);
    expect(totals && totals.regularMinutes + totals.overtimeMinutes + totals.doubleTimeMinutes).toBe(totals?.workedMinutes);
    expect(totals && totals.straightTimeCents + totals.bonusCents + totals.overtimePremiumCents + totals.doubleTimePremiumCents).toBe(totals?.grossCents);
  });
});
