export * from "./auth/roles.ts";
export * from "./shared/currency.ts";
export { basisPointsOf, roundHalfUpDiv } from "./shared/money.ts";
export * from "./shared/format-units.ts";
export * from "./shared/time-zone.ts";
export { localDateTime, offsetMinutesAt } from "./shared/zone-offset.ts";
export * from "./contracts/common.ts";
export * from "./contracts/errors.ts";
export * from "./contracts/route.ts";
export * from "./contracts/health.ts";
export * from "./contracts/me.ts";
export * from "./contracts/studio.ts";
export * from "./contracts/staff.ts";
export * from "./contracts/clients.ts";
export * from "./contracts/invitations.ts";
export * from "./contracts/dev-mail.ts";
export * from "./contracts/audit.ts";
export * from "./contracts/session.ts";
export * from "./rooms/catalogue.ts";
export * from "./bookings/status.ts";
export * from "./bookings/cancellation-fee.ts";
// Pricing: quotes for room time, premiums and engineer time.
export { quote } from "./pricing/quote.ts";
export { maxBookingMinutes, validateBooking } from "./pricing/validate-booking.ts";
export { lockoutSpan } from "./pricing/lockout.ts";
export { validateRateCard } from "./pricing/validate-rate-card.ts";
export { PricingError, type PricingProblem, type PricingProblemCode } from "./pricing/pricing-problem.ts";
export type {
  AssignedEngineer,
  Booking as PricedBooking,
  EngineerRates,
  LocalTimeWindow,
  Quote,
  QuoteLine,
  QuoteLineKind,
  RateCard,
  Studio as PricingStudio,
} from "./pricing/types.ts";
// Payroll: punch rounding, overtime, pay periods, ISO weeks.
export { computeOvertime } from "./payroll/compute-overtime.ts";
export { roundPunch } from "./payroll/round-punch.ts";
export { clockedMinutesByWorkday } from "./payroll/split-entries.ts";
export { payPeriodContaining, payPeriodForWorkday, type PayPeriod, type PayPeriodSchedule } from "./payroll/pay-periods.ts";
export { straddlingWeekNote, summarisePayPeriod, type PayPeriodSummary, type PayPeriodStaffTotals, type PeriodWorkweek } from "./payroll/pay-period-summary.ts";
export { formatIsoWeek, isoWeek, type IsoWeekDate } from "./payroll/iso-week.ts";
export type * from "./payroll/types.ts";
export * from "./contracts/rooms.ts";
export * from "./contracts/bookings.ts";
export * from "./contracts/projects.ts";
export * from "./shared/format-time.ts";
export { rateCardFromVersion, type RateCardVersionFields } from "./pricing/from-version.ts";
export * from "./payroll/settings-catalogue.ts";
export * from "./contracts/time.ts";
export * from "./contracts/time-clock.ts";
export * from "./contracts/payroll.ts";
export * from "./contracts/calendar-feeds.ts";
export { addDays as addCalendarDays, workdayOf, workdayStart, workweekContaining, type Workweek } from "./payroll/studio-calendar.ts";
export * from "./shared/date-window.ts";
export * from "./tape/index.ts";
export * from "./contracts/tape.ts";
export * from "./invoicing/index.ts";
export * from "./contracts/invoices.ts";
export * from "./vault/index.ts";
export * from "./contracts/vault.ts";
