import { payrollRoutes } from "@takeup/domain";
import { ApiRouter } from "../../lib/api-router.ts";
import type { Deps } from "../../deps.ts";
import { computePeriod } from "./compute-period.ts";
import { correctPayRate, createPayRate, listPayRates } from "./pay-rates.service.ts";
import { summaryCsv, writeWorkbook } from "./payroll-export.ts";
import { loadPayroll, updatePayrollSettings } from "./payroll-settings.ts";
import { getPeriodRow, listPayPeriods, movePayPeriod, periodFileName, reviewPayPeriod } from "./pay-periods.service.ts";

export function payPeriodsRouter({ db }: Deps) {
  return new ApiRouter("/api/pay-periods", "Payroll")
    .handle(payrollRoutes.periods, () => listPayPeriods(db))
    .handle(payrollRoutes.period, ({ params }) => reviewPayPeriod(db, params.id))
    .handle(payrollRoutes.exportPeriod, async ({ res, params, query }) => {
      const payroll = await loadPayroll(db);
      const row = await getPeriodRow(db, params.id);
      const computed = await computePeriod(db, payroll, row);
      res.setHeader("content-disposition", `attachment; filename="${periodFileName(row, query.format)}"`);
      res.setHeader("cache-control", "no-store");
      if (query.format === "csv") {
        res.type("text/csv; charset=utf-8").send(summaryCsv(computed));
        return;
      }
      res.type("application/vnd.openxmlformats-officedocument.spreadsheetml.sheet");
      await writeWorkbook(computed, res, payroll.settings.timeZone);
    })
    .handle(payrollRoutes.approvePeriod, ({ actor, params }) => movePayPeriod(db, actor, params.id, "approve"))
    .handle(payrollRoutes.lockPeriod, ({ actor, params }) => movePayPeriod(db, actor, params.id, "lock"))
    .handle(payrollRoutes.reopenPeriod, ({ actor, params }) => movePayPeriod(db, actor, params.id, "reopen"))
    .handle(payrollRoutes.unlockPeriod, ({ actor, params, body }) => movePayPeriod(db, actor, params.id, "unlock", body.reason));
}

export function payrollSettingsRouter({ db }: Deps) {
  return new ApiRouter("/api/payroll-settings", "Payroll")
    .handle(payrollRoutes.settings, async () => (await loadPayroll(db)).dto)
    .handle(payrollRoutes.updateSettings, ({ actor, body }) => updatePayrollSettings(db, actor, body));
}

export function payRatesRouter({ db }: Deps) {
  return new ApiRouter("/api/pay-rates", "Payroll")
    .handle(payrollRoutes.rates, () => listPayRates(db))
    .handle(payrollRoutes.createRate, ({ actor, body }) => createPayRate(db, actor, body))
    .handle(payrollRoutes.correctRate, ({ actor, params, body }) => correctPayRate(db, actor, params.id, body));
}
