import type { Role } from "@takeup/domain";
import { paths } from "./paths.ts";

export type NavItem = { label: string; href: string };

const home = (label: string): NavItem => ({ label, href: paths.home.getHref() });
const clients: NavItem = { label: "Clients", href: paths.clients.list.getHref() };
const calendar: NavItem = { label: "Calendar", href: paths.calendar.getHref() };
const bookings: NavItem = { label: "Bookings", href: paths.bookings.getHref() };
const rooms: NavItem = { label: "Rooms and rates", href: paths.rooms.getHref() };

/** What each role sees in the navigation; everything else stays out of sight. */
export const navigationByRole: Record<Role, NavItem[]> = {
  owner: [
    home("Today"),
    calendar,
    bookings,
    clients,
    rooms,
    { label: "Team", href: paths.team.getHref() },
    { label: "Studio settings", href: paths.settings.getHref() },
    { label: "Activity", href: paths.activity.getHref() },
    { label: "Caught e-mail", href: paths.devMail.getHref() },
  ],
  manager: [home("Today"), calendar, bookings, clients, rooms],
  engineer: [home("My day"), { label: "My sessions", href: paths.mySessions.getHref() }],
  bookkeeper: [home("Overview"), bookings, clients],
  client: [home("Our account"), { label: "Sessions", href: paths.sessions.getHref() }],
};

export const navigationFor = (role: Role): NavItem[] => navigationByRole[role];
