/**
 * Inputs and outputs of the pricing engine. Money is integer minor units of the studio's
 * currency (called "cents" here, as in the rest of the domain); durations are whole minutes;
 * instants are `Date`s read only through `getTime()`, and every calendar question is answered
 * in the studio's IANA time zone.
 */

import type { EngineerGrade } from "../rooms/catalogue.ts";
export type { EngineerGrade };

/** A window of local wall-clock time, as minutes after local midnight (0–1440). */
export interface LocalTimeWindow {
  /** Inclusive. */
  startMinute: number;
  /** Exclusive. Smaller than `startMinute` means the window wraps past midnight (22:00–08:00). */
  endMinute: number;
}

/** Engineer rates billed to the client, per hour. */
export interface EngineerRates {
  engineer: number;
  assistant: number;
  /** Per-engineer rates by engineer id; these win over the grade's rate. */
  perEngineerCents?: Readonly<Record<string, number>>;
}

/** One version of a room's rate card. A booking is priced on the version it was quoted on. */
export interface RateCard {
  id: string;
  /** Shown in explanations, e.g. "Room A rate card v3 (from 1 Jan 2026)". */
  label: string;
  hourlyRateCents: number;
  dayRateCents: number;
  /** How much of one studio day the day rate covers, e.g. 600 for a 10-hour day. */
  dayCoversMinutes: number;
  minimumBillableMinutes: number;
  billingIncrementMinutes: number;
  /** Equal start and end means the rate card has no after-hours window. */
  afterHours: LocalTimeWindow;
  afterHoursPremiumBp: number;
  /** Applies to minutes on a Saturday or Sunday in the studio's time zone. */
  weekendPremiumBp: number;
  engineerRates: EngineerRates;
  /** What one lockout day costs; absent or null means the day rate (docs/pricing.md, lockouts). */
  lockoutDayRateCents?: number | null;
  /** Whether a lockout day on a Saturday or Sunday carries the weekend premium (on the day's price). */
  lockoutWeekendPremium?: boolean;
}

export interface AssignedEngineer {
  id: string;
  name: string;
  grade: EngineerGrade;
  /** A rate agreed for this booking only; wins over the rate card. */
  rateCentsOverride?: number;
}

export interface Booking {
  startsAt: Date;
  endsAt: Date;
  engineers: readonly AssignedEngineer[];
  /**
   * The room is the client's around the clock for every studio day the booking touches, each
   * day at the lockout day rate (docs/pricing.md). The span is widened to whole studio days.
   */
  lockout?: boolean;
}

export interface Studio {
  /** IANA zone, e.g. "America/Chicago". */
  timeZone: string;
  /** ISO 4217 code, e.g. "USD". */
  currency: string;
}

export type QuoteLineKind =
  | "room_hourly"
  | "room_day"
  | "minimum_top_up"
  | "after_hours_premium"
  | "weekend_premium"
  | "engineer";

export interface QuoteLine {
  kind: QuoteLineKind;
  label: string;
  /** Minutes when `unit` is "hour" (the unit amount is per hour); days when `unit` is "day". */
  quantity: number;
  unit: "hour" | "day";
  /** Per hour or per day. A premium's hourly amount is shown rounded half up to the cent. */
  unitAmountCents: number;
  amountCents: number;
  /** The minutes this line covers: for a day-rate line, the minutes the day rate covers. */
  minutes: number;
  /** The studio-calendar day (ISO date) for per-day room lines. */
  date?: string;
  /** The engineer billed, for engineer lines. */
  engineerId?: string;
  explanation: string;
}

export interface Quote {
  rateCardId: string;
  rateCardLabel: string;
  currency: string;
  timeZone: string;
  /** Minutes between start and end, as elapsed (a spring-forward night is an hour shorter). */
  elapsedMinutes: number;
  /** Elapsed minutes rounded up to the increment, then raised to the minimum. */
  billableMinutes: number;
  lines: QuoteLine[];
  /** Always the sum of the lines' amounts. */
  totalCents: number;
  /** Present and true when the booking is a lockout of whole studio days. */
  lockout?: boolean;
}
