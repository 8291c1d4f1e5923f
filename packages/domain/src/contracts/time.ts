import { z } from "zod";
import {
  editStatuses,
  overtimeRuleSets,
  payPeriodKinds,
  payPeriodStatuses,
  punchRoundings,
  timeEntryKinds,
  timeEntrySources,
} from "../payroll/settings-catalogue.ts";
import { optionalText } from "./common.ts";

const instant = z.iso.datetime({ offset: true, message: "Use an ISO date and time with an offset" });
const localDate = z.iso.date("Use a date as YYYY-MM-DD");

export const timeBreakDto = z.object({ id: z.number(), startedAt: z.string(), endedAt: z.string().nullable() });

export const timeEntryFlags = ["open_too_long", "missing_break", "pending_edit", "no_pay_rate", "self_approved"] as const;

export const timeEntryDto = z.object({
  id: z.number(),
  staffUserId: z.string(),
  staffName: z.string(),
  booking: z.object({ id: z.number(), roomName: z.string(), clientName: z.string() }).nullable(),
  kind: z.enum(timeEntryKinds),
  payRateCode: z.string(),
  startedAt: z.string(),
  endedAt: z.string().nullable(),
  source: z.enum(timeEntrySources),
  note: z.string().nullable(),
  breaks: z.array(timeBreakDto),
  /** Elapsed minutes less breaks, before any rounding; null while clocked in. */
  workedMinutes: z.number().nullable(),
  flags: z.array(z.enum(timeEntryFlags)),
});
export type TimeEntryDto = z.infer<typeof timeEntryDto>;

export const sessionNowDto = z.object({ id: z.number(), roomName: z.string(), clientName: z.string(), startsAt: z.string(), endsAt: z.string(), title: z.string().nullable() });

export const timeClockDto = z.object({
  openEntry: timeEntryDto.nullable(),
  onBreak: z.boolean(),
  /** Sessions the person is booked on that are running now or start within the hour. */
  sessionsNow: z.array(sessionNowDto),
  week: z.object({
    workweekStart: z.string(),
    workedMinutes: z.number(),
    days: z.array(z.object({ date: z.string(), workedMinutes: z.number() })),
  }),
});
export type TimeClockDto = z.infer<typeof timeClockDto>;

export const clockInInput = z.strictObject({ bookingId: z.number().int().positive().optional() });
export type ClockInInput = z.infer<typeof clockInInput>;

export const timesheetQuery = z.strictObject({
  from: localDate,
  to: localDate,
  staffUserId: z.string().min(1).max(36).optional(),
});

export const proposedBreakInput = z.strictObject({ startedAt: instant, endedAt: instant });

export const proposeEditInput = z.strictObject({
  /** Leave out to propose a missing (manual) entry. */
  timeEntryId: z.number().int().positive().optional(),
  startedAt: instant,
  endedAt: instant,
  breaks: z.array(proposedBreakInput).max(10).optional(),
  bookingId: z.number().int().positive().nullable().optional(),
  reason: z.string().trim().min(3, "Say why the change is needed").max(500, "Use at most 500 characters"),
});
export type ProposeEditInput = z.infer<typeof proposeEditInput>;

/**
 * For the viewer: `may_approve`; `self_approval` (the sole owner's own time: approving records it as
 * self-approved, shown to the bookkeeper); `another_owner` (an owner's own time when there is another
 * owner); `own_time` (a manager's own time: an owner or another manager decides); `owners_only`
 * (an owner's time, seen by a manager); `cannot_decide` (engineers and the bookkeeper).
 */
export const approvalRules = ["may_approve", "self_approval", "another_owner", "own_time", "owners_only", "cannot_decide"] as const;
export type ApprovalRule = (typeof approvalRules)[number];

export const timeEntryEditDto = z.object({
  id: z.number(),
  timeEntryId: z.number().nullable(),
  staffUserId: z.string(),
  staffName: z.string(),
  proposed: z.object({
    startedAt: z.string(),
    endedAt: z.string(),
    breaks: z.array(z.object({ startedAt: z.string(), endedAt: z.string() })),
    bookingId: z.number().nullable(),
  }),
  current: z.object({ startedAt: z.string(), endedAt: z.string().nullable(), breaks: z.array(z.object({ startedAt: z.string(), endedAt: z.string().nullable() })) }).nullable(),
  reason: z.string(),
  status: z.enum(editStatuses),
  /** Who proposed it; `staffName` is whose time it is. */
  proposedByName: z.string().nullable(),
  /** What approving it would mean for the person viewing the list (decision 011). */
  approvalRule: z.enum(approvalRules),
  /** The sole owner approved a change to their own time. */
  selfApproved: z.boolean(),
  decidedByName: z.string().nullable(),
  decidedAt: z.string().nullable(),
  decisionNote: z.string().nullable(),
  createdAt: z.string(),
});
export type TimeEntryEditDto = z.infer<typeof timeEntryEditDto>;

export const editsQuery = z.strictObject({ status: z.enum(editStatuses).optional() });
export const decideEditInput = z.strictObject({ note: optionalText(500) });

export const payPeriodDto = z.object({
  id: z.number(),
  kind: z.enum(payPeriodKinds),
  startDate: z.string(),
  endDate: z.string(),
  status: z.enum(payPeriodStatuses),
  approvedByName: z.string().nullable(),
  approvedAt: z.string().nullable(),
  lockedByName: z.string().nullable(),
  lockedAt: z.string().nullable(),
});
export type PayPeriodDto = z.infer<typeof payPeriodDto>;

