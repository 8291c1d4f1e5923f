/** Every screen's address in one place; links are built here, never by hand. */
export const paths = {
  home: { path: "/", getHref: () => "/" },
  signIn: {
    path: "/sign-in",
    getHref: (next?: string, notice?: "password-changed") => {
      const query = new URLSearchParams();
      if (next && next !== "/") query.set("next", next);
      if (notice) query.set("notice", notice);
      const search = query.toString();
      return search ? `/sign-in?${search}` : "/sign-in";
    },
  },
  forgotPassword: { path: "/forgot-password", getHref: () => "/forgot-password" },
  resetPassword: { path: "/reset-password", getHref: () => "/reset-password" },
  invitation: { path: "/invitations/:token", getHref: (token: string) => `/invitations/${encodeURIComponent(token)}` },
  clients: {
    list: { path: "/clients", getHref: () => "/clients" },
    detail: { path: "/clients/:clientId", getHref: (id: number) => `/clients/${id}` },
  },
  calendar: {
    path: "/calendar",
    getHref: (at?: { date?: string; view?: "day" | "week" }) => {
      const query = new URLSearchParams();
      if (at?.view) query.set("view", at.view);
      if (at?.date) query.set("date", at.date);
      const search = query.toString();
      return search ? `/calendar?${search}` : "/calendar";
    },
  },
  bookings: { path: "/bookings", getHref: () => "/bookings" },
  vault: {
    list: { path: "/vault", getHref: () => "/vault" },
    reel: { path: "/vault/reels/:reelId", getHref: (id: number) => `/vault/reels/${id}` },
  },
  rooms: { path: "/rooms", getHref: () => "/rooms" },
  tapeStock: { path: "/tape", getHref: () => "/tape" },
  tapePlanner: { path: "/tape/planner", getHref: () => "/tape/planner" },
  mySessions: { path: "/my-sessions", getHref: () => "/my-sessions" },
  sessions: { path: "/sessions", getHref: () => "/sessions" },
  team: { path: "/team", getHref: () => "/team" },
  settings: { path: "/settings", getHref: () => "/settings" },
  profile: { path: "/profile", getHref: () => "/profile" },
  activity: { path: "/activity", getHref: () => "/activity" },
  devMail: { path: "/dev/mail", getHref: () => "/dev/mail" },
  clock: { path: "/clock", getHref: () => "/clock" },
  myTimesheet: {
    path: "/timesheet",
    /** `week` is the first studio workday of the week shown (YYYY-MM-DD). */
    getHref: (week?: string) => (week ? `/timesheet?week=${week}` : "/timesheet"),
  },
  approvals: { path: "/approvals", getHref: () => "/approvals" },
  payPeriods: {
    list: { path: "/pay-periods", getHref: () => "/pay-periods" },
    detail: { path: "/pay-periods/:periodId", getHref: (id: number) => `/pay-periods/${id}` },
    person: {
      path: "/pay-periods/:periodId/staff/:staffUserId",
      getHref: (id: number, staffUserId: string) => `/pay-periods/${id}/staff/${encodeURIComponent(staffUserId)}`,
    },
  },
  payRates: { path: "/pay-rates", getHref: () => "/pay-rates" },
  payrollSettings: { path: "/payroll-settings", getHref: () => "/payroll-settings" },
  invoices: {
    list: { path: "/invoices", getHref: () => "/invoices" },
    detail: { path: "/invoices/:invoiceId", getHref: (id: number) => `/invoices/${id}` },
    billable: { path: "/clients/:clientId/billable", getHref: (clientId: number) => `/clients/${clientId}/billable` },
  },
  invoiceSettings: { path: "/invoice-settings", getHref: () => "/invoice-settings" },
  receivables: { path: "/receivables", getHref: (asOf?: string) => (asOf ? `/receivables?asOf=${asOf}` : "/receivables") },
} as const;

/**
 * Only our own relative paths may follow sign-in; anything else (another site, "//host")
 * would let a crafted link bounce people off Takeup after they type their password.
 */
export function safeNext(next: string | null | undefined): string {
  if (!next || !next.startsWith("/") || next.startsWith("//") || next.startsWith("/\\")) return paths.home.getHref();
  return next;
}
