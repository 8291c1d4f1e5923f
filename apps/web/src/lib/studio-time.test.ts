import { describe, expect, it } from "vitest";
import {
  formatTimeRange,
  sessionInstants,
  startOfStudioWeek,
  studioDaysRange,
  studioLocalToIso,
  studioParts,
  studioToday,
  timeToMinute,
} from "./studio-time.ts";

// Offsets of America/Chicago from the IANA time zone database (derived: CST is UTC−6, CDT is
// UTC−5; in 2026 the clocks go forward on 8 March and back on 1 November).
describe("studio time", () => {
  it("turns a studio-local wall time into an instant with the studio's offset, in winter and in summer", () => {
    expect(studioLocalToIso("2026-12-07", "10:00", "America/Chicago")).toBe("2026-12-07T10:00:00-06:00");
    expect(studioLocalToIso("2026-07-07", "10:00", "America/Chicago")).toBe("2026-07-07T10:00:00-05:00");
  });

  it("reads an instant on the studio's wall clock, not the browser's", () => {
    expect(studioParts("2026-12-08T03:30:00.000Z", "America/Chicago")).toEqual({ date: "2026-12-07", time: "21:30", minuteOfDay: 1290 });
  });

  it("gives a studio day its real length when the clocks change (23 hours on 8 March 2026)", () => {
    const { from, to } = studioDaysRange("2026-03-08", 1, "America/Chicago");
    expect(from).toBe("2026-03-08T00:00:00-06:00");
    expect(to).toBe("2026-03-09T00:00:00-05:00");
    expect((Date.parse(to) - Date.parse(from)) / 3_600_000).toBe(23);
  });

  it("runs a session whose end is before its start past midnight", () => {
    expect(sessionInstants("2026-12-07", "20:00", "02:00", "America/Chicago")).toEqual({
      startsAt: "2026-12-07T20:00:00-06:00",
      endsAt: "2026-12-08T02:00:00-06:00",
      overnight: true,
    });
    expect(sessionInstants("2026-12-07", "23:00", "24:00", "America/Chicago")?.endsAt).toBe("2026-12-08T00:00:00-06:00");
    expect(sessionInstants("2026-12-07", "", "02:00", "America/Chicago")).toBeNull();
  });

  it("starts the week on the studio's chosen weekday", () => {
    // Wednesday 9 December 2026.
    expect(startOfStudioWeek("2026-12-09", 1)).toBe("2026-12-07");
    expect(startOfStudioWeek("2026-12-09", 7)).toBe("2026-12-06");
    expect(startOfStudioWeek("2026-12-06", 1)).toBe("2026-11-30");
  });

  it("knows today by the studio's calendar: 02:00 UTC on the 8th is still the 7th in Chicago", () => {
    expect(studioToday("America/Chicago", new Date("2026-12-08T02:00:00.000Z"))).toBe("2026-12-07");
  });

  it("writes time ranges the way the studio reads them", () => {
    expect(formatTimeRange("2026-12-07T16:00:00.000Z", "2026-12-07T19:00:00.000Z", "America/Chicago")).toBe("10:00–13:00");
    expect(formatTimeRange("2026-12-08T04:00:00.000Z", "2026-12-08T06:00:00.000Z", "America/Chicago")).toBe("22:00–24:00");
    expect(formatTimeRange("2026-12-08T04:00:00.000Z", "2026-12-08T08:00:00.000Z", "America/Chicago")).toBe("Mon 7 Dec 22:00 – Tue 8 Dec 02:00");
    expect(timeToMinute("07:30")).toBe(450);
    expect(timeToMinute("7.30")).toBeNull();
  });
});
