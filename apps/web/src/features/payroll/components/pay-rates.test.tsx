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

describe("correcting a pay rate", () => {
  it("lets the owner correct a rate no locked period used, with a reason, and says which ones a locked period used", async () => {
    const { calls } = mockApi([
      { method: "PATCH", path: "/api/pay-rates/3", reply: { body: payRate({ hourlyRateCents: 2850 }) } },
    ]);
    const { user } = renderWithApp(<PayRatesTable rates={[payRate(), payRate({ id: 4, staffName: "Jo Kettering", code: "assistant", usedByLockedPeriod: true })]} currency="USD" canCorrect />);

    const rows = within(screen.getByRole("table", { name: "Pay rates" })).getAllByRole("row").slice(1);
    expect(rows[0]).toHaveTextContent("Used by a locked period");
    expect(within(rows[0]!).queryByRole("button", { name: /Correct/ })).not.toBeInTheDocument();
    await user.click(within(rows[1]!).getByRole("button", { name: "Correct: Priya Oduya, engineer from 2026-01-05" }));
    const dialog = within(screen.getByRole("dialog", { name: "Correct this pay rate" }));
    expect(dialog.getByLabelText("Rate per hour")).toHaveValue("28.00");
    await user.clear(dialog.getByLabelText("Rate per hour"));
    await user.type(dialog.getByLabelText("Rate per hour"), "28.50");
    await user.click(dialog.getByRole("button", { name: "Save correction" }));
    expect(await dialog.findByText("Say why the rate is corrected")).toBeInTheDocument();
    expect(calls).toHaveLength(0);
    await user.type(dialog.getByLabelText("Reason"), "Typed 28 instead of 28.50");
    await user.click(dialog.getByRole("button", { name: "Save correction" }));

    expect(await screen.findByText("Priya Oduya: engineer corrected to $28.50 an hour from Monday 5 January 2026")).toBeInTheDocument();
    expect(calls[0]).toMatchObject({ method: "PATCH", path: "/api/pay-rates/3", body: { hourlyRateCents: 2850, effectiveFrom: "2026-01-05", reason: "Typed 28 instead of 28.50" } });
    expect(screen.queryByRole("dialog")).not.toBeInTheDocument();
  });

  it("offers no correction to the bookkeeper, who only reads the rates", () => {
    renderWithApp(<PayRatesTable rates={[payRate()]} currency="USD" />);
    expect(screen.queryByRole("button", { name: /Correct/ })).not.toBeInTheDocument();
  });

  it("shows the API's refusal of a duplicate date in the dialog", async () => {
    mockApi([
      {
        method: "PATCH",
        path: "/api/pay-rates/3",
        reply: { status: 409, body: { error: { code: "duplicate_pay_rate", message: "Priya Oduya already has an engineer rate from 2026-02-02; correct that rate instead of adding another", details: [{ field: "effectiveFrom", rule: "unique", message: "One rate per person, code and date" }] } } },
      },
    ]);
    const { user } = renderWithApp(<PayRatesTable rates={[payRate()]} currency="USD" canCorrect />);
    await user.click(screen.getByRole("button", { name: /Correct: Priya Oduya/ }));
    const dialog = within(screen.getByRole("dialog", { name: "Correct this pay rate" }));
    await user.clear(dialog.getByLabelText("From"));
    await user.type(dialog.getByLabelText("From"), "2026-02-02");
    await user.type(dialog.getByLabelText("Reason"), "Wrong month");
    await user.click(dialog.getByRole("button", { name: "Save correction" }));
    expect(await dialog.findByText("One rate per person, code and date")).toBeInTheDocument();
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
