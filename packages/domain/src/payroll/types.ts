/**
 * Inputs and outputs of the payroll rules engine. Money is integer cents, durations are
 * integer minutes, instants are `Date` (UTC). Calendar dates ("workdays") are ISO
 * `YYYY-MM-DD` strings in the studio's time zone. See docs/payroll-rules.md.
 */

/** ISO 8601 weekday: 1 = Monday … 7 = Sunday. */
export type IsoWeekday = 1 | 2 | 3 | 4 | 5 | 6 | 7;

/**
 * Where the studio's workweek begins (29 CFR 778.105: any day and hour the employer sets).
 * Every workday begins at the same hour, so workdays tile workweeks exactly.
 */
export interface WorkweekStart {
  isoWeekday: IsoWeekday;
  /** Local hour 0–23 in the studio's time zone. */
  hour: number;
}

/** The studio's calendar: every day and week boundary is computed in this zone. */
export interface StudioCalendar {
  /** IANA zone, e.g. "America/Chicago". */
  timeZone: string;
  workweekStart: WorkweekStart;
}

/**
 * Punch rounding grid in minutes. "none" still lands punches on the whole minute
 * (seconds round to the nearest minute), because the engine counts integer minutes.
 */
export type PunchRounding = "none" | "5" | "6" | "15";

/**
 * `federal_weekly`: 1.5× over 40 hours in the workweek (29 CFR 778.107).
 * `daily_weekly_seventh_day`: daily, weekly and seventh-day rules in the style of
 * California Labor Code §510(a).
 */
export type OvertimeRuleSet = "federal_weekly" | "daily_weekly_seventh_day";

export interface PayrollSettings extends StudioCalendar {
  punchRounding: PunchRounding;
  overtimeRules: OvertimeRuleSet;
  /**
   * Round the regular rate to the cent before taking half of it for the premium.
   * Published examples differ; default false (no intermediate rounding).
   */
  roundRegularRateToCent?: boolean;
}

export interface TimeInterval {
  start: Date;
  end: Date;
}

export interface TimeEntry {
  id: string;
  staffId: string;
  /** Clock-in punch. */
  start: Date;
  /** Clock-out punch. */
  end: Date;
  /**
   * Unpaid breaks: either the intervals taken (kept where they fall), or a number of
   * minutes whose position was not recorded (placed at the middle of the entry).
   */
  unpaidBreaks?: readonly TimeInterval[] | number;
  /** Which of the employee's pay rates applies, e.g. "engineer" or "assistant". */
  rateCode: string;
}

export interface PayRate {
  staffId: string;
  rateCode: string;
  centsPerHour: number;
  /** First workday (studio-local date) this rate applies; it lasts until the next one. */
  effectiveFrom: string;
}

/** A non-discretionary bonus for one workweek, folded into the regular rate (29 CFR 778.110(b)). */
export interface WorkweekBonus {
  staffId: string;
  /** Any workday of the workweek the bonus was earned in. */
  workday: string;
  cents: number;
}

export interface OvertimeInput {
  entries: readonly TimeEntry[];
  payRates: readonly PayRate[];
  settings: PayrollSettings;
  bonuses?: readonly WorkweekBonus[];
}

export type PayCategory = "regular" | "overtime" | "double_time";

/** Why a stretch of minutes landed in its category. */
export type AllocationReason =
  | "within_limits"
  | "over_40_in_workweek"
  | "over_8_in_workday"
  | "over_12_in_workday"
  | "seventh_day_first_8"
  | "seventh_day_over_8";

/** One continuous stretch of paid time, in one workday, one category, from one entry. */
export interface Allocation {
  entryId: string;
  workday: string;
  start: Date;
  end: Date;
  minutes: number;
  rateCode: string;
  centsPerHour: number;
  category: PayCategory;
  reason: AllocationReason;
}

export interface WorkdayTotals {
  workday: string;
  workedMinutes: number;
  regularMinutes: number;
  overtimeMinutes: number;
  doubleTimeMinutes: number;
  entryIds: string[];
}

/** Straight-time pay for all minutes worked at one rate (overtime minutes included). */
export interface RateLine {
  rateCode: string;
  centsPerHour: number;
  minutes: number;
  /** minutes × rate ÷ 60, rounded half up to the cent. */
  straightTimeCents: number;
  entryIds: string[];
}

/**
 * Regular rate of pay for the workweek (29 CFR 778.109, 778.115):
 * exactly `totalCents × 60 ÷ workedMinutes` cents per hour.
 */
export interface RegularRate {
  /** Straight-time pay plus bonus, in cents. */
  totalCents: number;
  workedMinutes: number;
  /** The exact rate rounded half up to the cent, for display. */
  centsPerHour: number;
  /** Whether the premium used the exact rate or the one rounded to the cent. */
  premiumBasis: "exact" | "rounded_to_cent";
  /** True when more than one pay rate was worked, so the rate is a weighted average. */
  weightedAverage: boolean;
}

export interface WorkweekPay {
  staffId: string;
  /** Studio-local date of the workweek's first workday. */
  workweekStart: string;
  start: Date;
  end: Date;
  workedMinutes: number;
  regularMinutes: number;
  overtimeMinutes: number;
  doubleTimeMinutes: number;
  /** True when all seven workdays were worked and the seventh-day rule applied. */
  seventhDayRuleApplied: boolean;
  days: WorkdayTotals[];
  allocations: Allocation[];
  rateLines: RateLine[];
  straightTimeCents: number;
  bonusCents: number;
  /** Null when no minutes were worked (a rate needs hours to divide by). */
  regularRate: RegularRate | null;
  /** Half the regular rate for each overtime hour. */
  overtimePremiumCents: number;
  /** The whole regular rate again for each double-time hour. */
  doubleTimePremiumCents: number;
  /** straightTimeCents + bonusCents + overtimePremiumCents + doubleTimePremiumCents. */
  grossCents: number;
  entryIds: string[];
}

/** What the engine made of each punch pair, for the raw-entries view of an export. */
export interface EntryTrace {
  entryId: string;
  staffId: string;
  punchedStart: Date;
  punchedEnd: Date;
  roundedStart: Date;
  roundedEnd: Date;
  breakMinutes: number;
  workedMinutes: number;
}

export interface OvertimeResult {
  entries: EntryTrace[];
  /** One row per employee and workweek, ordered by staff id then workweek. */
  workweeks: WorkweekPay[];
}
