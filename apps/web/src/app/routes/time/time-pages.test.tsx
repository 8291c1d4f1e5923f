import { screen } from "@testing-library/react";
import type { RouteObject } from "react-router";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import type { MeDto } from "@takeup/domain";
import { clockState, edit, entry } from "../../../features/time-clock/test-fixtures.ts";
import { engineer, manager, studio } from "../../../test/fixtures.ts";
import { mockApi } from "../../../test/mock-api.ts";
import { renderWithApp } from "../../../test/render.tsx";
import { RequireRole } from "../../require-role.tsx";
import { ApprovalsPage } from "./approvals.tsx";
import { ClockPage } from "./clock.tsx";
import { MyTimesheetPage } from "./my-timesheet.tsx";

const routes: RouteObject[] = [
  { path: "/sign-in", element: <p>Sign-in page</p> },
  { path: "/clock", element: <RequireRole roles={["owner", "manager", "engineer"]}><ClockPage /></RequireRole> },
  { path: "/timesheet", element: <RequireRole roles={["owner", "manager", "engineer"]}><MyTimesheetPage /></RequireRole> },
  { path: "/approvals", element: <RequireRole roles={["owner", "manager"]}><ApprovalsPage /></RequireRole> },
];

const api = (me: MeDto) =>
  mockApi([
    { method: "GET", path: "/api/me", reply: { body: me } },
    { method: "GET", path: "/api/studio", reply: { body: studio } },
    { method: "GET", path: "/api/time-clock", reply: { body: clockState() } },
    { method: "GET", path: "/api/time-entries", reply: { body: [entry()] } },
    { method: "GET", path: "/api/time-entry-edits", reply: { body: [edit()] } },
  ]);

describe("the time clock pages", () => {
  beforeEach(() => {
    vi.useFakeTimers({ toFake: ["Date"] });
    vi.setSystemTime(new Date("2026-12-08T18:00:00.000Z"));
  });
  afterEach(() => {
    vi.useRealTimers();
  });

  it("shows the clock with its one big button", async () => {
    api(engineer);
    renderWithApp(null, { at: "/clock", routes });

    expect(await screen.findByRole("heading", { level: 1, name: "Time clock" })).toBeInTheDocument();
    expect(await screen.findByRole("button", { name: "Clock in" })).toBeInTheDocument();
  });

  it("shows my timesheet for this studio week, asking only for my own entries", async () => {
    const { calls } = api(manager);
    renderWithApp(null, { at: "/timesheet", routes });

    expect(await screen.findByRole("heading", { level: 1, name: "My timesheet" })).toBeInTheDocument();
    expect(await screen.findByRole("heading", { name: "Week of Mon 7 Dec – Sun 13 Dec 2026" })).toBeInTheDocument();
    expect(await screen.findByRole("table", { name: "Time entries" })).toBeInTheDocument();
    expect(calls.some((c) => c.path === "/api/time-entries?from=2026-12-07&to=2026-12-13&staffUserId=u-theo")).toBe(true);
  });

  it("shows the corrections waiting to a manager", async () => {
    api(manager);
    renderWithApp(null, { at: "/approvals", routes });

    expect(await screen.findByRole("heading", { level: 1, name: "Corrections" })).toBeInTheDocument();
    expect(await screen.findByRole("button", { name: "Approve: Priya Oduya, Mon 7 Dec" })).toBeInTheDocument();
  });
});
