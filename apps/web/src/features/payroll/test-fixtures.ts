import { payrollCaution, type PayPeriodDto, type PayPeriodReviewDto, type PayPeriodStaffDto, type PayRateDto, type PayrollSettingsDto } from "@takeup/domain";

// Wrenfield Sound's payroll: weekly periods, Monday workweeks, America/Chicago.

export const period = (over: Partial<PayPeriodDto> = {}): PayPeriodDto => ({
  id: 9,
  kind: "weekly",
  startDate: "2026-11-30",
  endDate: "2026-12-06",
  status: "open",
  approvedByName: null,
  approvedAt: null,
  lockedByName: null,
  lockedAt: null,
  ...over,
});

export const staffRow = (over: Partial<PayPeriodStaffDto> = {}): PayPeriodStaffDto => ({
  staffUserId: "u-priya",
  name: "Priya Oduya",
  workedMinutes: 2490,
  regularMinutes: 2400,
  overtimeMinutes: 90,
  doubleTimeMinutes: 0,
  straightTimeCents: 69720,
  overtimePremiumCents: 2100,
  doubleTimePremiumCents: 0,
  grossCents: 71820,
  regularRates: [{ workweekStart: "2026-11-30", centsPerHour: 2800, weightedAverage: false }],
  rates: [{ code: "engineer", centsPerHour: 2800, minutes: 2490 }],
  entryCount: 6,
  straddlingWeeks: [],
  ...over,
});

/** Priya at one rate with overtime; Jo at two rates (a weighted regular rate) with double time. */
export const review = (over: Partial<PayPeriodReviewDto> = {}): PayPeriodReviewDto => ({
  period: period(),
  caution: payrollCaution,
  settings: { punchRounding: "15", overtimeRules: "federal_weekly", timeZone: "America/Chicago" },
  staff: [
    staffRow(),
    staffRow({
      staffUserId: "u-jo",
      name: "Jo Kettering",
      workedMinutes: 2745,
      regularMinutes: 2400,
      overtimeMinutes: 285,
      doubleTimeMinutes: 60,
      straightTimeCents: 101775,
      overtimePremiumCents: 5250,
      doubleTimePremiumCents: 2225,
      grossCents: 109250,
      regularRates: [{ workweekStart: "2026-11-30", centsPerHour: 2225, weightedAverage: true }],
      rates: [
        { code: "assistant", centsPerHour: 2200, minutes: 2445 },
        { code: "engineer", centsPerHour: 2400, minutes: 300 },
      ],
      entryCount: 7,
    }),
  ],
  totals: { workedMinutes: 5235, regularMinutes: 4800, overtimeMinutes: 375, doubleTimeMinutes: 60, grossCents: 181070 },
  flags: [
    { kind: "open_too_long", staffName: "Sam Reyes", entryId: 611, message: "Sam Reyes has been clocked in since 2026-12-05T15:00:00.000Z and has not clocked out" },
    { kind: "pending_edit", staffName: "Priya Oduya", entryId: 501, message: "Priya Oduya has a correction waiting for a decision: “Left later than clocked”" },
  ],
  ...over,
});

export const payRate = (over: Partial<PayRateDto> = {}): PayRateDto => ({
  id: 3,
  staffUserId: "u-priya",
  staffName: "Priya Oduya",
  code: "engineer",
  hourlyRateCents: 2800,
  effectiveFrom: "2026-01-05",
  usedByLockedPeriod: false,
  ...over,
});

export const payrollSettings = (over: Partial<PayrollSettingsDto> = {}): PayrollSettingsDto => ({
  timeZone: "America/Chicago",
  workweekStartDay: 1,
  workweekStartHour: 0,
  payPeriodKind: "weekly",
  payPeriodAnchor: "2026-01-05",
  punchRounding: "none",
  overtimeRules: "federal_weekly",
  roundRegularRateToCent: false,
  openEntryLimitHours: 16,
  caution: payrollCaution,
  ...over,
});
