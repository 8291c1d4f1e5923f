import type { Role } from "@takeup/domain";
import { paths } from "./paths.ts";

export type NavItem = { label: string; href: string };

const home = (label: string): NavItem => ({ label, href: paths.home.getHref() });
const clients: NavItem = { label: "Clients", href: paths.clients.list.getHref() };

/** What each role sees in the navigation; everything else stays out of sight. */
export const navigationByRole: Record<Role, NavItem[]> = {
  owner: [
    home("Today"),
    clients,
    { label: "Team", href: paths.team.getHref() },
    { label: "Studio settings", href: paths.settings.getHref() },
    { label: "Activity", href: paths.activity.getHref() },
    { label: "Caught e-mail", href: paths.devMail.getHref() },
  ],
  manager: [home("Today"), clients],
  engineer: [home("My day")],
  bookkeeper: [home("Overview"), clients],
  client: [home("Our account")],
};

export const navigationFor = (role: Role): NavItem[] => navigationByRole[role];
