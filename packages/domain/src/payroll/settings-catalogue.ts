/** Choices the owner makes for payroll; their meaning is in docs/payroll-rules.md. */
export const punchRoundings = ["none", "5", "6", "15"] as const;
export const overtimeRuleSets = ["federal_weekly", "daily_weekly_seventh_day"] as const;
export const payPeriodKinds = ["weekly", "fortnightly", "semi_monthly"] as const;
export const payPeriodStatuses = ["open", "approved", "locked"] as const;
export const timeEntryKinds = ["session", "shop"] as const;
export const timeEntrySources = ["clock", "manual"] as const;
export const editStatuses = ["pending", "approved", "rejected"] as const;

export type PayPeriodKind = (typeof payPeriodKinds)[number];
export type PayPeriodStatus = (typeof payPeriodStatuses)[number];

export const overtimeRuleSetLabels: Record<(typeof overtimeRuleSets)[number], string> = {
  federal_weekly: "Weekly: 1.5× over 40 hours in the workweek",
  daily_weekly_seventh_day: "Daily and weekly, with a seventh-day rule",
};
export const punchRoundingLabels: Record<(typeof punchRoundings)[number], string> = {
  none: "No rounding (to the minute)",
  "5": "Nearest 5 minutes",
  "6": "Nearest tenth of an hour (6 minutes)",
  "15": "Nearest quarter hour",
};

/** The caution every payroll screen and export shows. */
export const payrollCaution =
  "Overtime, rounding and tax rules differ by country, state and city. These payroll settings are the studio's responsibility; local labour law, the tax authorities and a licensed accountant or payroll provider decide. Nothing in Takeup is legal or tax advice.";
