import { DateTime } from "luxon";
import { describe, expect, it } from "vitest";
import { clockedMinutesByWorkday } from "./split-entries.ts";

const calendar = { timeZone: "America/Chicago", workweekStart: { isoWeekday: 1 as const, hour: 0 } };
const at = (iso: string) => DateTime.fromISO(iso, { zone: calendar.timeZone }).toJSDate();

describe("clocked minutes per workday (the clock's week so far)", () => {
  // Rules: the workday is the studio's local calendar day, begun at the workweek's start hour
  // (our setting, docs/payroll-rules.md §3, inside the fixed workweek of 29 CFR 778.105 [S]);
  // an unpaid meal break is not work time and is taken out where it fell (29 CFR 785.19, from memory [M]).
  it("counts a shift past midnight on both days it touched, with the break where it was taken (29 CFR 778.105; 785.19 [M]) [D]", () => {
    const entry = { id: "1", staffId: "jo", rateCode: "engineer", start: at("2026-11-26T20:00"), end: at("2026-11-27T01:35"), unpaidBreaks: [{ start: at("2026-11-26T23:30"), end: at("2026-11-27T00:15") }] };
    expect(Object.fromEntries(clockedMinutesByWorkday(entry, calendar))).toEqual({ "2026-11-26": 210, "2026-11-27": 80 });
  });

  // Rules: hours worked are the real time elapsed (29 CFR 785.48(b) allows rounding only of
  // the recorded punches, none here); America/Chicago falls back 02:00 CDT → 01:00 CST on
  // 1 Nov 2026 (the IANA tz database, checked below through Intl, not luxon): 00:00–04:07 local
  // is 5 h 7 min of real time.
  it("counts the real minutes across a daylight-saving change, unrounded (IANA tz database; 29 CFR 785.48(b)) [D]", () => {
    const entry = { id: "2", staffId: "sam", rateCode: "engineer", start: at("2026-11-01T00:00"), end: at("2026-11-01T04:07") };
    const zoneName = (d: Date) => new Intl.DateTimeFormat("en-US", { timeZone: calendar.timeZone, timeZoneName: "short" }).formatToParts(d).find((p) => p.type === "timeZoneName")?.value;
    expect([entry.start.toISOString(), zoneName(entry.start), entry.end.toISOString(), zoneName(entry.end)]).toEqual(["2026-11-01T05:00:00.000Z", "CDT", "2026-11-01T10:07:00.000Z", "CST"]);
    expect(Object.fromEntries(clockedMinutesByWorkday(entry, calendar))).toEqual({ "2026-11-01": 307 });
  });
});
