import { z } from "zod";
import {
  correctPayRateInput,
  createPayRateInput,
  exportQuery,
  idParams,
  payPeriodDto,
  payPeriodReviewDto,
  payRateDto,
  payrollSettingsDto,
  unlockPayPeriodInput,
  updatePayrollSettingsInput,
} from "@takeup/domain";
import { ApiRouter } from "../../lib/api-router.ts";
import type { Deps } from "../../deps.ts";
import { computePeriod } from "./compute-period.ts";
import { correctPayRate, createPayRate, listPayRates } from "./pay-rates.service.ts";
import { summaryCsv, writeWorkbook } from "./payroll-export.ts";
import { loadPayroll, updatePayrollSettings } from "./payroll-settings.ts";
import { getPeriodRow, listPayPeriods, movePayPeriod, periodFileName, reviewPayPeriod } from "./pay-periods.service.ts";

export function payPeriodsRouter({ db }: Deps) {
  const router = new ApiRouter("/api/pay-periods", "Payroll")
    .route({ method: "get", path: "/", summary: "Pay periods, newest first, with their status", access: ["owner", "manager", "bookkeeper"], response: z.array(payPeriodDto), handler: () => listPayPeriods(db) })
    .route({ method: "get", path: "/:id", summary: "A period's totals per person and its flags (open entries, missing breaks, pending corrections)", access: ["owner", "manager", "bookkeeper"], params: idParams, response: payPeriodReviewDto, handler: ({ params }) => reviewPayPeriod(db, params.id) })
    .route({
      method: "get",
      path: "/:id/export",
      summary: "Payroll hours as XLSX (summary, daily detail, raw entries) or CSV (summary); layout in docs/payroll-export.md",
      access: ["owner", "bookkeeper"],
      params: idParams,
      query: exportQuery,
      response: "file",
      handler: async ({ res, params, query }) => {
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
      },
    })
    .route({ method: "post", path: "/:id/approve", summary: "Approve a period (no pending corrections left)", access: ["owner", "manager", "bookkeeper"], params: idParams, response: payPeriodDto, handler: ({ actor, params }) => movePayPeriod(db, actor, params.id, "approve") })
    .route({ method: "post", path: "/:id/lock", summary: "Lock an approved period: its time can no longer change", access: ["owner", "bookkeeper"], params: idParams, response: payPeriodDto, handler: ({ actor, params }) => movePayPeriod(db, actor, params.id, "lock") })
    .route({ method: "post", path: "/:id/reopen", summary: "Reopen an approved (not locked) period", access: ["owner", "manager", "bookkeeper"], params: idParams, response: payPeriodDto, handler: ({ actor, params }) => movePayPeriod(db, actor, params.id, "reopen") })
    .route({ method: "post", path: "/:id/unlock", summary: "Unlock a locked period (owner only, with a reason; audited)", access: ["owner"], params: idParams, body: unlockPayPeriodInput, response: payPeriodDto, handler: ({ actor, params, body }) => movePayPeriod(db, actor, params.id, "unlock", body.reason) });
  return router;
}

export function payrollSettingsRouter({ db }: Deps) {
  return new ApiRouter("/api/payroll-settings", "Payroll")
    .route({ method: "get", path: "/", summary: "Workweek, pay periods, rounding and overtime rules (the studio's choice; see the caution)", access: ["owner", "manager", "bookkeeper"], response: payrollSettingsDto, handler: async () => (await loadPayroll(db)).dto })
    .route({ method: "patch", path: "/", summary: "Change the payroll settings", access: ["owner"], body: updatePayrollSettingsInput, response: payrollSettingsDto, handler: ({ actor, body }) => updatePayrollSettings(db, actor, body) });
}

export function payRatesRouter({ db }: Deps) {
  return new ApiRouter("/api/pay-rates", "Payroll")
    .route({ method: "get", path: "/", summary: "What each member of staff is paid per hour, by kind of work and date", access: ["owner", "bookkeeper"], response: z.array(payRateDto), handler: () => listPayRates(db) })
    .route({
      method: "post",
      path: "/",
      summary: "Set a pay rate from a date (409 when the person already has one for that code and date)",
      access: ["owner"],
      body: createPayRateInput,
      status: 201,
      response: payRateDto,
      handler: ({ actor, body }) => createPayRate(db, actor, body),
    })
    .route({
      method: "patch",
      path: "/:id",
      summary: "Correct a rate's amount or date, with a reason (audited); 423 once a locked period was computed with it",
      access: ["owner"],
      params: idParams,
      body: correctPayRateInput,
      response: payRateDto,
      handler: ({ actor, params, body }) => correctPayRate(db, actor, params.id, body),
    });
}
