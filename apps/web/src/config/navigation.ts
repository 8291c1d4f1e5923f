import type { Role } from "@takeup/domain";
import { paths } from "./paths.ts";

/** `group` puts a small heading above the first item of a run with the same group. */
export type NavItem = { label: string; href: string; group?: string };

const home = (label: string): NavItem => ({ label, href: paths.home.getHref() });
const clients: NavItem = { label: "Clients", href: paths.clients.list.getHref() };
const calendar: NavItem = { label: "Calendar", href: paths.calendar.getHref() };
const bookings: NavItem = { label: "Bookings", href: paths.bookings.getHref() };
const rooms: NavItem = { label: "Rooms and rates", href: paths.rooms.getHref() };
const tapeStock: NavItem = { label: "Tape stock", href: paths.tapeStock.getHref() };
const tapePlanner: NavItem = { label: "Tape planner", href: paths.tapePlanner.getHref() };
const vault: NavItem = { label: "Vault", href: paths.vault.list.getHref() };
const myTimesheet: NavItem = { label: "My timesheet", href: paths.myTimesheet.getHref() };
const payPeriods: NavItem = { label: "Pay periods", href: paths.payPeriods.list.getHref() };
const payRates: NavItem = { label: "Pay rates", href: paths.payRates.getHref() };
const payrollSettings: NavItem = { label: "Payroll settings", href: paths.payrollSettings.getHref() };
const money: NavItem[] = [
  { label: "Invoices", href: paths.invoices.list.getHref(), group: "Money" },
  { label: "A/R ageing", href: paths.receivables.getHref(), group: "Money" },
];

const timeAndPay = "Time and pay";
const inGroup = (group: string, ...items: NavItem[]): NavItem[] => items.map((item) => ({ ...item, group }));
const clock: NavItem = { label: "Time clock", href: paths.clock.getHref() };
const corrections: NavItem = { label: "Corrections", href: paths.approvals.getHref() };

/** What each role sees in the navigation; everything else stays out of sight. */
export const navigationByRole: Record<Role, NavItem[]> = {
  owner: [
    home("Today"),
    calendar,
    bookings,
    clients,
    rooms,
    tapeStock,
    vault,
    ...money,
    ...inGroup(timeAndPay, clock, myTimesheet, corrections, payPeriods, payRates, payrollSettings),
    ...inGroup(
      "Studio",
      { label: "Team", href: paths.team.getHref() },
      { label: "Studio settings", href: paths.settings.getHref() },
      { label: "Activity", href: paths.activity.getHref() },
      { label: "Caught e-mail", href: paths.devMail.getHref() },
    ),
  ],
  manager: [
    home("Today"),
    calendar,
    bookings,
    clients,
    rooms,
    tapeStock,
    vault,
    ...money,
    ...inGroup(timeAndPay, clock, myTimesheet, corrections, payPeriods, payrollSettings),
  ],
  // The engineer's home is the clock, so "Time clock" is not listed twice.
  engineer: [home("My day"), { label: "My sessions", href: paths.mySessions.getHref() }, myTimesheet, tapePlanner, vault],
  bookkeeper: [home("Overview"), payPeriods, payRates, payrollSettings, bookings, clients, tapeStock, vault, ...money],
  client: [home("Our account"), { label: "Sessions", href: paths.sessions.getHref() }, { label: "Invoices", href: paths.invoices.list.getHref() }, { label: "Your reels", href: paths.vault.list.getHref() }],
};

export const navigationFor = (role: Role): NavItem[] => navigationByRole[role];
