import { screen, within } from "@testing-library/react";
import { describe, expect, it, vi } from "vitest";
import { rateCard, roomA } from "../../../test/fixtures.ts";
import { mockApi } from "../../../test/mock-api.ts";
import { renderWithApp } from "../../../test/render.tsx";
import { RateCardFormDialog } from "./rate-card-form-dialog.tsx";

describe("RateCardFormDialog", () => {
  it("turns dollars, hours, times and percent into the cents, minutes and basis points the API keeps", async () => {
    const { calls } = mockApi([
      { method: "POST", path: "/api/rooms/1/rate-cards", reply: { status: 201, body: rateCard({ id: 10, version: 3 }) } },
      { method: "GET", path: "/api/rooms", reply: { body: [] } },
    ]);
    const onClose = vi.fn();
    const { user } = renderWithApp(<RateCardFormDialog open onClose={onClose} room={roomA} timeZone="America/Chicago" currency="USD" />);
    const form = within(screen.getByRole("dialog", { name: "New rate card version for Room A" }));

    // It starts from the prices in force.
    expect(form.getByLabelText("Hourly rate")).toHaveValue("65.00");
    expect(form.getByLabelText("After-hours from")).toHaveValue("22:00");

    const fill = async (label: string, value: string) => {
      await user.clear(form.getByLabelText(label));
      await user.type(form.getByLabelText(label), value);
    };
    await fill("Hourly rate", "72.50");
    await fill("Day rate", "580");
    await fill("Day covers (hours)", "10");
    await fill("Minimum (hours)", "2.5");
    await fill("Billing increment (minutes)", "15");
    await fill("After-hours from", "23:00");
    await fill("After-hours to", "07:30");
    await fill("After-hours premium (%)", "25");
    await fill("Weekend premium (%)", "12.5");
    await user.type(form.getByLabelText(/^Lockout day rate/), "700");
    await user.click(form.getByRole("checkbox", { name: "Add the weekend premium to lockout days on Saturday and Sunday" }));
    await fill("Effective from", "2027-01-04T09:00");
    await user.type(form.getByLabelText("Note"), "New year prices");
    expect(form.getByText(/Existing bookings keep the prices they were quoted on/)).toBeInTheDocument();
    await user.click(form.getByRole("button", { name: "Save new version" }));

    await vi.waitFor(() => expect(onClose).toHaveBeenCalled());
    expect(calls.find((c) => c.method === "POST")?.body).toEqual({
      hourlyRateCents: 7250,
      dayRateCents: 58000,
      dayCoversMinutes: 600,
      minimumBillableMinutes: 150,
      billingIncrementMinutes: 15,
      afterHoursStartMinute: 1380,
      afterHoursEndMinute: 450,
      afterHoursPremiumBp: 2500,
      weekendPremiumBp: 1250,
      lockoutDayRateCents: 70000,
      lockoutWeekendPremium: true,
      // 09:00 on a January Monday in Chicago (UTC−6).
      effectiveFrom: "2027-01-04T09:00:00-06:00",
      note: "New year prices",
    });
    expect(await screen.findByText("Room A rate card version 3 saved")).toBeInTheDocument();
  });

  it("leaves the start to the server when Effective from is left at now", async () => {
    const { calls } = mockApi([
      { method: "POST", path: "/api/rooms/1/rate-cards", reply: { status: 201, body: rateCard({ id: 10, version: 3 }) } },
      { method: "GET", path: "/api/rooms", reply: { body: [] } },
    ]);
    const { user } = renderWithApp(<RateCardFormDialog open onClose={() => undefined} room={roomA} timeZone="America/Chicago" currency="USD" />);

    await user.click(screen.getByRole("button", { name: "Save new version" }));
    await vi.waitFor(() => expect(calls.some((c) => c.method === "POST")).toBe(true));
    expect(calls.find((c) => c.method === "POST")?.body).not.toHaveProperty("effectiveFrom");
  });

  it("checks the amounts before sending anything", async () => {
    const { calls } = mockApi([]);
    const { user } = renderWithApp(
      <RateCardFormDialog open onClose={() => undefined} room={{ ...roomA, currentRateCard: null }} timeZone="America/Chicago" currency="USD" />,
    );

    await user.click(screen.getByRole("button", { name: "Save new version" }));
    expect(await screen.findAllByText("Enter an amount such as 85 or 85.50")).toHaveLength(2);
    expect(screen.getByLabelText("Hourly rate")).toHaveAttribute("aria-invalid", "true");
    expect(calls).toEqual([]);
  });
});