export const payPeriodStaffDto = z.object({
  staffUserId: z.string(),
  name: z.string(),
  workedMinutes: z.number(),
  regularMinutes: z.number(),
  overtimeMinutes: z.number(),
  doubleTimeMinutes: z.number(),
  straightTimeCents: z.number(),
  overtimePremiumCents: z.number(),
  doubleTimePremiumCents: z.number(),
  grossCents: z.number(),
  /** Shown when more than one pay rate was worked in a workweek (29 CFR 778.115). */
  regularRates: z.array(z.object({ workweekStart: z.string(), centsPerHour: z.number(), weightedAverage: z.boolean() })),
  rates: z.array(z.object({ code: z.string(), centsPerHour: z.number(), minutes: z.number() })),
  entryCount: z.number(),
  /**
   * Workweeks crossing the period's edge (29 CFR 778.106): straight time is paid in the period
   * each hour was worked in, overtime in the period holding the week's last day.
   */
  straddlingWeeks: z.array(
    z.object({
      workweekStart: z.string(),
      lastWorkday: z.string(),
      /** Began before the period: its overtime premium is paid here. */
      begunEarlier: z.boolean(),
      /** Still open at the period's end: its overtime is paid in a later period. */
      stillOpen: z.boolean(),
      workedMinutes: z.number(),
      overtimeMinutes: z.number(),
      doubleTimeMinutes: z.number(),
      weekOvertimeMinutes: z.number(),
      weekDoubleTimeMinutes: z.number(),
      overtimePremiumCents: z.number(),
      doubleTimePremiumCents: z.number(),
      note: z.string(),
    }),
  ),
});
export type PayPeriodStaffDto = z.infer<typeof payPeriodStaffDto>;

export const payPeriodReviewDto = z.object({
  period: payPeriodDto,
  caution: z.string(),
  settings: z.object({ punchRounding: z.enum(punchRoundings), overtimeRules: z.enum(overtimeRuleSets), timeZone: z.string() }),
  staff: z.array(payPeriodStaffDto),
  totals: z.object({ workedMinutes: z.number(), regularMinutes: z.number(), overtimeMinutes: z.number(), doubleTimeMinutes: z.number(), grossCents: z.number() }),
  flags: z.array(z.object({ kind: z.enum(timeEntryFlags), staffName: z.string(), entryId: z.number().nullable(), message: z.string() })),
});
export type PayPeriodReviewDto = z.infer<typeof payPeriodReviewDto>;

export const unlockPayPeriodInput = z.strictObject({ reason: z.string().trim().min(3, "Say why the period is reopened").max(500) });
export const exportQuery = z.strictObject({ format: z.enum(["xlsx", "csv"], "Use xlsx or csv") });

export const payRateDto = z.object({
  id: z.number(),
  staffUserId: z.string(),
  staffName: z.string(),
  code: z.string(),
  hourlyRateCents: z.number(),
  effectiveFrom: z.string(),
  /** A locked pay period was computed with this rate: it can no longer be corrected. */
  usedByLockedPeriod: z.boolean(),
});
export type PayRateDto = z.infer<typeof payRateDto>;
export const createPayRateInput = z.strictObject({
  staffUserId: z.string().min(1).max(36),
  code: z.string().trim().regex(/^[a-z][a-z0-9_]{1,31}$/, "Use a short code such as engineer, assistant or shop"),
  hourlyRateCents: z.number().int().min(0).max(1_000_000),
  effectiveFrom: localDate,
});
export type CreatePayRateInput = z.infer<typeof createPayRateInput>;
/** Replaces a mistaken amount or date (not the person or code), with the reason kept in the audit log. */
export const correctPayRateInput = z.strictObject({
  hourlyRateCents: createPayRateInput.shape.hourlyRateCents.optional(),
  effectiveFrom: localDate.optional(),
  reason: z.string().trim().min(3, "Say why the rate is corrected").max(500, "Use at most 500 characters"),
});
export type CorrectPayRateInput = z.infer<typeof correctPayRateInput>;

export const payrollSettingsDto = z.object({
  timeZone: z.string(),
  workweekStartDay: z.number().int().min(1).max(7),
  workweekStartHour: z.number().int().min(0).max(23),
  payPeriodKind: z.enum(payPeriodKinds),
  payPeriodAnchor: z.string(),
  punchRounding: z.enum(punchRoundings),
  overtimeRules: z.enum(overtimeRuleSets),
  roundRegularRateToCent: z.boolean(),
  openEntryLimitHours: z.number().int(),
  caution: z.string(),
});
export type PayrollSettingsDto = z.infer<typeof payrollSettingsDto>;
export const updatePayrollSettingsInput = z.strictObject({
  workweekStartDay: z.number().int().min(1).max(7).optional(),
  workweekStartHour: z.number().int().min(0).max(23).optional(),
  payPeriodKind: z.enum(payPeriodKinds).optional(),
  payPeriodAnchor: localDate.optional(),
  punchRounding: z.enum(punchRoundings).optional(),
  overtimeRules: z.enum(overtimeRuleSets).optional(),
  roundRegularRateToCent: z.boolean().optional(),
  openEntryLimitHours: z.number().int().min(4).max(48).optional(),
});
export type UpdatePayrollSettingsInput = z.infer<typeof updatePayrollSettingsInput>;
