import { describe, expect, it } from "vitest";
import { chargeableMonths, feeNoticeDate, feeStartDate, monthBefore } from "./storage-fees.ts";

describe("storage fees (the owner's free period and monthly fee; our own rule, docs/tape.md)", () => {
  it("starts fees the day after the free days that follow the last session", () => {
    expect(feeStartDate("2026-01-10", 90)).toBe("2026-04-11");
    expect(feeStartDate("2026-12-31", 0)).toBe("2027-01-01");
  });

  it("charges nothing while the reel is still in its free period", () => {
    expect(chargeableMonths({ feeStart: "2026-04-11", asOf: "2026-04-10" })).toEqual([]);
  });

  it("charges the month fees start in, once it has begun, and each month after", () => {
    expect(chargeableMonths({ feeStart: "2026-04-11", asOf: "2026-04-11" })).toEqual(["2026-04"]);
    expect(chargeableMonths({ feeStart: "2026-11-20", asOf: "2027-02-01" })).toEqual(["2026-11", "2026-12", "2027-01", "2027-02"]);
  });

  it("stops after the month the reel was released to its owner", () => {
    expect(chargeableMonths({ feeStart: "2026-04-11", asOf: "2026-09-01", releasedOn: "2026-06-30" })).toEqual(["2026-04", "2026-05", "2026-06"]);
    expect(chargeableMonths({ feeStart: "2026-04-11", asOf: "2026-09-01", releasedOn: "2026-04-10" })).toEqual([]);
  });

  it("tells the client one calendar month before fees start, on the month's last day when it is shorter", () => {
    expect(feeNoticeDate("2026-04-11")).toBe("2026-03-11");
    expect(monthBefore("2026-03-31")).toBe("2026-02-28");
    expect(monthBefore("2028-03-31")).toBe("2028-02-29");
    expect(monthBefore("2026-01-15")).toBe("2025-12-15");
  });
});
