/**
 * Payroll's addresses, ready to move into config/paths.ts when the
 * routes are wired (screens here build their links from these).
 */
export const payrollPaths = {
  payPeriods: {
    list: { path: "/pay-periods", getHref: () => "/pay-periods" },
    detail: { path: "/pay-periods/:periodId", getHref: (id: number) => `/pay-periods/${id}` },
  },
  payRates: { path: "/pay-rates", getHref: () => "/pay-rates" },
  payrollSettings: { path: "/payroll-settings", getHref: () => "/payroll-settings" },
} as const;
