import { assertCents } from "./cents-math.ts";
import { assertCalendarDate } from "./studio-calendar.ts";
import type { PayRate } from "./types.ts";

export type RateLookup = (staffId: string, rateCode: string, workday: string) => number;

/**
 * Builds a lookup of the rate in force on a workday: the version of that staff member's
 * rate code with the latest effective date on or before the workday. Picking by workday
 * (not by instant) means a shift that crosses midnight into the day a raise begins is paid
 * the new rate only for the part worked on that day.
 */
export function rateLookup(payRates: readonly PayRate[]): RateLookup {
  const versions = new Map<string, PayRate[]>();
  for (const rate of payRates) {
    assertCents(rate.centsPerHour, `Rate ${rate.rateCode} for ${rate.staffId}`);
    assertCalendarDate(rate.effectiveFrom);
    const key = `${rate.staffId}\u0000${rate.rateCode}`;
    const list = versions.get(key) ?? [];
    if (list.some((r) => r.effectiveFrom === rate.effectiveFrom)) {
      throw new RangeError(
        `Two ${rate.rateCode} rates for ${rate.staffId} take effect on ${rate.effectiveFrom}`,
      );
    }
    list.push(rate);
    versions.set(key, list);
  }
  for (const list of versions.values()) {
    list.sort((a, b) => a.effectiveFrom.localeCompare(b.effectiveFrom));
  }
  return (staffId, rateCode, workday) => {
    const list = versions.get(`${staffId}\u0000${rateCode}`) ?? [];
    const inForce = list.filter((r) => r.effectiveFrom <= workday).at(-1);
    if (!inForce) {
      throw new RangeError(`No ${rateCode} rate for ${staffId} in force on ${workday}`);
    }
    return inForce.centsPerHour;
  };
}
