import { describe, expect, it } from "vitest";
import { formatPeriod, paidDays } from "./period-format.ts";

describe("the days a pay period pays", () => {
  it("is the period itself when it is made of whole workweeks", () => {
    expect(paidDays("2026-11-30", "2026-12-06", 1)).toEqual({ from: "2026-11-30", to: "2026-12-06" });
  });

  // docs/payroll-export.md: a workweek straddling two periods is paid whole in the one holding its last day.
  it("takes in the workweek begun before a twice-monthly period, and leaves the one that runs past its end", () => {
    // 1–15 Dec 2026: Tue 1 Dec is in the week of Mon 30 Nov; Mon 14 Dec starts a week ending Sun 20 Dec.
    expect(paidDays("2026-12-01", "2026-12-15", 1)).toEqual({ from: "2026-11-30", to: "2026-12-13" });
  });

  it("names periods across months and years", () => {
    expect(formatPeriod("2026-12-28", "2027-01-03")).toBe("28 Dec 2026 – 3 Jan 2027");
    expect(formatPeriod("2026-12-01", "2026-12-15")).toBe("1–15 Dec 2026");
  });
});
