// What both cases run on: the studio's calendar, one fortnight, and the rule sets measured.
import { payPeriodForWorkday, type OvertimeRuleSet, type PayPeriodSchedule, type PayrollSettings } from "@takeup/domain";

/** The demo studio's zone, written out: the seed module would load the database layer into the engine's process. */
const studioZone = "America/Chicago";

export const goalSeconds = 5;
export const goalMB = 300;

/** The demo studio's anchor, so the bench fortnight is one the studio's own schedule would produce. */
export const schedule: PayPeriodSchedule = { kind: "fortnightly", anchorDate: "2026-01-05" };

export const settingsFor = (overtimeRules: OvertimeRuleSet): PayrollSettings => ({
  timeZone: studioZone,
  workweekStart: { isoWeekday: 1, hour: 0 },
  punchRounding: "15",
  overtimeRules,
});

/**
 * The fortnight of 25 February to 10 March 2030: years from the seed's own month of time entries
 * (which follow the day the seed runs), and it ends on the day Chicago springs forward, so some
 * night sessions run through the missing hour.
 */
export const period = payPeriodForWorkday("2030-03-10", schedule, settingsFor("federal_weekly"));

/** The export runs under the daily rules: they cut the most allocations, so they cost the most. */
export const exportRules: OvertimeRuleSet = "daily_weekly_seventh_day";
export const engineRuleSets: readonly OvertimeRuleSet[] = ["federal_weekly", "daily_weekly_seventh_day"];

export type Shape = { entries: number; perPerson: number };
