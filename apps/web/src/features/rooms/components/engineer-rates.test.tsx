import { screen, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import type { EngineerRateDto } from "@takeup/domain";
import { mockApi } from "../../../test/mock-api.ts";
import { renderWithApp } from "../../../test/render.tsx";
import { EngineerRates } from "./engineer-rates.tsx";

const timeZone = "America/Chicago";
const rate = (over: Partial<EngineerRateDto> = {}): EngineerRateDto => ({
  id: 5,
  grade: "assistant",
  staffUserId: null,
  staffName: null,
  hourlyRateCents: 2500,
  // 08:00 in Chicago on 1 Jan 2026.
  effectiveFrom: "2026-01-01T14:00:00.000Z",
  ...over,
});

describe("correcting an engineer rate", () => {
  it("lets the owner correct a rate's amount with a reason, keeping its start", async () => {
    const { calls } = mockApi([{ method: "PATCH", path: "/api/engineer-rates/5", reply: { body: rate({ hourlyRateCents: 2700 }) } }]);
    const { user } = renderWithApp(<EngineerRates rates={[rate()]} engineers={[]} currency="USD" timeZone={timeZone} canEdit />);

    await user.click(screen.getByRole("button", { name: "Correct: any assistant engineer from 1 Jan 2026, 08:00" }));
    const dialog = within(screen.getByRole("dialog", { name: "Correct this engineer rate" }));
    expect(dialog.getByLabelText("Effective from")).toHaveValue("2026-01-01T08:00");
    await user.clear(dialog.getByLabelText("Hourly rate"));
    await user.type(dialog.getByLabelText("Hourly rate"), "27");
    await user.type(dialog.getByLabelText("Reason"), "Meant $27");
    await user.click(dialog.getByRole("button", { name: "Save correction" }));

    expect(await screen.findByText("Rate for any assistant engineer corrected to $27.00 an hour")).toBeInTheDocument();
    expect(calls[0]).toMatchObject({ method: "PATCH", path: "/api/engineer-rates/5", body: { hourlyRateCents: 2700, effectiveFrom: "2026-01-01T08:00:00-06:00", reason: "Meant $27" } });
  });

  it("offers a manager no correction", () => {
    renderWithApp(<EngineerRates rates={[rate()]} engineers={[]} currency="USD" timeZone={timeZone} canEdit={false} />);
    expect(screen.queryByRole("button", { name: /Correct/ })).not.toBeInTheDocument();
  });
});
