import { describe, expect, it } from "vitest";
import { allowedActions, nextStatus } from "./status.ts";

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
});
