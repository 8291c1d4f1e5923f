import { screen, within } from "@testing-library/react";
import { describe, expect, it, vi } from "vitest";
import { booking, clientSummaries, engineers, quoteResult, rooms, tapeMachine } from "../../../test/fixtures.ts";
import { mockApi } from "../../../test/mock-api.ts";
import { renderWithApp } from "../../../test/render.tsx";
import { QuotePanel } from "./quote-panel.tsx";

const slot = { roomId: 1, date: "2026-12-07", start: "10:00", end: "13:00" };

function renderPanel(onClose = vi.fn(), onBooked = vi.fn()) {
  const view = renderWithApp(
    <QuotePanel
      open
      onClose={onClose}
      onBooked={onBooked}
      initial={slot}
      rooms={rooms}
      clients={clientSummaries}
      engineers={engineers}
      equipment={[tapeMachine]}
      timeZone="America/Chicago"
    />,
  );
  const panel = within(screen.getByRole("dialog", { name: "New booking" }));
  return { ...view, panel, onClose, onBooked };
}

const projects = { method: "GET" as const, path: /^\/api\/clients\/\d+\/projects$/, reply: { body: [{ id: 40, clientAccountId: 3, name: "Second album", notes: null, active: true }] } };

describe("QuotePanel", () => {
  it("shows every quote line with its explanation, the total, the rate card and the deposit before anything is booked", async () => {
    const { calls } = mockApi([{ method: "POST", path: "/api/quotes", reply: { body: quoteResult() } }]);
    const { panel } = renderPanel();

    expect(panel.getByLabelText("Room")).toHaveValue("1");
    expect(panel.getByLabelText("Date")).toHaveValue("2026-12-07");
    expect(panel.getByLabelText("Start")).toHaveValue("10:00");
    expect(panel.getByLabelText("End")).toHaveValue("13:00");

    expect(await panel.findByText("Total $285.00")).toBeInTheDocument();
    expect(panel.getByText("3 h of room time at $65.00 an hour; cheaper than the day rate of $520.00.")).toBeInTheDocument();
    expect(panel.getByText("3 h at the engineer rate of $30.00 an hour.")).toBeInTheDocument();
    expect(panel.getByText("$195.00")).toBeInTheDocument();
    expect(panel.getByText("$90.00")).toBeInTheDocument();
    expect(panel.getByText("Room A rate card v2 (from 1 Nov 2026)")).toBeInTheDocument();
    expect(panel.getByText("$71.25")).toBeInTheDocument();

    // Studio-local 10:00 in December Chicago is sent with the studio's offset, not the browser's.
    expect(calls.filter((c) => c.method === "POST").map((c) => c.path)).toEqual(["/api/quotes"]);
    expect(calls[0]?.body).toEqual({ roomId: 1, startsAt: "2026-12-07T10:00:00-06:00", endsAt: "2026-12-07T13:00:00-06:00", engineerIds: [], equipmentIds: [] });
  });

  it("asks again as the fields change, with the engineers ticked", async () => {
    const { calls } = mockApi([{ method: "POST", path: "/api/quotes", reply: { body: quoteResult() } }]);
    const { panel, user } = renderPanel();
    await panel.findByText("Total $285.00");

    await user.click(panel.getByRole("checkbox", { name: "Sam Reyes" }));
    await user.click(panel.getByRole("checkbox", { name: "Two-inch 24-track tape machine" }));

    await vi.waitFor(() => expect(calls.at(-1)?.body).toMatchObject({ engineerIds: ["u-sam"], equipmentIds: [31] }));
  });

  it("names what is in the way, and disables booking when a confirmed booking holds the slot", async () => {
    mockApi([
      {
        method: "POST",
        path: "/api/quotes",
        reply: {
          body: quoteResult({
            conflicts: [
              { resource: "room", name: "Room A", bookingId: 9, status: "confirmed", startsAt: "2026-12-07T16:00:00.000Z", endsAt: "2026-12-07T19:00:00.000Z", clientName: "Copper Vale" },
            ],
            canQueueBehindHold: false,
          }),
        },
      },
    ]);
    const { panel } = renderPanel();

    expect(await panel.findByText("Room A is booked 10:00–13:00 by Copper Vale")).toBeInTheDocument();
    expect(panel.getByRole("button", { name: "Pencil a hold" })).toBeDisabled();
    expect(panel.getByRole("button", { name: "Book and confirm" })).toBeDisabled();
    expect(panel.queryByRole("button", { name: "Queue as second hold" })).not.toBeInTheDocument();
  });

  it("offers to queue a second hold when only a hold is in the way, and sends it as one", async () => {
    const { calls } = mockApi([
      {
        method: "POST",
        path: "/api/quotes",
        reply: {
          body: quoteResult({
            conflicts: [
              { resource: "room", name: "Room A", bookingId: 9, status: "hold", startsAt: "2026-12-07T16:00:00.000Z", endsAt: "2026-12-07T19:00:00.000Z", clientName: "Lantern Static" },
            ],
            canQueueBehindHold: true,
          }),
        },
      },
      { method: "POST", path: "/api/bookings", reply: { status: 201, body: booking({ status: "hold", queuedBehindId: 9 }) } },
      projects,
    ]);
    const { panel, user, onBooked } = renderPanel();

    await user.selectOptions(panel.getByLabelText("Client"), "Copper Vale");
    expect(await panel.findByText("Room A is held 10:00–13:00 by Lantern Static")).toBeInTheDocument();
    expect(panel.getByRole("button", { name: "Pencil a hold" })).toBeDisabled();
    await user.click(panel.getByRole("button", { name: "Queue as second hold" }));

    await vi.waitFor(() => expect(onBooked).toHaveBeenCalled());
    expect(calls.find((c) => c.path === "/api/bookings")?.body).toMatchObject({ roomId: 1, clientAccountId: 3, status: "hold", queueBehindHold: true });
    expect(await screen.findByText("Second hold pencilled for Copper Vale")).toBeInTheDocument();
  });

  it("books and confirms with the client, project, engineers and studio-time instants", async () => {
    const { calls } = mockApi([
      { method: "POST", path: "/api/quotes", reply: { body: quoteResult() } },
      { method: "POST", path: "/api/bookings", reply: { status: 201, body: booking() } },
      projects,
    ]);
    const { panel, user, onClose } = renderPanel();

    await user.selectOptions(panel.getByLabelText("Client"), "Copper Vale");
    await user.selectOptions(await panel.findByRole("combobox", { name: "Project" }), "Second album");
    await user.click(panel.getByRole("checkbox", { name: "Sam Reyes" }));
    await user.clear(panel.getByLabelText("End"));
    await user.type(panel.getByLabelText("End"), "02:00");
    await user.type(panel.getByLabelText("Title"), "Drum tracking");
    await vi.waitFor(() => expect(calls.at(-1)?.body).toMatchObject({ endsAt: "2026-12-08T02:00:00-06:00" }));
    await vi.waitFor(() => expect(panel.getByRole("button", { name: "Book and confirm" })).toBeEnabled());
    await user.click(panel.getByRole("button", { name: "Book and confirm" }));

    await vi.waitFor(() => expect(onClose).toHaveBeenCalled());
    // An end before the start runs past midnight, into Tuesday.
    expect(calls.find((c) => c.path === "/api/bookings")?.body).toEqual({
      roomId: 1,
      clientAccountId: 3,
      projectId: 40,
      startsAt: "2026-12-07T10:00:00-06:00",
      endsAt: "2026-12-08T02:00:00-06:00",
      engineerIds: ["u-sam"],
      equipmentIds: [],
      title: "Drum tracking",
      status: "confirmed",
    });
  });

  it("quotes and holds a lockout as whole studio days, midnight to midnight, with lockout set", async () => {
    const { calls } = mockApi([
      { method: "POST", path: "/api/quotes", reply: { body: quoteResult() } },
      { method: "POST", path: "/api/bookings", reply: { status: 201, body: booking({ lockout: true, status: "hold" }) } },
      projects,
    ]);
    const { panel, user, onClose } = renderPanel();
    await panel.findByText("Total $285.00");

    await user.click(panel.getByRole("checkbox", { name: /^Lockout/ }));
    expect(panel.queryByLabelText("Start")).toBeNull();
    await user.clear(panel.getByLabelText("Last day"));
    await user.type(panel.getByLabelText("Last day"), "2026-12-09");
    const lockout = { startsAt: "2026-12-07T00:00:00-06:00", endsAt: "2026-12-10T00:00:00-06:00", lockout: true };
    await vi.waitFor(() => expect(calls.at(-1)?.body).toMatchObject({ roomId: 1, ...lockout }));

    await user.selectOptions(panel.getByLabelText("Client"), "Copper Vale");
    await vi.waitFor(() => expect(panel.getByRole("button", { name: "Pencil a hold" })).toBeEnabled());
    await user.click(panel.getByRole("button", { name: "Pencil a hold" }));
    await vi.waitFor(() => expect(onClose).toHaveBeenCalled());
    expect(calls.find((c) => c.path === "/api/bookings")?.body).toMatchObject({ ...lockout, status: "hold" });
  });

  it("asks for the client before booking", async () => {
    const { calls } = mockApi([{ method: "POST", path: "/api/quotes", reply: { body: quoteResult() } }]);
    const { panel, user } = renderPanel();
    await panel.findByText("Total $285.00");

    await user.click(panel.getByRole("button", { name: "Pencil a hold" }));
    expect(await panel.findByText("Choose the client")).toBeInTheDocument();
    expect(calls.some((c) => c.path === "/api/bookings")).toBe(false);
  });

  it("says so when the slot was taken while the quote was open", async () => {
    mockApi([
      { method: "POST", path: "/api/quotes", reply: { body: quoteResult() } },
      {
        method: "POST",
        path: "/api/bookings",
        reply: { status: 409, body: { error: { code: "booking_conflict", message: "Room A was booked 10:00–12:00 for The Quiet Orchard a moment ago" } } },
      },
      projects,
    ]);
    const { panel, user, onClose } = renderPanel();

    await user.selectOptions(panel.getByLabelText("Client"), "Copper Vale");
    await vi.waitFor(() => expect(panel.getByRole("button", { name: "Pencil a hold" })).toBeEnabled());
    await user.click(panel.getByRole("button", { name: "Pencil a hold" }));

    expect(await panel.findByText("Room A was booked 10:00–12:00 for The Quiet Orchard a moment ago")).toBeInTheDocument();
    expect(onClose).not.toHaveBeenCalled();
  });
});
