import { describe, expect, it } from "vitest";
import { describeActor } from "./describe-event.ts";

describe("describeActor", () => {
  it("shows the client account beside a client user's self-chosen name", () => {
    expect(describeActor({ actorName: "Mara Linden (Owner)", actorClientAccountName: "Lantern Static" })).toBe(
      "Mara Linden (Owner) · client user of Lantern Static",
    );
  });

  it("shows a member of staff by name and the scheduler as System", () => {
    expect(describeActor({ actorName: "Mara Linden", actorClientAccountName: null })).toBe("Mara Linden");
    expect(describeActor({ actorName: null, actorClientAccountName: null })).toBe("System");
  });
});
