import { describe, expect, it } from "vitest";
import { careStanding, runningHours, sessionRun, sessionsPastAlignment } from "./recorder-care.ts";

const at = (iso: string) => new Date(`${iso}Z`);

describe("recorder running hours and care (intervals are common practice and the owner's settings)", () => {
  it("uses a wrapped session's actual start and wrap, else its booked times", () => {
    const booked = { bookedStart: at("2026-11-02T10:00"), bookedEnd: at("2026-11-02T18:00") };
    expect(sessionRun({ ...booked, actualStart: at("2026-11-02T10:30"), actualEnd: at("2026-11-02T19:00") })).toEqual({ start: at("2026-11-02T10:30"), end: at("2026-11-02T19:00") });
    expect(sessionRun({ ...booked, actualStart: at("2026-11-02T10:30"), actualEnd: null })).toEqual({ start: booked.bookedStart, end: booked.bookedEnd });
  });

  it("adds the hours of each run and counts only the part of a run after the last care event", () => {
    const runs = [
      { start: at("2026-11-02T10:00"), end: at("2026-11-02T18:00") },
      { start: at("2026-11-03T10:00"), end: at("2026-11-03T14:30") },
    ];
    expect(runningHours(runs, at("2026-11-10T00:00"))).toBe(12.5);
    expect(runningHours(runs, at("2026-11-10T00:00"), at("2026-11-02T16:00"))).toBe(6.5);
    expect(runningHours(runs, at("2026-11-03T12:00"))).toBe(10);
  });

  it("flags a kind of care as due once the hours since the last one reach its interval", () => {
    const runs = [{ start: at("2026-10-01T00:00"), end: at("2026-10-05T12:00") }];
    const standing = careStanding({
      runs,
      events: [
        { kind: "alignment", at: at("2026-09-01T00:00") },
        { kind: "cleaning", at: at("2026-10-05T08:00") },
      ],
      intervals: { alignment: 100, cleaning: 10 },
      now: at("2026-11-01T00:00"),
    });
    expect(standing.find((s) => s.kind === "alignment")).toMatchObject({ hoursSince: 108, intervalHours: 100, due: true });
    expect(standing.find((s) => s.kind === "cleaning")).toMatchObject({ hoursSince: 4, intervalHours: 10, due: false });
    expect(standing.find((s) => s.kind === "repair")).toMatchObject({ lastAt: null, hoursSince: 108, intervalHours: null, due: false });
  });

  it("names the booked sessions that would take the recorder past its alignment interval", () => {
    const a = { id: 1, start: at("2026-12-07T10:00"), end: at("2026-12-07T20:00") };
    const b = { id: 2, start: at("2026-12-08T10:00"), end: at("2026-12-08T20:00") };
    const past = sessionsPastAlignment({ hoursSinceAlignment: 85, intervalHours: 100, upcoming: [b, a] });
    expect(past).toEqual([{ session: b, hoursAtEnd: 105 }]);
  });
});
