import { screen, within } from "@testing-library/react";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { member } from "../../../test/fixtures.ts";
import { mockApi } from "../../../test/mock-api.ts";
import { renderWithApp } from "../../../test/render.tsx";
import { payRate } from "../test-fixtures.ts";
import { PayRateForm, PayRatesTable } from "./pay-rates.tsx";

const members = [member(), member({ userId: "u-jo", name: "Jo Kettering" }), member({ userId: "u-old", name: "Old Hand", active: false })];

describe("PayRatesTable", () => {
  it("lists each rate with its person, code, amount per hour and first day", () => {
    renderWithApp(<PayRatesTable rates={[payRate(), payRate({ id: 4, staffName: "Jo Kettering", code: "assistant", hourlyRateCents: 2200, effectiveFrom: "2026-12-07" })]} currency="USD" />);

    const rows = within(screen.getByRole("table", { name: "Pay rates" })).getAllByRole("row").slice(1);
    expect(rows.map((r) => within(r).getAllByRole("cell").map((c) => c.textContent))).toEqual([
      ["Jo Kettering", "assistant", "$22.00", "Mon 7 Dec 2026"],
      ["Priya Oduya", "engineer", "$28.00", "Mon 5 Jan 2026"],
    ]);
  });
});

describe("PayRateForm", () => {
  beforeEach(() => {
    vi.useFakeTimers({ toFake: ["Date"] });
    vi.setSystemTime(new Date("2026-12-08T18:00:00.000Z"));
  });
  afterEach(() => {
    vi.useRealTimers();
  });

  it("sends the rate in cents for the person chosen, from the date given", async () => {
    const { calls } = mockApi([
      { method: "POST", path: "/api/pay-rates", reply: { status: 201, body: payRate({ id: 9, staffUserId: "u-jo", staffName: "Jo Kettering", code: "assistant", hourlyRateCents: 2250, effectiveFrom: "2026-12-14" }) } },
    ]);
    const { user } = renderWithApp(<PayRateForm members={members} currency="USD" timeZone="America/Chicago" />);

    expect(screen.getByLabelText("From")).toHaveValue("2026-12-08");
    expect(within(screen.getByLabelText("Person")).queryByRole("option", { name: /Old Hand/ })).not.toBeInTheDocument();
    await user.selectOptions(screen.getByLabelText("Person"), "u-jo");
    await user.clear(screen.getByLabelText("Code"));
    await user.type(screen.getByLabelText("Code"), "assistant");
    await user.type(screen.getByLabelText("Rate per hour"), "22.50");
    await user.clear(screen.getByLabelText("From"));
    await user.type(screen.getByLabelText("From"), "2026-12-14");
    await user.click(screen.getByRole("button", { name: "Add pay rate" }));

    expect(await screen.findByText("Jo Kettering: assistant at $22.50 an hour from Monday 14 December 2026")).toBeInTheDocument();
    expect(calls[0]).toMatchObject({ method: "POST", path: "/api/pay-rates", body: { staffUserId: "u-jo", code: "assistant", hourlyRateCents: 2250, effectiveFrom: "2026-12-14" } });
  });

  it("checks the person, the code and the amount before sending", async () => {
    const { calls } = mockApi([]);
    const { user } = renderWithApp(<PayRateForm members={members} currency="USD" timeZone="America/Chicago" />);

    await user.clear(screen.getByLabelText("Code"));
    await user.type(screen.getByLabelText("Code"), "Lead Engineer");
    await user.type(screen.getByLabelText("Rate per hour"), "twenty");
    await user.click(screen.getByRole("button", { name: "Add pay rate" }));

    expect(await screen.findByText("Choose a person")).toBeInTheDocument();
    expect(screen.getByText("Use a short code such as engineer, assistant or shop")).toBeInTheDocument();
    expect(screen.getByText("Enter an amount such as 28.50")).toBeInTheDocument();
    expect(calls).toEqual([]);
  });
});
