import { describe, expect, it } from "vitest";
import { formatIsoWeek, isoWeek } from "./iso-week.ts";
import { localTime, wrenfield } from "./test-fixtures.ts";

const zone = wrenfield.timeZone;

describe("isoWeek", () => {
  it.each([
    ["2019-12-30", "2020-W01-1", "S"],
    ["2006-12-31", "2006-W52-7", "S"],
    ["2026-12-31", "2026-W53-4", "D"],
    ["2027-01-03", "2026-W53-7", "D"],
    ["2027-01-04", "2027-W01-1", "D"],
    ["2021-01-03", "2020-W53-7", "D"],
    ["2024-12-30", "2025-W01-1", "D"],
  ])("gives %s as %s (ISO 8601: week 01 holds the first Thursday, weeks start Monday) [%s]", (date, expected) => {
    expect(formatIsoWeek(isoWeek(localTime(`${date}T12:00`), zone))).toBe(expected);
  });

  it("reads the week on the studio's clock: 23:30 on Sunday 2019-12-29 in Chicago is still 2019-W52-7 though UTC is in 2020-W01 (ISO 8601 applied to local dates) [D]", () => {
    const lateSunday = localTime("2019-12-29T23:30");
    expect(isoWeek(lateSunday, zone)).toEqual({ year: 2019, week: 52, weekday: 7 });
    expect(isoWeek(lateSunday, "UTC")).toEqual({ year: 2020, week: 1, weekday: 1 });
  });

  it("refuses a zone it does not know rather than guessing", () => {
    expect(() => isoWeek(new Date(), "Mars/Olympus")).toThrow(RangeError);
  });
});
