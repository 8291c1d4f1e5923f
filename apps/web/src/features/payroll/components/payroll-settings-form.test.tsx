import { screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { mockApi } from "../../../test/mock-api.ts";
import { renderWithApp } from "../../../test/render.tsx";
import { payrollSettings } from "../test-fixtures.ts";
import { PayrollSettingsForm } from "./payroll-settings-form.tsx";

describe("PayrollSettingsForm", () => {
  it("saves every setting, asking for the two-week anchor only for two-week periods", async () => {
    const { calls } = mockApi([
      { method: "PATCH", path: "/api/payroll-settings", reply: ({ body }) => ({ body: payrollSettings(body as object) }) },
    ]);
    const { user } = renderWithApp(<PayrollSettingsForm settings={payrollSettings()} canEdit />);

    expect(screen.queryByLabelText("First day of a two-week period")).not.toBeInTheDocument();
    await user.selectOptions(screen.getByLabelText("Pay periods"), "Every two weeks");
    await user.clear(screen.getByLabelText("First day of a two-week period"));
    await user.type(screen.getByLabelText("First day of a two-week period"), "2026-11-30");
    await user.selectOptions(screen.getByLabelText("Workweek starts on"), "Sunday");
    await user.selectOptions(screen.getByLabelText("Workweek starts at (hour)"), "06:00");
    await user.selectOptions(screen.getByLabelText("Round punches"), "Nearest quarter hour");
    await user.selectOptions(screen.getByLabelText("Overtime rules"), "Daily and weekly, with a seventh-day rule");
    await user.click(screen.getByRole("checkbox", { name: "Round the regular rate to the cent before halving" }));
    await user.clear(screen.getByLabelText("Flag entries open longer than (hours)"));
    await user.type(screen.getByLabelText("Flag entries open longer than (hours)"), "14");
    await user.click(screen.getByRole("button", { name: "Save payroll settings" }));

    expect(await screen.findByText("Payroll settings saved")).toBeInTheDocument();
    expect(calls[0]?.body).toEqual({
      workweekStartDay: 7,
      workweekStartHour: 6,
      payPeriodKind: "fortnightly",
      payPeriodAnchor: "2026-11-30",
      punchRounding: "15",
      overtimeRules: "daily_weekly_seventh_day",
      roundRegularRateToCent: true,
      openEntryLimitHours: 14,
    });
  });

  it("checks the open-entry limit before saving", async () => {
    const { calls } = mockApi([]);
    const { user } = renderWithApp(<PayrollSettingsForm settings={payrollSettings()} canEdit />);

    await user.clear(screen.getByLabelText("Flag entries open longer than (hours)"));
    await user.type(screen.getByLabelText("Flag entries open longer than (hours)"), "2");
    await user.click(screen.getByRole("button", { name: "Save payroll settings" }));

    expect(await screen.findByText("At least 4 hours")).toBeInTheDocument();
    expect(calls).toEqual([]);
  });

  it("is read-only for the manager and the bookkeeper, with no save button", () => {
    mockApi([]);
    renderWithApp(<PayrollSettingsForm settings={payrollSettings({ payPeriodKind: "fortnightly" })} canEdit={false} />);

    expect(screen.getByLabelText("Workweek starts on")).toBeDisabled();
    expect(screen.getByLabelText("First day of a two-week period")).toHaveValue("2026-01-05");
    expect(screen.getByRole("checkbox", { name: "Round the regular rate to the cent before halving" })).toBeDisabled();
    expect(screen.queryByRole("button", { name: "Save payroll settings" })).not.toBeInTheDocument();
    expect(screen.getByText("Changes apply to every pay period that is not locked. Locked periods keep the settings they were locked with.")).toBeInTheDocument();
  });
});
