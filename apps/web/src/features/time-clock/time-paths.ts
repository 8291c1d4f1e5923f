/**
 * The time clock's addresses, ready to move into config/paths.ts when the
 * routes are wired (screens here build their links from these).
 */
export const timePaths = {
  clock: { path: "/clock", getHref: () => "/clock" },
  myTimesheet: {
    path: "/timesheet",
    /** `week` is the first studio workday of the week shown (YYYY-MM-DD). */
    getHref: (week?: string) => (week ? `/timesheet?week=${week}` : "/timesheet"),
  },
  approvals: { path: "/approvals", getHref: () => "/approvals" },
} as const;
