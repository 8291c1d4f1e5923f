import { screen, within } from "@testing-library/react";
import { describe, expect, it, vi } from "vitest";
import { studio } from "../../../test/fixtures.ts";
import { mockApi } from "../../../test/mock-api.ts";
import { renderWithApp } from "../../../test/render.tsx";
import { StudioSettingsForm } from "./studio-settings-form.tsx";

describe("StudioSettingsForm", () => {
  it("shows the deposit and fee tiers as percent, and sends them back as basis points", async () => {
    const { calls } = mockApi([{ method: "PATCH", path: "/api/studio", reply: { body: studio } }]);
    const { user } = renderWithApp(<StudioSettingsForm studio={studio} />);
    const bookings = within(screen.getByRole("region", { name: "Bookings" }));

    expect(bookings.getByLabelText("Holds last (hours)")).toHaveValue(72);
    expect(bookings.getByLabelText("Deposit (%)")).toHaveValue(25);
    expect(bookings.getAllByLabelText("Fee (%)").map((input) => (input as HTMLInputElement).value)).toEqual(["50", "100"]);

    await user.clear(bookings.getByLabelText("Holds last (hours)"));
    await user.type(bookings.getByLabelText("Holds last (hours)"), "48");
    await user.clear(bookings.getByLabelText("Deposit (%)"));
    await user.type(bookings.getByLabelText("Deposit (%)"), "12.5");
    await user.click(bookings.getByRole("button", { name: "Remove fee tier 2" }));
    await user.click(bookings.getByRole("button", { name: "Add a fee tier" }));
    const notice = bookings.getAllByLabelText("Less than (hours' notice)");
    const fee = bookings.getAllByLabelText("Fee (%)");
    await user.clear(notice[1]!);
    await user.type(notice[1]!, "12");
    await user.clear(fee[1]!);
    await user.type(fee[1]!, "75");
    expect(bookings.getByText("Less than 12 hours' notice → 75% of the quoted price.")).toBeInTheDocument();
    await user.click(screen.getByRole("button", { name: "Save settings" }));

    expect(await screen.findByText("Studio settings saved")).toBeInTheDocument();
    expect(calls[0]?.body).toMatchObject({
      holdHours: 48,
      depositBp: 1250,
      cancellationTiers: [
        { noticeUnderHours: 48, feeBp: 5000 },
        { noticeUnderHours: 12, feeBp: 7500 },
      ],
    });
    expect(calls[0]?.body).not.toHaveProperty("depositPercent");
  });

  it("refuses a deposit over 100% before sending", async () => {
    const { calls } = mockApi([]);
    const { user } = renderWithApp(<StudioSettingsForm studio={studio} />);

    await user.clear(screen.getByLabelText("Deposit (%)"));
    await user.type(screen.getByLabelText("Deposit (%)"), "150");
    await user.click(screen.getByRole("button", { name: "Save settings" }));

    expect(await screen.findByText("A deposit is at most 100%")).toBeInTheDocument();
    await vi.waitFor(() => expect(calls).toEqual([]));
  });
});
