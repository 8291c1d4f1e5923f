import { z } from "zod";
import { idParams } from "./common.ts";
import { defineRoute } from "./route.ts";
import {
  correctPayRateInput,
  createPayRateInput,
  exportQuery,
  payPeriodDto,
  payPeriodReviewDto,
  payRateDto,
  payrollSettingsDto,
  unlockPayPeriodInput,
  updatePayrollSettingsInput,
} from "./time.ts";

const periodReaders = ["owner", "manager", "bookkeeper"] as const;

/** Pay periods, payroll settings and pay rates, declared once for the API and the web. */
export const payrollRoutes = {
  periods: defineRoute({ method: "get", path: "/api/pay-periods", summary: "Pay periods, newest first, with their status", access: periodReaders, response: z.array(payPeriodDto) }),
  period: defineRoute({
    method: "get",
    path: "/api/pay-periods/:id",
    summary: "A period's totals per person and its flags (open entries, missing breaks, pending corrections)",
    access: periodReaders,
    params: idParams,
    response: payPeriodReviewDto,
  }),
  exportPeriod: defineRoute({
    method: "get",
    path: "/api/pay-periods/:id/export",
    summary: "Payroll hours as XLSX (summary, daily detail, raw entries) or CSV (summary); layout in docs/payroll-export.md",
    access: ["owner", "bookkeeper"],
    params: idParams,
    query: exportQuery,
    response: "file",
  }),
  approvePeriod: defineRoute({
    method: "post",
    path: "/api/pay-periods/:id/approve",
    summary: "Approve a period (no pending corrections left)",
    access: periodReaders,
    params: idParams,
    response: payPeriodDto,
  }),
  lockPeriod: defineRoute({
    method: "post",
    path: "/api/pay-periods/:id/lock",
    summary: "Lock an approved period: its time can no longer change",
    access: ["owner", "bookkeeper"],
    params: idParams,
    response: payPeriodDto,
  }),
  reopenPeriod: defineRoute({
    method: "post",
    path: "/api/pay-periods/:id/reopen",
    summary: "Reopen an approved (not locked) period",
    access: periodReaders,
    params: idParams,
    response: payPeriodDto,
  }),
  unlockPeriod: defineRoute({
    method: "post",
    path: "/api/pay-periods/:id/unlock",
    summary: "Unlock a locked period (owner only, with a reason; audited)",
    access: ["owner"],
    params: idParams,
    body: unlockPayPeriodInput,
    response: payPeriodDto,
  }),
  settings: defineRoute({
    method: "get",
    path: "/api/payroll-settings",
    summary: "Workweek, pay periods, rounding and overtime rules (the studio's choice; see the caution)",
    access: periodReaders,
    response: payrollSettingsDto,
  }),
  updateSettings: defineRoute({
    method: "patch",
    path: "/api/payroll-settings",
    summary: "Change the payroll settings",
    access: ["owner"],
    body: updatePayrollSettingsInput,
    response: payrollSettingsDto,
  }),
  rates: defineRoute({
    method: "get",
    path: "/api/pay-rates",
    summary: "What each member of staff is paid per hour, by kind of work and date",
    access: ["owner", "bookkeeper"],
    response: z.array(payRateDto),
  }),
  createRate: defineRoute({
    method: "post",
    path: "/api/pay-rates",
    summary: "Set a pay rate from a date (409 when the person already has one for that code and date)",
    access: ["owner"],
    body: createPayRateInput,
    status: 201,
    response: payRateDto,
  }),
  correctRate: defineRoute({
    method: "patch",
    path: "/api/pay-rates/:id",
    summary: "Correct a rate's amount or date, with a reason (audited); 423 once a locked period was computed with it",
    access: ["owner"],
    params: idParams,
    body: correctPayRateInput,
    response: payRateDto,
  }),
};
