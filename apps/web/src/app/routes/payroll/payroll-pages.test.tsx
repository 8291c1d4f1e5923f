import { screen, within } from "@testing-library/react";
import type { RouteObject } from "react-router";
import { describe, expect, it } from "vitest";
import { payrollCaution, type MeDto } from "@takeup/domain";
import { period, payRate, payrollSettings, review } from "../../../features/payroll/test-fixtures.ts";
import { bookkeeper, manager, member, owner, studio } from "../../../test/fixtures.ts";
import { mockApi } from "../../../test/mock-api.ts";
import { renderWithApp } from "../../../test/render.tsx";
import { RequireRole } from "../../require-role.tsx";
import { PayPeriodPage } from "./pay-period.tsx";
import { PayPeriodsPage } from "./pay-periods.tsx";
import { PayRatesPage } from "./pay-rates.tsx";
import { PayrollSettingsPage } from "./payroll-settings.tsx";

// The routes as they will be wired, so the pages are seen with a signed-in person.
const routes: RouteObject[] = [
  { path: "/sign-in", element: <p>Sign-in page</p> },
  { path: "/pay-periods", element: <RequireRole roles={["owner", "manager", "bookkeeper"]}><PayPeriodsPage /></RequireRole> },
  { path: "/pay-periods/:periodId", element: <RequireRole roles={["owner", "manager", "bookkeeper"]}><PayPeriodPage /></RequireRole> },
  { path: "/pay-rates", element: <RequireRole roles={["owner", "bookkeeper"]}><PayRatesPage /></RequireRole> },
  { path: "/payroll-settings", element: <RequireRole roles={["owner", "manager", "bookkeeper"]}><PayrollSettingsPage /></RequireRole> },
  { path: "*", element: <p>Page not found</p> },
];

const api = (me: MeDto) =>
  mockApi([
    { method: "GET", path: "/api/me", reply: { body: me } },
    { method: "GET", path: "/api/studio", reply: { body: studio } },
    { method: "GET", path: "/api/pay-periods", reply: { body: [period({ id: 10, startDate: "2026-12-07", endDate: "2026-12-13" }), period({ status: "locked", approvedByName: "Theo Vance", approvedAt: "2026-12-07T16:00:00.000Z", lockedByName: "Lena Marsh", lockedAt: "2026-12-08T22:30:00.000Z" })] } },
    { method: "GET", path: "/api/pay-periods/9", reply: { body: review() } },
    { method: "GET", path: "/api/pay-periods/404", reply: { status: 404, body: { error: { code: "not_found", message: "That pay period was not found" } } } },
    { method: "GET", path: "/api/pay-rates", reply: { body: [payRate()] } },
    { method: "GET", path: "/api/staff", reply: { body: { members: [member()], invitations: [] } } },
    { method: "GET", path: "/api/payroll-settings", reply: { body: payrollSettings() } },
  ]);

const caution = async () => within(await screen.findByRole("complementary", { name: "Payroll caution" }));

describe("the payroll pages", () => {
  it.each([
    ["/pay-periods", "Pay periods"],
    ["/pay-periods/9", "Pay period 30 Nov – 6 Dec 2026"],
    ["/pay-rates", "Pay rates"],
    ["/payroll-settings", "Payroll settings"],
  ])("%s shows its heading and the payroll caution", async (at, heading) => {
    api(owner);
    renderWithApp(null, { at, routes });

    expect(await screen.findByRole("heading", { level: 1, name: heading })).toBeInTheDocument();
    expect((await caution()).getByText(payrollCaution)).toBeInTheDocument();
  });

  it("lists the pay periods with their status and who moved them on, each opening its review", async () => {
    api(bookkeeper);
    const { user, router } = renderWithApp(null, { at: "/pay-periods", routes });

    const table = within(await screen.findByRole("table", { name: "Pay periods" }));
    const [, current, locked] = table.getAllByRole("row");
    expect(within(current!).getAllByRole("cell").map((c) => c.textContent)).toEqual(["7–13 Dec 2026", "Weekly", "Open", "—", "—"]);
    expect(within(locked!).getAllByRole("cell").map((c) => c.textContent)).toEqual([
      "30 Nov – 6 Dec 2026",
      "Weekly",
      "Locked",
      "Theo VanceMon 7 Dec, 10:00",
      "Lena MarshTue 8 Dec, 16:30",
    ]);

    await user.click(within(locked!).getByRole("link", { name: "30 Nov – 6 Dec 2026" }));
    expect(router.state.location.pathname).toBe("/pay-periods/9");
    expect(await screen.findByRole("heading", { level: 1, name: "Pay period 30 Nov – 6 Dec 2026" })).toBeInTheDocument();
  });

  it("hides locking and the export from a manager on the review", async () => {
    api(manager);
    renderWithApp(null, { at: "/pay-periods/9", routes });

    expect(await screen.findByRole("button", { name: "Approve period" })).toBeInTheDocument();
    expect(screen.queryByRole("button", { name: "Lock period" })).not.toBeInTheDocument();
    expect(screen.queryByRole("button", { name: "Download XLSX" })).not.toBeInTheDocument();
  });

  it("says a missing pay period is not found", async () => {
    api(owner);
    renderWithApp(null, { at: "/pay-periods/404", routes });
    expect(await screen.findByRole("heading", { name: "Page not found" })).toBeInTheDocument();
  });

  it("lets the owner add pay rates, and shows the bookkeeper the rates only", async () => {
    api(owner);
    const ownerView = renderWithApp(null, { at: "/pay-rates", routes });
    expect(await screen.findByRole("region", { name: "Add a pay rate" })).toBeInTheDocument();
    expect(await screen.findByLabelText("Person")).toBeInTheDocument();
    ownerView.unmount();

    const { calls } = api(bookkeeper);
    renderWithApp(null, { at: "/pay-rates", routes });
    expect(await screen.findByRole("table", { name: "Pay rates" })).toBeInTheDocument();
    expect(screen.queryByRole("region", { name: "Add a pay rate" })).not.toBeInTheDocument();
    expect(screen.getByText("Only the owner adds or changes pay rates.")).toBeInTheDocument();
    expect(calls.some((c) => c.path === "/api/staff")).toBe(false);
  });

  it("shows the payroll settings read-only to the bookkeeper", async () => {
    api(bookkeeper);
    renderWithApp(null, { at: "/payroll-settings", routes });

    expect(await screen.findByLabelText("Overtime rules")).toBeDisabled();
    expect(screen.queryByRole("button", { name: "Save payroll settings" })).not.toBeInTheDocument();
  });
});
