import { eq } from "drizzle-orm";
import { studio, type Db, type DbOrTx } from "@takeup/db";
import { payrollCaution, type IsoWeekday, type PayPeriodSchedule, type PayrollSettings, type PayrollSettingsDto, type UpdatePayrollSettingsInput } from "@takeup/domain";
import { HttpError } from "../../lib/http-error.ts";
import { writeAudit } from "../../lib/audit.ts";
import type { Actor } from "../../lib/actor.ts";

export type PayrollContext = { settings: PayrollSettings; schedule: PayPeriodSchedule; dto: PayrollSettingsDto };

/** The studio's payroll settings, in the shapes the rules engine and the API want. */
export async function loadPayroll(db: DbOrTx): Promise<PayrollContext> {
  const [row] = await db.select().from(studio).where(eq(studio.id, 1));
  if (!row) throw new HttpError(503, "studio_not_set_up", "The studio has not been set up yet (run the seed)");
  const settings: PayrollSettings = {
    timeZone: row.timeZone,
    workweekStart: { isoWeekday: row.workweekStartDay as IsoWeekday, hour: row.workweekStartHour },
    punchRounding: row.punchRounding,
    overtimeRules: row.overtimeRules,
    roundRegularRateToCent: row.roundRegularRateToCent,
  };
  const schedule: PayPeriodSchedule = row.payPeriodKind === "fortnightly" ? { kind: "fortnightly", anchorDate: row.payPeriodAnchor } : { kind: row.payPeriodKind };
  return {
    settings,
    schedule,
    dto: {
      timeZone: row.timeZone,
      workweekStartDay: row.workweekStartDay,
      workweekStartHour: row.workweekStartHour,
      payPeriodKind: row.payPeriodKind,
      payPeriodAnchor: row.payPeriodAnchor,
      punchRounding: row.punchRounding,
      overtimeRules: row.overtimeRules,
      roundRegularRateToCent: row.roundRegularRateToCent,
      openEntryLimitHours: row.openEntryLimitHours,
      caution: payrollCaution,
    },
  };
}

export async function updatePayrollSettings(db: Db, actor: Actor, input: UpdatePayrollSettingsInput): Promise<PayrollSettingsDto> {
  return db.transaction(async (tx) => {
    const before = (await loadPayroll(tx)).dto;
    // An empty change is a no-op (drizzle refuses an UPDATE with nothing to set).
    if (Object.values(input).every((v) => v === undefined)) return before;
    await tx.update(studio).set(input).where(eq(studio.id, 1));
    const after = (await loadPayroll(tx)).dto;
    await writeAudit(tx, actor, "payroll_settings.updated", { type: "studio", id: 1 }, { before, after });
    return after;
  });
}
