import { describe, expect, it } from "vitest";
import { allowedActions, holdToQueueBehind, mayQueueBehindHold, nextStatus } from "./status.ts";

describe("booking states", () => {
  it("moves a hold to confirmed, then in session, then wrapped", () => {
    expect(nextStatus("hold", "confirm")).toBe("confirmed");
    expect(nextStatus("confirmed", "start")).toBe("in_session");
    expect(nextStatus("in_session", "wrap")).toBe("wrapped");
  });

  it("releases a hold and cancels a confirmed booking, both ending cancelled", () => {
    expect(nextStatus("hold", "release")).toBe("cancelled");
    expect(nextStatus("confirmed", "cancel")).toBe("cancelled");
  });

  it("refuses actions that skip a step or undo a wrapped session", () => {
    expect(nextStatus("hold", "start")).toBeNull();
    expect(nextStatus("wrapped", "cancel")).toBeNull();
    expect(nextStatus("cancelled", "confirm")).toBeNull();
  });

  it("offers only the actions that apply", () => {
    expect(allowedActions("hold")).toEqual(["confirm", "release"]);
    expect(allowedActions("wrapped")).toEqual([]);
  });

  it("offers no Confirm to a second hold and no Start far from the booked time", () => {
    const startsAt = new Date("2026-12-07T16:00:00Z");
    const endsAt = new Date("2026-12-07T20:00:00Z");
    expect(allowedActions("hold", { queuedBehindId: 4, startsAt, endsAt, now: startsAt })).toEqual(["release"]);
    expect(allowedActions("confirmed", { queuedBehindId: null, startsAt, endsAt, now: new Date("2026-11-30T16:00:00Z") })).toEqual(["cancel"]);
    expect(allowedActions("confirmed", { queuedBehindId: null, startsAt, endsAt, now: startsAt })).toEqual(["start", "cancel"]);
  });

  it("lets a second hold queue only behind one first hold on the room, never behind a confirmed booking or a busy engineer", () => {
    const roomHold = { resource: "room" as const, status: "hold" as const, bookingId: 7 };
    expect(holdToQueueBehind([roomHold, roomHold])).toBe(7);
    expect(holdToQueueBehind([roomHold, { ...roomHold, bookingId: 8 }])).toBeNull();
    expect(holdToQueueBehind([roomHold, { ...roomHold, status: "confirmed" }])).toBeNull();
    expect(holdToQueueBehind([roomHold, { ...roomHold, resource: "engineer" }])).toBeNull();
    expect(holdToQueueBehind([])).toBeNull();
    expect(mayQueueBehindHold([roomHold])).toBe(true);
    expect(mayQueueBehindHold([])).toBe(false);
  });
});
