import { render, screen, within } from "@testing-library/react";
import { createMemoryRouter, RouterProvider } from "react-router";
import { describe, expect, it } from "vitest";
import type { Role } from "@takeup/domain";
import { navigationFor } from "../../config/navigation.ts";
import { SideNav } from "./side-nav.tsx";

function renderNav(role: Role, at = "/") {
  const router = createMemoryRouter([{ path: "*", element: <SideNav items={navigationFor(role)} /> }], { initialEntries: [at] });
  render(<RouterProvider router={router} />);
  return within(screen.getByRole("navigation", { name: "Main" }));
}

const labels = (nav: ReturnType<typeof renderNav>) => nav.getAllByRole("link").map((link) => link.textContent);

describe("SideNav", () => {
  it("shows the owner every area, Team included", () => {
    const nav = renderNav("owner");
    expect(labels(nav)).toEqual([
      "Today",
      "Calendar",
      "Bookings",
      "Clients",
      "Rooms and rates",
      "Tape stock",
      "Vault",
      "Invoices",
      "A/R ageing",
      "Time clock",
      "My timesheet",
      "Corrections",
      "Pay periods",
      "Pay rates",
      "Payroll settings",
      "Team",
      "Studio settings",
      "Activity",
      "Caught e-mail",
    ]);
  });

  it("gives the manager the calendar, bookings and rooms but not the owner's areas", () => {
    const nav = renderNav("manager");
    expect(labels(nav)).toEqual([
      "Today",
      "Calendar",
      "Bookings",
      "Clients",
      "Rooms and rates",
      "Tape stock",
      "Vault",
      "Invoices",
      "A/R ageing",
      "Time clock",
      "My timesheet",
      "Corrections",
      "Pay periods",
      "Payroll settings",
    ]);
    expect(nav.queryByRole("link", { name: "Pay rates" })).not.toBeInTheDocument();
    expect(nav.queryByRole("link", { name: "Team" })).not.toBeInTheDocument();
  });

  it("gives an engineer their day, their sessions and their timesheet, the tape planner and the vault, and nothing about clients or money", () => {
    expect(labels(renderNav("engineer"))).toEqual(["My day", "My sessions", "My timesheet", "Tape planner", "Vault"]);
  });

  it("shows a client only its own account, sessions and invoices, and no Team or Clients", () => {
    const nav = renderNav("client");
    expect(labels(nav)).toEqual(["Our account", "Sessions", "Invoices", "Your reels"]);
    expect(nav.queryByRole("link", { name: "Team" })).not.toBeInTheDocument();
    expect(nav.queryByRole("link", { name: "Clients" })).not.toBeInTheDocument();
  });

  it("gives the bookkeeper the pay periods first, then the bookings, the clients list, tape, the vault and the money", () => {
    expect(labels(renderNav("bookkeeper"))).toEqual(["Overview", "Pay periods", "Pay rates", "Payroll settings", "Bookings", "Clients", "Tape stock", "Vault", "Invoices", "A/R ageing"]);
  });

  it("marks the page you are on, and not home as well", () => {
    const nav = renderNav("manager", "/clients/3");
    expect(nav.getByRole("link", { name: "Clients" })).toHaveAttribute("aria-current", "page");
    expect(nav.getByRole("link", { name: "Today" })).not.toHaveAttribute("aria-current");
  });
});
