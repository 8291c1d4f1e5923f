import { formatStudioInstant } from "../shared/format-time.ts";
import type { EngineerRates, RateCard } from "./types.ts";

/** The stored shape of one rate-card version (a row of rate_card_versions). */
export type RateCardVersionFields = {
  id: number;
  version: number;
  effectiveFrom: Date;
  hourlyRateCents: number;
  dayRateCents: number;
  dayCoversMinutes: number;
  minimumBillableMinutes: number;
  billingIncrementMinutes: number;
  afterHoursStartMinute: number;
  afterHoursEndMinute: number;
  afterHoursPremiumBp: number;
  weekendPremiumBp: number;
  lockoutDayRateCents?: number | null;
  lockoutWeekendPremium?: boolean;
};

/** The pricing engine's view of a stored version, labelled the way quotes name it. */
export function rateCardFromVersion(roomName: string, version: RateCardVersionFields, engineerRates: EngineerRates, timeZone: string): RateCard {
  return {
    id: String(version.id),
    label: `${roomName} rate card v${version.version} (from ${formatStudioInstant(version.effectiveFrom, timeZone)})`,
    hourlyRateCents: version.hourlyRateCents,
    dayRateCents: version.dayRateCents,
    dayCoversMinutes: version.dayCoversMinutes,
    minimumBillableMinutes: version.minimumBillableMinutes,
    billingIncrementMinutes: version.billingIncrementMinutes,
    afterHours: { startMinute: version.afterHoursStartMinute, endMinute: version.afterHoursEndMinute },
    afterHoursPremiumBp: version.afterHoursPremiumBp,
    weekendPremiumBp: version.weekendPremiumBp,
    lockoutDayRateCents: version.lockoutDayRateCents ?? null,
    lockoutWeekendPremium: version.lockoutWeekendPremium ?? false,
    engineerRates,
  };
}
