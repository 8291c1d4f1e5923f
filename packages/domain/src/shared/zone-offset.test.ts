import fc from "fast-check";
import { DateTime } from "luxon";
import { describe, expect, it } from "vitest";
import { addDays, isoWeekdayOf, workdayOf } from "../payroll/studio-calendar.ts";
import { localDateTime, offsetMinutesAt } from "./zone-offset.ts";

// Zones whose rules are awkward: whole-hour DST, a half-hour DST shift (Lord Howe), and
// offsets of :30 and :45 without DST. Luxon (the IANA database through Intl) is the reference.
const zones = ["America/Chicago", "Europe/Lisbon", "Australia/Lord_Howe", "America/St_Johns", "Asia/Kathmandu", "Pacific/Chatham"];
const from = Date.UTC(2020, 0, 1);
const to = Date.UTC(2036, 0, 1);

describe("the cached zone offset", () => {
  it("agrees with the IANA database at any instant, in every zone tried", () => {
    fc.assert(
      fc.property(fc.integer({ min: from, max: to }), fc.constantFrom(...zones), (ms, zone) => {
        expect(offsetMinutesAt(ms, zone)).toBe(DateTime.fromMillis(ms, { zone }).offset);
      }),
      { numRuns: 5000 },
    );
  });

  it("is exact on either side of a change, to the millisecond (Chicago, 8 March and 1 November 2026)", () => {
    const spring = Date.UTC(2026, 2, 8, 8); // 02:00 CST → 03:00 CDT
    const autumn = Date.UTC(2026, 10, 1, 7); // 02:00 CDT → 01:00 CST
    expect([offsetMinutesAt(spring - 1, "America/Chicago"), offsetMinutesAt(spring, "America/Chicago")]).toEqual([-360, -300]);
    expect([offsetMinutesAt(autumn - 1, "America/Chicago"), offsetMinutesAt(autumn, "America/Chicago")]).toEqual([-300, -360]);
  });

  it("gives the same workday as reading the instant in the zone, with workdays starting at any hour", () => {
    fc.assert(
      fc.property(fc.integer({ min: from, max: to }), fc.constantFrom(...zones), fc.integer({ min: 0, max: 23 }), (ms, zone, hour) => {
        const local = DateTime.fromMillis(ms, { zone });
        const expected = (local.hour < hour ? local.minus({ days: 1 }) : local).toISODate();
        expect(workdayOf(new Date(ms), { timeZone: zone, workweekStart: { isoWeekday: 1, hour } })).toBe(expected);
      }),
      { numRuns: 3000 },
    );
  });

  it("adds calendar days and names weekdays as the calendar does, and refuses dates that do not exist", () => {
    fc.assert(
      fc.property(fc.integer({ min: from, max: to }), fc.integer({ min: -400, max: 400 }), (ms, days) => {
        const date = DateTime.fromMillis(ms, { zone: "utc" }).toISODate()!;
        expect(addDays(date, days)).toBe(DateTime.fromISO(date, { zone: "utc" }).plus({ days }).toISODate());
        expect(isoWeekdayOf(date)).toBe(DateTime.fromISO(date, { zone: "utc" }).weekday);
      }),
    );
    expect(() => addDays("2026-02-30", 1)).toThrow(RangeError);
    expect(() => addDays("2026-2-3", 1)).toThrow(RangeError);
  });
});

describe("studio wall time for the exports", () => {
  it("writes the minute in the zone, as luxon would format it", () => {
    fc.assert(
      fc.property(fc.integer({ min: from, max: to }), fc.constantFrom(...zones), (ms, zone) => {
        expect(localDateTime(ms, zone)).toBe(DateTime.fromMillis(ms, { zone }).toFormat("yyyy-MM-dd HH:mm"));
      }),
      { numRuns: 2000 },
    );
  });
});
