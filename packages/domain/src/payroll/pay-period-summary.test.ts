import { describe, expect, it } from "vitest";
import { computeOvertime } from "./compute-overtime.ts";
import { summarisePayPeriod } from "./pay-period-summary.ts";
import { payPeriodForWorkday } from "./pay-periods.ts";
import { days, jo, priya, rate, sam, wrenfield } from "./test-fixtures.ts";

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

  it("pays a straddling week's straight time where it was worked and its overtime where the week ends (29 CFR 778.106; Cal. Lab. Code §204(a) semi-monthly periods) [D]", () => {
    const first = summarisePayPeriod(payPeriodForWorkday("2026-01-15", { kind: "semi_monthly" }, wrenfield), result.workweeks);
    const second = summarisePayPeriod(payPeriodForWorkday("2026-01-16", { kind: "semi_monthly" }, wrenfield), result.workweeks);
    const priyaFirst = first.staff.find((s) => s.staffId === priya);
    expect(priyaFirst?.workweekStarts).toEqual(["2026-01-05", "2026-01-12"]);
    expect(priyaFirst?.workweeksStillOpen).toEqual(["2026-01-12"]);
    // [D] 40 h in the week of the 5th + Mon–Thu 12–15 Jan, 32 h, all at $20: $1,440, no premium yet.
    expect([priyaFirst?.workedMinutes, priyaFirst?.overtimePremiumCents, priyaFirst?.grossCents]).toEqual([72 * 60, 0, 144_000]);
    const priyaSecond = second.staff.find((s) => s.staffId === priya);
    expect(priyaSecond?.workweekStarts).toEqual(["2026-01-12", "2026-01-19"]);
    expect(priyaSecond?.workweeksBegunEarlier).toEqual(["2026-01-12"]);
    // [D] Fri 16 + Sat 17 (13 h, the last 5 of them overtime) + 8 h on the 19th: 21 h × $20 + 5 h × $10 = $470.
    expect([priyaSecond?.workedMinutes, priyaSecond?.overtimeMinutes, priyaSecond?.grossCents]).toEqual([21 * 60, 300, 47_000]);
    // Jo's 6 h on the 14th are paid in the period they were worked in.
    expect(first.staff.find((s) => s.staffId === jo)?.workedMinutes).toBe(360);
    expect(second.staff.find((s) => s.staffId === jo)).toBeUndefined();
  });

  it("pays 40 h Mon 12 – Fri 16 Jan 2026 at $20/h as $640 in the 1–15 Jan period and $160 in the 16–31 Jan period, not $0 and $800 (29 CFR 778.106; REFERENCES.md) [D]", () => {
    const week = computeOvertime({ entries: days(sam, "2026-01-12", [8, 8, 8, 8, 8]), payRates: [rate(sam, "engineer", 2000)], settings: wrenfield });
    const paid = ["2026-01-15", "2026-01-16"].map((day) =>
      summarisePayPeriod(payPeriodForWorkday(day, { kind: "semi_monthly" }, wrenfield), week.workweeks).staff.find((s) => s.staffId === sam),
    );
    expect(paid.map((s) => [s?.workedMinutes, s?.grossCents])).toEqual([[32 * 60, 64_000], [8 * 60, 16_000]]);
    expect(paid[0]?.workweeksStillOpen).toEqual(["2026-01-12"]);
    expect(paid[1]?.workweeksBegunEarlier).toEqual(["2026-01-12"]);
  });

  it("never loses or adds a cent when a week at an odd rate is split between two periods (conservation) [D]", () => {
    // 7 min at $19.99 a day: each day's part rounds, the closing period pays what is left.
    const week = computeOvertime({ entries: days(sam, "2026-01-12", [7 / 60, 7 / 60, 7 / 60, 7 / 60, 7 / 60]), payRates: [rate(sam, "engineer", 1999)], settings: wrenfield });
    const paid = ["2026-01-15", "2026-01-16"].map(
      (day) => summarisePayPeriod(payPeriodForWorkday(day, { kind: "semi_monthly" }, wrenfield), week.workweeks).staff.find((s) => s.staffId === sam)?.grossCents ?? 0,
    );
    expect(paid[0]! + paid[1]!).toBe(week.workweeks[0]?.grossCents);
  });

  it("keeps hours and money equal to the sum of its workweeks (conservation of hours) [D]", () => {
    const period = payPeriodForWorkday("2026-01-20", { kind: "semi_monthly" }, wrenfield);
    const totals = summarisePayPeriod(period, result.workweeks).staff.find((s) => s.staffId === priya);
    expect(totals && totals.regularMinutes + totals.overtimeMinutes + totals.doubleTimeMinutes).toBe(totals?.workedMinutes);
    expect(totals && totals.straightTimeCents + totals.bonusCents + totals.overtimePremiumCents + totals.doubleTimePremiumCents).toBe(totals?.grossCents);
  });
});
