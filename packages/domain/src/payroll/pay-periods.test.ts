import { describe, expect, it } from "vitest";
import { payPeriodContaining, payPeriodForWorkday, type PayPeriodSchedule } from "./pay-periods.ts";
import { localTime, wrenfield } from "./test-fixtures.ts";

const dates = (p: { startDate: string; endDate: string }) => `${p.startDate}..${p.endDate}`;

describe("weekly pay periods", () => {
  it("are Wrenfield's Monday-to-Sunday workweeks (29 CFR 778.105 workweek; weekly payroll as common practice) [P]", () => {
    expect(dates(payPeriodForWorkday("2026-02-04", { kind: "weekly" }, wrenfield))).toBe("2026-02-02..2026-02-08");
    expect(dates(payPeriodForWorkday("2026-02-08", { kind: "weekly" }, wrenfield))).toBe("2026-02-02..2026-02-08");
  });

  it("put 03:00 on a Monday into the previous week when the workweek starts Monday 06:00 (29 CFR 778.105: any day and hour) [D]", () => {
    const calendar = { ...wrenfield, workweekStart: { isoWeekday: 1 as const, hour: 6 } };
    const period = payPeriodContaining(localTime("2026-02-09T03:00"), { kind: "weekly" }, calendar);
    expect(dates(period)).toBe("2026-02-02..2026-02-08");
    expect(period.end).toEqual(localTime("2026-02-09T06:00"));
  });
});

describe("fortnightly pay periods", () => {
  const schedule: PayPeriodSchedule = { kind: "fortnightly", anchorDate: "2026-01-05" };

  it.each([
    ["2026-01-05", "2026-01-05..2026-01-18"],
    ["2026-01-18", "2026-01-05..2026-01-18"],
    ["2026-01-19", "2026-01-19..2026-02-01"],
    ["2026-12-31", "2026-12-21..2027-01-03"],
    ["2026-01-04", "2025-12-22..2026-01-04"],
  ])("put %s in %s, counting 14 days from the anchor either way (common practice) [P]", (day, expected) => {
    expect(dates(payPeriodForWorkday(day, schedule, wrenfield))).toBe(expected);
  });

  it("span the clock change in March as 14 workdays one real hour short (IANA America/Chicago) [D]", () => {
    const period = payPeriodForWorkday("2026-03-08", { kind: "fortnightly", anchorDate: "2026-03-02" }, wrenfield);
    expect((period.end.getTime() - period.start.getTime()) / 3_600_000).toBe(14 * 24 - 1);
  });
});

describe("semi-monthly pay periods", () => {
  it.each([
    ["2026-01-15", "2026-01-01..2026-01-15"],
    ["2026-01-16", "2026-01-16..2026-01-31"],
    ["2026-02-20", "2026-02-16..2026-02-28"],
    ["2024-02-20", "2024-02-16..2024-02-29"],
    ["2026-04-30", "2026-04-16..2026-04-30"],
  ])("put %s in %s: 1st–15th and 16th–month end (common practice) [P]", (day, expected) => {
    expect(dates(payPeriodForWorkday(day, { kind: "semi_monthly" }, wrenfield))).toBe(expected);
  });

  it("judge 23:30 on the 15th by Wrenfield's clock although UTC has reached the 16th (common practice, computed in America/Chicago) [D]", () => {
    const lateOnThe15th = localTime("2026-01-15T23:30");
    expect(lateOnThe15th.toISOString()).toBe("2026-01-16T05:30:00.000Z");
    const period = payPeriodContaining(lateOnThe15th, { kind: "semi_monthly" }, wrenfield);
    expect(dates(period)).toBe("2026-01-01..2026-01-15");
    expect(period.start).toEqual(new Date("2026-01-01T06:00:00Z"));
    expect(period.end).toEqual(new Date("2026-01-16T06:00:00Z"));
  });

  it("end at local midnight after the clocks went forward, five hours behind UTC instead of six (IANA America/Chicago) [D]", () => {
    const period = payPeriodForWorkday("2026-03-10", { kind: "semi_monthly" }, wrenfield);
    expect(period.start).toEqual(new Date("2026-03-01T06:00:00Z"));
    expect(period.end).toEqual(new Date("2026-03-16T05:00:00Z"));
  });

  it("refuse a date that is not a calendar date", () => {
    expect(() => payPeriodForWorkday("2026-02-30", { kind: "semi_monthly" }, wrenfield)).toThrow(RangeError);
  });
});
