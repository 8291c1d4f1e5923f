import { describe, expect, it } from "vitest";
import type { PayPeriodDto } from "@takeup/domain";
import { periodToClose } from "./overview.tsx";

const period = (id: number, startDate: string, endDate: string, status: PayPeriodDto["status"]): PayPeriodDto => ({
  id,
  kind: "weekly",
  startDate,
  endDate,
  status,
  approvedByName: null,
  approvedAt: null,
  lockedByName: null,
  lockedAt: null,
});

describe("the bookkeeper's period to close", () => {
  const current = period(3, "2026-11-30", "2026-12-06", "open");
  it("is the latest period that has ended and is not locked", () => {
    const periods = [current, period(2, "2026-11-23", "2026-11-29", "approved"), period(1, "2026-11-16", "2026-11-22", "open")];
    expect(periodToClose(periods, "2026-12-01")?.id).toBe(2);
  });

  it("is the running period once every ended one is locked", () => {
    const periods = [current, period(2, "2026-11-23", "2026-11-29", "locked")];
    expect(periodToClose(periods, "2026-12-01")?.id).toBe(3);
  });
});
