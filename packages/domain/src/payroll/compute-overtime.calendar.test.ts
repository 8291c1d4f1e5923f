import { describe, expect, it } from "vitest";
import { computeOvertime } from "./compute-overtime.ts";
import { californiaStyle, jo, localTime, priya, rate, sam, shift, wrenfield } from "./test-fixtures.ts";
import type { OvertimeInput, PayrollSettings } from "./types.ts";

const rates = [rate(priya, "engineer", 2000), rate(sam, "engineer", 2500), rate(jo, "assistant", 1600)];
const run = (entries: OvertimeInput["entries"], settings: PayrollSettings = wrenfield) =>
  computeOvertime({ entries, payRates: rates, settings });
const perDay = (result: ReturnType<typeof run>) =>
  result.workweeks.flatMap((w) => w.days.map((d) => [d.workday, d.workedMinutes]));

describe("splitting entries on Wrenfield's calendar (America/Chicago)", () => {
  it("splits a session from 22:00 to 03:00 at local midnight (workday = local calendar day, our setting) [D]", () => {
    expect(perDay(run([shift(priya, "2026-02-03T22:00", 300)]))).toEqual([["2026-02-03", 120], ["2026-02-04", 180]]);
  });

  it("splits a Sunday-night session into two workweeks at Monday 00:00 (29 CFR 778.105: a fixed, recurring workweek) [D]", () => {
    const weeks = run([shift(priya, "2026-02-08T20:00", 480)]).workweeks;
    expect(weeks.map((w) => [w.workweekStart, w.workedMinutes])).toEqual([["2026-02-02", 240], ["2026-02-09", 240]]);
  });

  it("keeps that session in one workweek when the week starts Monday 06:00 (29 CFR 778.105: any day and hour the employer sets) [D]", () => {
    const calendar = { ...wrenfield, workweekStart: { isoWeekday: 1 as const, hour: 6 } };
    const weeks = run([shift(priya, "2026-02-08T20:00", 480)], calendar).workweeks;
    expect(weeks.map((w) => [w.workweekStart, w.workedMinutes])).toEqual([["2026-02-02", 480]]);
    expect(weeks[0]?.end).toEqual(localTime("2026-02-09T06:00"));
  });

  it("pays 22:00–06:00 across the autumn clock change as the 9 real hours worked, 2 h Saturday and 7 h Sunday (IANA America/Chicago) [D]", () => {
    const entry = { id: "fall", staffId: priya, start: localTime("2026-10-31T22:00"), end: localTime("2026-11-01T06:00"), rateCode: "engineer" };
    expect(perDay(run([entry]))).toEqual([["2026-10-31", 120], ["2026-11-01", 420]]);
  });

  it("pays 22:00–06:00 across the spring clock change as 7 real hours, 2 h Saturday and 5 h Sunday (IANA America/Chicago) [D]", () => {
    const entry = { id: "spring", staffId: priya, start: localTime("2026-03-07T22:00"), end: localTime("2026-03-08T06:00"), rateCode: "engineer" };
    expect(perDay(run([entry]))).toEqual([["2026-03-07", 120], ["2026-03-08", 300]]);
  });

  it("keeps all 25 hours of the day the clocks go back in one workday (our choice: a workday is the local day; Lab. Code §510(a) rules applied) [D]", () => {
    const entry = { id: "long", staffId: priya, start: localTime("2026-11-01T00:00"), end: localTime("2026-11-02T00:00"), rateCode: "engineer" };
    const week = run([entry], californiaStyle).workweeks[0];
    expect(week?.days.map((d) => [d.workday, d.workedMinutes])).toEqual([["2026-11-01", 1500]]);
    expect([week?.regularMinutes, week?.overtimeMinutes, week?.doubleTimeMinutes]).toEqual([480, 240, 780]);
  });

  it("makes the workweek holding the autumn clock change 169 real hours long, seven local days (29 CFR 778.105 read on the studio's wall clock, our choice) [D]", () => {
    const week = run([shift(priya, "2026-10-28T10:00", 60)]).workweeks[0];
    expect(week && (week.end.getTime() - week.start.getTime()) / 3_600_000).toBe(169);
  });

  it("keeps each employee's weeks apart and lists them by staff id", () => {
    const weeks = run([shift(sam, "2026-02-02T10:00", 60), shift(priya, "2026-02-02T10:00", 90)]).workweeks;
    expect(weeks.map((w) => [w.staffId, w.workedMinutes])).toEqual([[priya, 90], [sam, 60]]);
  });
});

