import { DateTime } from "luxon";
import { describe, expect, it } from "vitest";
import { clockedMinutesByWorkday } from "./split-entries.ts";

const calendar = { timeZone: "America/Chicago", workweekStart: { isoWeekday: 1 as const, hour: 0 } };
const at = (iso: string) => DateTime.fromISO(iso, { zone: calendar.timeZone }).toJSDate();

describe("clocked minutes per workday (the clock's week so far)", () => {
  // Derived: a workday is the studio's local calendar day (common practice; workweek per 29 CFR 778.105).
  it("counts a shift past midnight on both days it touched, with the break where it was taken", () => {
    const entry = { id: "1", staffId: "jo", rateCode: "engineer", start: at("2026-11-26T20:00"), end: at("2026-11-27T01:35"), unpaidBreaks: [{ start: at("2026-11-26T23:30"), end: at("2026-11-27T00:15") }] };
    expect(Object.fromEntries(clockedMinutesByWorkday(entry, calendar))).toEqual({ "2026-11-26": 210, "2026-11-27": 80 });
  });

  // Derived from the IANA tz database (America/Chicago falls back at 02:00 on 1 Nov 2026, from memory,
  // confirmed by Intl/luxon here): 00:00–04:07 local is 5 h 7 min of real time.
  it("counts the real minutes across a daylight-saving change, unrounded", () => {
    const entry = { id: "2", staffId: "sam", rateCode: "engineer", start: at("2026-11-01T00:00"), end: at("2026-11-01T04:07") };
    expect(Object.fromEntries(clockedMinutesByWorkday(entry, calendar))).toEqual({ "2026-11-01": 307 });
  });
});
