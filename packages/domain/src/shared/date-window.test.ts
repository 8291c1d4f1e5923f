import { describe, expect, it } from "vitest";
import { bookingDateProblem, nearBookedTime, timeDateProblem } from "./date-window.ts";

const now = new Date("2026-12-02T15:00:00Z");

describe("the date window", () => {
  it("refuses a booking in the year 0999 or ten years ahead, naming the field and the rule", () => {
    expect(bookingDateProblem("startsAt", new Date("0999-12-07T16:00:00Z"), now)).toMatchObject({ field: "startsAt", rule: "date_window", message: expect.stringContaining("between 2024-12-02 and 2029-12-02") });
    expect(bookingDateProblem("endsAt", new Date("2036-12-07T16:00:00Z"), now)?.rule).toBe("date_window");
  });

  it("accepts a booking from two years back to three years ahead", () => {
    expect(bookingDateProblem("startsAt", new Date("2024-12-02T15:00:00Z"), now)).toBeNull();
    expect(bookingDateProblem("startsAt", new Date("2029-12-02T15:00:00Z"), now)).toBeNull();
  });

  it("refuses time not yet worked and time older than 400 days", () => {
    expect(timeDateProblem("endedAt", new Date("2026-12-02T16:00:00Z"), now)?.message).toMatch(/not yet worked/);
    expect(timeDateProblem("endedAt", new Date("2026-12-02T15:10:00Z"), now)).toBeNull();
    expect(timeDateProblem("startedAt", new Date("2025-10-01T00:00:00Z"), now)?.message).toMatch(/400 days back/);
  });

  it("lets a session start from an hour before its booked start until six hours after its end", () => {
    const starts = new Date("2026-12-02T16:00:00Z");
    const ends = new Date("2026-12-02T20:00:00Z");
    expect(nearBookedTime(starts, ends, new Date("2026-12-02T14:59:00Z"))).toBe(false);
    expect(nearBookedTime(starts, ends, new Date("2026-12-02T15:00:00Z"))).toBe(true);
    expect(nearBookedTime(starts, ends, new Date("2026-12-03T02:00:00Z"))).toBe(true);
    expect(nearBookedTime(starts, ends, new Date("2026-12-03T02:01:00Z"))).toBe(false);
    expect(nearBookedTime(new Date("2036-12-02T16:00:00Z"), new Date("2036-12-02T20:00:00Z"), now)).toBe(false);
  });
});
