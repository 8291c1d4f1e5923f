import { Settings } from "luxon";
import { afterEach, describe, expect, it, vi } from "vitest";
import { days, priya, rate } from "./test-fixtures.ts";
import type { IsoWeekday, PayrollSettings, TimeEntry } from "./types.ts";

/**
 * A pay figure must not depend on the day the program runs (REFERENCES.md, "Pay periods and
 * when pay is due": an engineering rule, no source). Luxon guesses the offset of a wall time
 * from today's date, so these tests pin its clock to a summer and a winter day and load the
 * engine afresh under each (its caches would otherwise remember the first answer).
 */
const summer = Date.parse("2026-07-15T12:00:00Z");
const winter = Date.parse("2026-12-15T12:00:00Z");

async function underClock(now: number) {
  Settings.now = () => now;
  vi.resetModules();
  const engine = await import("./compute-overtime.ts");
  const calendar = await import("./studio-calendar.ts");
  return { ...engine, ...calendar };
}

afterEach(() => {
  Settings.now = () => Date.now();
  vi.resetModules();
});

const settings = (timeZone: string, isoWeekday: IsoWeekday, hour: number): PayrollSettings => ({
  timeZone,
  workweekStart: { isoWeekday, hour },
  punchRounding: "none",
  overtimeRules: "federal_weekly",
});

const utcShift = (id: string, start: string, end: string): TimeEntry => ({
  id,
  staffId: priya,
  start: new Date(start),
  end: new Date(end),
  rateCode: "engineer",
});

describe("the issue's repro: a workweek starting Sunday 01:00 in America/Chicago, the day the clocks go back", () => {
  // 40 h Mon–Fri 26–30 Oct 2026, then 03:00Z–10:00Z on Sunday 1 Nov. 01:00 reads twice that
  // night: 06:00Z (CDT) and 07:00Z (CST); the week starts at the earlier one.
  const chicagoSunday1 = settings("America/Chicago", 7, 1);
  const entries = [...days(priya, "2026-10-26", [8, 8, 8, 8, 8]), utcShift("sunday", "2026-11-01T03:00:00Z", "2026-11-01T10:00:00Z")];
  const payRates = [rate(priya, "engineer", 2000)];

  for (const [name, now] of [["summer", summer], ["winter", winter]] as const) {
    it(`starts the new week at 06:00Z and owes 3 h overtime, $970.00, with the clock in ${name} (29 CFR 778.105; 43 h × $20 + 3 h × $10 + 4 h × $20) [D]`, async () => {
      const { computeOvertime, workweekContaining } = await underClock(now);
      const weeks = computeOvertime({ entries, payRates, settings: chicagoSunday1 }).workweeks;
      expect(weeks.map((w) => [w.workweekStart, w.start.toISOString(), w.end.toISOString(), w.overtimeMinutes, w.grossCents])).toEqual([
        ["2026-10-25", "2026-10-25T06:00:00.000Z", "2026-11-01T06:00:00.000Z", 180, 89_000],
        ["2026-11-01", "2026-11-01T06:00:00.000Z", "2026-11-08T07:00:00.000Z", 0, 8_000],
      ]);
      expect(weeks.reduce((sum, w) => sum + w.grossCents, 0)).toBe(97_000);
      // A shift at 06:30Z (01:30 CDT) is filed in a week that has already begun.
      const week = workweekContaining(new Date("2026-11-01T06:30:00Z"), chicagoSunday1);
      expect(week.start.getTime()).toBeLessThanOrEqual(Date.parse("2026-11-01T06:30:00Z"));
    });
  }
});

describe("workweek starts that do not depend on the day the program runs", () => {
  // [D] from the IANA tz database: Chicago goes back 02:00 CDT → 01:00 CST on 1 Nov 2026 and
  // forward 02:00 CST → 03:00 CDT on 8 Mar 2026; London goes back 02:00 BST → 01:00 GMT on
  // 25 Oct 2026 and forward 01:00 GMT → 02:00 BST on 29 Mar 2026.
  const cases: [zone: string, hour: number, day: string, expected: string, why: string][] = [
    ["America/Chicago", 1, "2026-11-01", "2026-11-01T06:00:00.000Z", "01:00 reads twice; the earlier, CDT"],
    ["America/Chicago", 2, "2026-11-01", "2026-11-01T08:00:00.000Z", "02:00 reads once, CST"],
    ["America/Chicago", 2, "2026-03-08", "2026-03-08T08:00:00.000Z", "02:00 is skipped; the first instant after, 03:00 CDT"],
    ["Europe/London", 1, "2026-10-25", "2026-10-25T00:00:00.000Z", "01:00 reads twice; the earlier, BST"],
    ["Europe/London", 2, "2026-10-25", "2026-10-25T02:00:00.000Z", "02:00 reads once, GMT"],
    ["Europe/London", 1, "2026-03-29", "2026-03-29T01:00:00.000Z", "01:00 is skipped; the first instant after, 02:00 BST"],
  ];

  for (const [zone, hour, day, expected, why] of cases) {
    it(`starts the workday ${day} at ${String(hour).padStart(2, "0")}:00 in ${zone} at ${expected} in summer and in winter (${why}) [D]`, async () => {
      const calendar = settings(zone, 7, hour);
      const inSummer = (await underClock(summer)).workdayStart(day, calendar).toISOString();
      const inWinter = (await underClock(winter)).workdayStart(day, calendar).toISOString();
      expect([inSummer, inWinter]).toEqual([expected, expected]);
    });
  }

  for (const [zone, day] of [["America/Chicago", "2026-11-01"], ["Europe/London", "2026-10-25"]] as const) {
    for (const hour of [1, 2]) {
      it(`pays a night across the fall-back hour in ${zone}, week starting Sunday ${hour}:00, the same in summer and in winter (29 CFR 778.105) [D]`, async () => {
        const calendar = settings(zone, 7, hour);
        const dayStartUtc = Date.parse(`${day}T00:00:00Z`);
        // 45 h in the week before, then a ten-hour night spanning both readings of the repeated hour.
        const before = [0, 1, 2, 3, 4].map((i) => {
          const start = new Date(dayStartUtc - (6 - i) * 86_400_000 + 12 * 3_600_000);
          return utcShift(`d${i}`, start.toISOString(), new Date(start.getTime() + 9 * 3_600_000).toISOString());
        });
        const night = utcShift("night", new Date(dayStartUtc - 4 * 3_600_000).toISOString(), new Date(dayStartUtc + 6 * 3_600_000).toISOString());
        const input = { entries: [...before, night], payRates: [rate(priya, "engineer", 2000)], settings: calendar };
        const summarise = (weeks: ReturnType<Awaited<ReturnType<typeof underClock>>["computeOvertime"]>["workweeks"]) =>
          weeks.map((w) => [w.workweekStart, w.start.toISOString(), w.workedMinutes, w.overtimeMinutes, w.grossCents]);
        const inSummer = summarise((await underClock(summer)).computeOvertime(input).workweeks);
        const inWinter = summarise((await underClock(winter)).computeOvertime(input).workweeks);
        expect(inWinter).toEqual(inSummer);
      });
    }
  }
});
