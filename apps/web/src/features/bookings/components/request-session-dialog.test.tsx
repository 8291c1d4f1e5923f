import { screen, within } from "@testing-library/react";
import { describe, expect, it, vi } from "vitest";
import { booking, quoteResult, rooms } from "../../../test/fixtures.ts";
import { mockApi } from "../../../test/mock-api.ts";
import { renderWithApp } from "../../../test/render.tsx";
import { RequestSessionDialog } from "./request-session-dialog.tsx";

describe("RequestSessionDialog", () => {
  it("sends the room and studio-time instants as a request, and says the studio will confirm it", async () => {
    const { calls } = mockApi([
      { method: "GET", path: "/api/clients/1/projects", reply: { body: [{ id: 41, clientAccountId: 1, name: "Night Sketches EP", notes: null, active: true }] } },
      { method: "POST", path: "/api/quotes", reply: { body: quoteResult() } },
      { method: "POST", path: "/api/booking-requests", reply: { status: 201, body: booking({ status: "hold", requestedByClient: true }) } },
      { method: "GET", path: "/api/bookings", reply: { body: [] } },
    ]);
    const onClose = vi.fn();
    const { user } = renderWithApp(<RequestSessionDialog open onClose={onClose} rooms={rooms} clientId={1} timeZone="America/Chicago" />);
    const form = within(screen.getByRole("dialog", { name: "Request a session" }));

    await user.selectOptions(form.getByLabelText("Room"), "2");
    await user.clear(form.getByLabelText("Date"));
    await user.type(form.getByLabelText("Date"), "2026-12-14");
    await user.clear(form.getByLabelText("Start"));
    await user.type(form.getByLabelText("Start"), "12:00");
    await user.clear(form.getByLabelText("End"));
    await user.type(form.getByLabelText("End"), "16:00");
    await user.selectOptions(await form.findByRole("combobox", { name: "Project" }), "Night Sketches EP");
    await user.type(form.getByLabelText("Notes"), "Vocals, Jo assisting if free");
    expect(await form.findByText("Total $285.00")).toBeInTheDocument();
    await user.click(form.getByRole("button", { name: "Send request" }));

    expect(await screen.findByText("Request sent — the studio will confirm it")).toBeInTheDocument();
    expect(onClose).toHaveBeenCalled();
    expect(calls.find((c) => c.path === "/api/booking-requests")?.body).toEqual({
      roomId: 2,
      startsAt: "2026-12-14T12:00:00-06:00",
      endsAt: "2026-12-14T16:00:00-06:00",
      projectId: 41,
      notes: "Vocals, Jo assisting if free",
    });
  });
});
