import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { studioDays } from "./studio-calendar.ts";
import { intlOffset, intlTally } from "./testing/intl-clock.ts";
import { local } from "./testing/wrenfield.ts";
import { offsetChanges } from "../shared/wall-clock.ts";

const chicago = "America/Chicago";
const lateNight = { startMinute: 22 * 60, endMinute: 8 * 60 };
const noWindow = { startMinute: 0, endMinute: 0 };
const ms = (wallClock: string) => local(wallClock).getTime();
const afterHours = (from: string, to: string, window = lateNight) =>
  studioDays(ms(from), ms(to), window, chicago).flatMap((day) => day.pieces).filter((piece) => piece.afterHours).reduce((sum, piece) => sum + piece.minutes, 0);

describe("the studio calendar across daylight-saving changes in America/Chicago", () => {
  it("springs forward at 2026-03-08 08:00 UTC, 02:00 local, as Intl reports (IANA tz via Intl)", () => {
    const change = Date.UTC(2026, 2, 8, 8, 0);
    expect(intlOffset(change - 60_000, chicago)).toBe("GMT-06:00");
    expect(intlOffset(change, chicago)).toBe("GMT-05:00");
    expect(offsetChanges(Date.UTC(2026, 2, 8, 0, 0), Date.UTC(2026, 2, 9, 0, 0), chicago)).toEqual([change]);
  });

  it("falls back at 2026-11-01 07:00 UTC, 02:00 local daylight time, as Intl reports (IANA tz via Intl)", () => {
    const change = Date.UTC(2026, 10, 1, 7, 0);
    expect(intlOffset(change - 60_000, chicago)).toBe("GMT-05:00");
    expect(intlOffset(change, chicago)).toBe("GMT-06:00");
    expect(offsetChanges(Date.UTC(2026, 10, 1, 0, 0), Date.UTC(2026, 10, 2, 0, 0), chicago)).toEqual([change]);
  });

  it("makes 8 March 2026 a 23-hour studio day and 1 November 2026 a 25-hour one, as Intl counts them (IANA tz via Intl)", () => {
    for (const [date, hours] of [["2026-03-08", 23], ["2026-11-01", 25], ["2026-12-07", 24]] as const) {
      const [day] = studioDays(ms(`${date}T00:00`), ms(`${date}T00:00`) + 26 * 3_600_000, noWindow, chicago);
      const intl = intlTally(ms(`${date}T00:00`), ms(`${date}T00:00`) + 26 * 3_600_000, chicago, noWindow);
      expect(day?.minutes).toBe(hours * 60);
      expect(intl.minutesByDate.get(date)).toBe(hours * 60);
    }
  });

  it("counts 20:00 Saturday to 04:00 Sunday on the spring-forward night as 7 elapsed hours, not 8 (IANA tz via Intl)", () => {
    const days = studioDays(ms("2026-03-07T20:00"), ms("2026-03-08T04:00"), lateNight, chicago);
    expect(days.map((day) => [day.date, day.minutes])).toEqual([["2026-03-07", 240], ["2026-03-08", 180]]);
    expect(intlTally(ms("2026-03-07T20:00"), ms("2026-03-08T04:00"), chicago, lateNight).minutesByDate).toEqual(new Map([["2026-03-07", 240], ["2026-03-08", 180]]));
  });

  it("counts 20:00 Saturday to 04:00 Sunday on the fall-back night as 9 elapsed hours (IANA tz via Intl)", () => {
    const days = studioDays(ms("2026-10-31T20:00"), ms("2026-11-01T04:00"), lateNight, chicago);
    expect(days.map((day) => [day.date, day.minutes])).toEqual([["2026-10-31", 240], ["2026-11-01", 300]]);
  });

  it("gives 9 after-hours hours from 22:00 to 08:00 on the spring-forward night and 11 on the fall-back night ([D] derived from the IANA offsets)", () => {
    expect(afterHours("2026-03-07T20:00", "2026-03-08T10:00")).toBe(9 * 60);
    expect(afterHours("2026-10-31T20:00", "2026-11-01T10:00")).toBe(11 * 60);
  });

  it("reads a window edge inside the repeated hour twice: 01:30–08:00 on 1 November 2026 holds 7 hours ([D] checked against Intl)", () => {
    const window = { startMinute: 90, endMinute: 480 };
    const intl = intlTally(ms("2026-11-01T00:00"), ms("2026-11-01T12:00"), chicago, window);
    expect(intl.afterHoursMinutes).toBe(420);
    expect(afterHours("2026-11-01T00:00", "2026-11-01T12:00", window)).toBe(420);
  });

  it("starts a window whose edge falls in the skipped hour when the clocks jump: 02:30–08:00 on 8 March 2026 holds 5 hours ([D] checked against Intl)", () => {
    const window = { startMinute: 150, endMinute: 480 };
    const intl = intlTally(ms("2026-03-08T00:00"), ms("2026-03-08T12:00"), chicago, window);
    expect(intl.afterHoursMinutes).toBe(300);
    expect(afterHours("2026-03-08T00:00", "2026-03-08T12:00", window)).toBe(300);
  });
});

describe("the studio calendar against Intl in zones with unusual changes", () => {
  // Half-hour and 45-minute offsets, a half-hour daylight shift and midnight changes.
  const zones = ["America/Chicago", "Europe/London", "Australia/Lord_Howe", "Asia/Kathmandu", "America/Santiago", "America/Havana", "Pacific/Chatham", "UTC"];
  const fiveMinutes = 300_000;
  // Around the 2026 changes in both hemispheres, so most runs meet a change.
  const starts = [Date.UTC(2026, 2, 5), Date.UTC(2026, 3, 2), Date.UTC(2026, 8, 3), Date.UTC(2026, 9, 22)];

  it("splits any booking into days, after-hours and weekend minutes exactly as Intl reads the wall clock (IANA tz via Intl)", () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...zones),
        fc.constantFrom(...starts),
        fc.integer({ min: 0, max: 14 * 288 }),
        fc.integer({ min: 1, max: 3 * 288 }),
        fc.integer({ min: 0, max: 287 }),
        fc.integer({ min: 0, max: 288 }),
        (zone, base, startStep, lengthSteps, windowStart, windowEnd) => {
          const startMs = base + startStep * fiveMinutes;
          const endMs = startMs + lengthSteps * fiveMinutes;
          const window = { startMinute: windowStart * 5, endMinute: windowEnd * 5 };
          const days = studioDays(startMs, endMs, window, zone);
          const intl = intlTally(startMs, endMs, zone, window);
          const pieces = days.flatMap((day) => day.pieces);
          const sum = (keep: (piece: (typeof pieces)[number]) => boolean) => pieces.filter(keep).reduce((total, piece) => total + piece.minutes, 0);
          expect(new Map(days.map((day) => [day.date, day.minutes]))).toEqual(intl.minutesByDate);
          expect(sum((piece) => piece.afterHours)).toBe(intl.afterHoursMinutes);
          expect(sum((piece) => piece.weekend)).toBe(intl.weekendMinutes);
          expect(sum(() => true)).toBe(lengthSteps * 5);
        },
      ),
      { numRuns: 150 },
    );
  });
});
