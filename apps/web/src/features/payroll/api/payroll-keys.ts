export const payrollKeys = {
  all: ["payroll"] as const,
  periods: () => [...payrollKeys.all, "periods"] as const,
  periodList: () => [...payrollKeys.periods(), "list"] as const,
  period: (id: number) => [...payrollKeys.periods(), "detail", id] as const,
  settings: () => [...payrollKeys.all, "settings"] as const,
  rates: () => [...payrollKeys.all, "rates"] as const,
};
