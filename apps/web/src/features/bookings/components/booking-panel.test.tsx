import { screen, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { booking, engineers, tapeMachine } from "../../../test/fixtures.ts";
import { mockApi } from "../../../test/mock-api.ts";
import { renderWithApp } from "../../../test/render.tsx";
import { BookingPanel } from "./booking-panel.tsx";

const renderPanel = (canEdit = true) =>
  renderWithApp(
    <BookingPanel bookingId={12} onClose={() => undefined} timeZone="America/Chicago" canEdit={canEdit} engineers={engineers} equipment={[tapeMachine]} />,
  );

describe("BookingPanel", () => {
  it("shows a hold's lapse time and its place in the queue in studio time, and only the actions the API allows", async () => {
    mockApi([
      {
        method: "GET",
        path: "/api/bookings/12",
        reply: {
          body: booking({ status: "hold", holdExpiresAt: "2026-12-10T20:00:00.000Z", queuedBehindId: 9, allowedActions: ["confirm", "release"] }),
        },
      },
    ]);
    renderPanel();
    const panel = within(screen.getByRole("dialog", { name: "Booking #12" }));

    expect(await panel.findByText("Hold lapses Thu 10 Dec, 14:00")).toBeInTheDocument();
    expect(panel.getByText("Second hold behind #9")).toBeInTheDocument();
    expect(panel.getByText("Mon 7 Dec 10:00–13:00")).toBeInTheDocument();
    expect(panel.getByText("2nd hold")).toBeInTheDocument();
    expect(panel.getByText("3 h of room time at $65.00 an hour; cheaper than the day rate of $520.00.")).toBeInTheDocument();
    expect(panel.getByText("Total $285.00")).toBeInTheDocument();
    expect(panel.getByRole("button", { name: "Confirm booking" })).toBeInTheDocument();
    expect(panel.getByRole("button", { name: "Release hold" })).toBeInTheDocument();
    expect(panel.queryByRole("button", { name: "Start session" })).not.toBeInTheDocument();
    expect(panel.queryByRole("button", { name: "Cancel booking" })).not.toBeInTheDocument();
  });

  it("says a lockout holds whole days around the clock", async () => {
    mockApi([{ method: "GET", path: "/api/bookings/12", reply: { body: booking({ lockout: true, startsAt: "2026-12-07T06:00:00.000Z", endsAt: "2026-12-10T06:00:00.000Z" }) } }]);
    renderPanel();
    const panel = within(screen.getByRole("dialog", { name: "Booking #12" }));
    expect(await panel.findByText("Lockout: whole days around the clock, each at the day rate")).toBeInTheDocument();
  });

  it("confirms a hold with the deposit marked received", async () => {
    const { calls } = mockApi([
      { method: "GET", path: "/api/bookings/12", reply: { body: booking({ status: "hold", holdExpiresAt: "2026-12-10T20:00:00.000Z", allowedActions: ["confirm", "release"] }) } },
      { method: "POST", path: "/api/bookings/12/confirm", reply: { body: booking({ depositReceivedAt: "2026-12-01T21:00:00.000Z" }) } },
      { method: "GET", path: "/api/bookings", reply: { body: [] } },
    ]);
    const { user } = renderPanel();

    await user.click(await screen.findByRole("checkbox", { name: "Deposit received" }));
    await user.click(screen.getByRole("button", { name: "Confirm booking" }));

    expect(await screen.findByText("Booking #12 confirmed")).toBeInTheDocument();
    expect(calls.find((c) => c.path === "/api/bookings/12/confirm")?.body).toEqual({ depositReceived: true });
  });

  it("shows the cancellation fee and the reason for it before cancelling, and only then cancels", async () => {
    const explanation = "Cancelled 30 h 0 min before the start: under 48 h notice costs 50% of the quoted price.";
    const { calls } = mockApi([
      { method: "GET", path: "/api/bookings/12", reply: { body: booking() } },
      { method: "GET", path: "/api/bookings/12/cancellation-preview", reply: { body: { feeCents: 14250, noticeMinutes: 1800, explanation } } },
      {
        method: "POST",
        path: "/api/bookings/12/cancel",
        reply: { body: booking({ status: "cancelled", cancellationFeeCents: 14250, cancelledAt: "2026-12-06T10:00:00.000Z", allowedActions: [] }) },
      },
      { method: "GET", path: "/api/bookings", reply: { body: [] } },
    ]);
    const { user } = renderPanel();

    await user.click(await screen.findByRole("button", { name: "Cancel booking" }));
    const confirm = within(screen.getByRole("dialog", { name: "Cancel booking #12?" }));
    expect(await confirm.findByText(explanation)).toBeInTheDocument();
    expect(confirm.getByText("Cancellation fee: $142.50")).toBeInTheDocument();
    expect(calls.some((c) => c.path.endsWith("/cancel"))).toBe(false);

    await user.type(confirm.getByLabelText("Reason"), "Band member ill");
    await user.click(confirm.getByRole("button", { name: "Cancel booking and charge $142.50" }));

    expect(await screen.findByText("Booking #12 cancelled; a fee of $142.50 is due")).toBeInTheDocument();
    const order = calls.map((c) => `${c.method} ${c.path}`);
    expect(order.indexOf("GET /api/bookings/12/cancellation-preview")).toBeLessThan(order.indexOf("POST /api/bookings/12/cancel"));
    expect(calls.find((c) => c.path.endsWith("/cancel"))?.body).toEqual({ reason: "Band member ill" });
  });

  it("says plainly when cancelling costs nothing", async () => {
    mockApi([
      { method: "GET", path: "/api/bookings/12", reply: { body: booking() } },
      {
        method: "GET",
        path: "/api/bookings/12/cancellation-preview",
        reply: { body: { feeCents: 0, noticeMinutes: 10080, explanation: "Cancelled 168 h 0 min before the start: enough notice, no fee." } },
      },
    ]);
    const { user } = renderPanel();

    await user.click(await screen.findByRole("button", { name: "Cancel booking" }));
    expect(await screen.findByRole("button", { name: "Cancel booking (no fee)" })).toBeInTheDocument();
    expect(screen.getByText("Cancelled 168 h 0 min before the start: enough notice, no fee.")).toBeInTheDocument();
    await user.click(screen.getByRole("button", { name: "Keep booking" }));
    expect(screen.queryByRole("dialog", { name: "Cancel booking #12?" })).not.toBeInTheDocument();
    expect(screen.getByRole("dialog", { name: "Booking #12" })).toBeInTheDocument();
  });

  it("assigns engineers from a checklist and saves them with PATCH", async () => {
    const { calls } = mockApi([
      { method: "GET", path: "/api/bookings/12", reply: { body: booking() } },
      {
        method: "PATCH",
        path: "/api/bookings/12",
        reply: {
          body: booking({
            engineers: [
              { userId: "u-sam", name: "Sam Reyes", grade: "engineer" },
              { userId: "u-jo", name: "Jo Kettering", grade: "assistant" },
            ],
          }),
        },
      },
      { method: "GET", path: "/api/bookings", reply: { body: [] } },
    ]);
    const { user } = renderPanel();

    await user.click(await screen.findByRole("button", { name: "Assign engineers" }));
    expect(screen.getByRole("checkbox", { name: "Sam Reyes" })).toBeChecked();
    await user.click(screen.getByRole("checkbox", { name: "Jo Kettering" }));
    await user.click(screen.getByRole("button", { name: "Save engineers" }));

    expect(await screen.findByText("Engineers saved")).toBeInTheDocument();
    expect(calls.find((c) => c.method === "PATCH")?.body).toEqual({ engineerIds: ["u-sam", "u-jo"] });
  });

  it("shows a clash from the API when an engineer is busy elsewhere", async () => {
    mockApi([
      { method: "GET", path: "/api/bookings/12", reply: { body: booking() } },
      { method: "PATCH", path: "/api/bookings/12", reply: { status: 409, body: { error: { code: "booking_conflict", message: "Priya Oduya is booked 09:00–12:00 in Room C" } } } },
    ]);
    const { user } = renderPanel();

    await user.click(await screen.findByRole("button", { name: "Assign engineers" }));
    await user.click(screen.getByRole("checkbox", { name: "Priya Oduya" }));
    await user.click(screen.getByRole("button", { name: "Save engineers" }));
    expect(await screen.findByText("Priya Oduya is booked 09:00–12:00 in Room C")).toBeInTheDocument();
  });

  it("lets a reader see the booking without changing who is on it", async () => {
    mockApi([{ method: "GET", path: "/api/bookings/12", reply: { body: booking({ allowedActions: [] }) } }]);
    renderPanel(false);

    expect(await screen.findByText("Sam Reyes")).toBeInTheDocument();
    expect(screen.queryByRole("button", { name: "Assign engineers" })).not.toBeInTheDocument();
    expect(screen.queryByRole("button", { name: "Cancel booking" })).not.toBeInTheDocument();
  });
});
