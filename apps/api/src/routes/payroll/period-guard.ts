import { and, eq, inArray } from "drizzle-orm";
import { payPeriods, type Tx } from "@takeup/db";
import { payPeriodContaining } from "@takeup/domain";
import { HttpError } from "../../lib/http-error.ts";
import type { PayrollContext } from "./payroll-settings.ts";

/**
 * Refuses a change to time that falls in an approved or locked pay period (423). Locks the
 * period rows it reads, so a period cannot be locked while the change is being written.
 */
export async function assertPeriodsOpen(tx: Tx, payroll: PayrollContext, instants: Date[]): Promise<void> {
  const starts = [...new Set(instants.map((at) => payPeriodContaining(at, payroll.schedule, payroll.settings).startDate))];
  if (starts.length === 0) return;
  const rows = await tx
    .select()
    .from(payPeriods)
    .where(and(eq(payPeriods.kind, payroll.schedule.kind), inArray(payPeriods.startDate, starts)))
    .for("update");
  const closed = rows.find((r) => r.status !== "open");
  if (closed) {
    throw new HttpError(423, "period_locked", `The pay period ${closed.startDate} to ${closed.endDate} is ${closed.status}; ${closed.status === "locked" ? "only the owner can unlock it" : "the bookkeeper can reopen it"} before time in it changes`);
  }
}