describe("unpaid breaks", () => {
  it("removes a recorded meal on the day it was taken, here after midnight (our rule: breaks stay where they fell) [P]", () => {
    const entry = shift(priya, "2026-02-03T20:00", 600, {
      unpaidBreaks: [{ start: localTime("2026-02-04T01:00"), end: localTime("2026-02-04T01:30") }],
    });
    const result = run([entry]);
    expect(perDay(result)).toEqual([["2026-02-03", 240], ["2026-02-04", 330]]);
    expect(result.entries[0]).toMatchObject({ breakMinutes: 30, workedMinutes: 570 });
  });

  it("centres a break recorded only as minutes on the entry, so 19:00–05:00 less 60 min loses 30 min each side of midnight (our rule) [P]", () => {
    expect(perDay(run([shift(priya, "2026-02-03T19:00", 600, { unpaidBreaks: 60 })]))).toEqual([["2026-02-03", 270], ["2026-02-04", 270]]);
  });

  it("does not put breaks on the punch grid, only on the whole minute (29 CFR 785.48(b) speaks of starting and stopping times) [P]", () => {
    const entry = {
      id: "day",
      staffId: priya,
      start: localTime("2026-02-03T08:00"),
      end: localTime("2026-02-03T17:00"),
      unpaidBreaks: [{ start: localTime("2026-02-03T12:04"), end: localTime("2026-02-03T12:41:40") }],
      rateCode: "engineer",
    };
    expect(run([entry], { ...wrenfield, punchRounding: "15" }).entries[0]?.breakMinutes).toBe(38);
  });

  it("refuses a break outside its entry or longer than it", () => {
    const outside = shift(priya, "2026-02-03T08:00", 60, {
      unpaidBreaks: [{ start: localTime("2026-02-03T09:30"), end: localTime("2026-02-03T09:45") }],
    });
    expect(() => run([outside])).toThrow(/outside the entry/);
    expect(() => run([shift(priya, "2026-02-03T08:00", 60, { unpaidBreaks: 61 })])).toThrow(/does not fit/);
  });
});

describe("pay rates with effective dates", () => {
  it("pays a raise from the workday it takes effect, splitting a shift that crosses into it (our rule; straight time per 29 CFR 778.115) [D]", () => {
    const result = computeOvertime({
      entries: [shift(priya, "2026-02-03T20:00", 360)],
      payRates: [rate(priya, "engineer", 2000, "2025-01-01"), rate(priya, "engineer", 2600, "2026-02-04")],
      settings: wrenfield,
    });
    const lines = result.workweeks[0]?.rateLines.map((l) => [l.centsPerHour, l.minutes, l.straightTimeCents]);
    expect(lines).toEqual([[2000, 240, 8000], [2600, 120, 5200]]);
  });

  it("refuses a shift with no rate in force yet", () => {
    const entries = [shift(priya, "2026-02-03T10:00", 60)];
    expect(() => computeOvertime({ entries, payRates: [rate(priya, "engineer", 2000, "2026-03-01")], settings: wrenfield })).toThrow(/No engineer rate/);
  });
});

describe("traceability and refusals", () => {
  it("traces every allocated minute to its entry, and each entry's minutes add up (conservation of hours) [D]", () => {
    const entries = [shift(sam, "2026-02-02T09:00", 720, { id: "mon" }), shift(sam, "2026-02-03T09:00", 720, { id: "tue" })];
    const result = run(entries, californiaStyle);
    for (const trace of result.entries) {
      const allocated = result.workweeks.flatMap((w) => w.allocations).filter((a) => a.entryId === trace.entryId);
      expect(allocated.reduce((s, a) => s + a.minutes, 0)).toBe(trace.workedMinutes);
    }
    expect(result.workweeks[0]?.rateLines[0]?.entryIds).toEqual(["mon", "tue"]);
  });

  it("refuses entries that overlap once rounded, so no hour is paid twice", () => {
    const entries = [shift(jo, "2026-02-03T08:00", 120, { rateCode: "assistant" }), shift(jo, "2026-02-03T09:00", 60, { rateCode: "assistant" })];
    expect(() => run(entries)).toThrow(/overlap/);
  });

  it("refuses an entry that ends before it starts, a repeated id, and an unknown zone", () => {
    const backwards = { id: "x", staffId: priya, start: localTime("2026-02-03T10:00"), end: localTime("2026-02-03T09:00"), rateCode: "engineer" };
    expect(() => run([backwards])).toThrow(/ends before/);
    const twice = shift(priya, "2026-02-03T10:00", 30, { id: "same" });
    expect(() => run([twice, { ...twice, start: localTime("2026-02-04T10:00"), end: localTime("2026-02-04T11:00") }])).toThrow(/twice/);
    expect(() => run([], { ...wrenfield, timeZone: "Mars/Olympus" })).toThrow(/time zone/);
  });
});
