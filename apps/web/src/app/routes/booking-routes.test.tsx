import { screen, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import type { MeDto } from "@takeup/domain";
import { booking, bookkeeper, clientSummaries, clientUser, engineer, engineers, manager, owner, quoteResult, rooms, studio, tapeMachine } from "../../test/fixtures.ts";
import { mockApi } from "../../test/mock-api.ts";
import { renderWithApp } from "../../test/render.tsx";
import { routes } from "../router.tsx";

const signedInAs = (me: MeDto) => [
  { method: "GET" as const, path: "/api/me", reply: { body: me } },
  { method: "GET" as const, path: "/api/studio", reply: { body: studio } },
];
const studioData = [
  { method: "GET" as const, path: "/api/rooms", reply: { body: [...rooms, { ...rooms[2]!, id: 4, name: "Old booth", active: false, position: 9 }] } },
  { method: "GET" as const, path: "/api/clients", reply: { body: clientSummaries } },
  { method: "GET" as const, path: "/api/engineers", reply: { body: engineers } },
  { method: "GET" as const, path: "/api/equipment", reply: { body: [tapeMachine] } },
];

describe("the calendar page", () => {
  it("shows the active rooms side by side, quotes free time and opens bookings", async () => {
    mockApi([
      ...signedInAs(manager),
      ...studioData,
      { method: "GET", path: "/api/bookings", reply: { body: [booking()] } },
      { method: "GET", path: "/api/bookings/12", reply: { body: booking() } },
      { method: "POST", path: "/api/quotes", reply: { body: quoteResult({ roomId: 3 }) } },
    ]);
    const { user } = renderWithApp(null, { at: "/calendar?date=2026-12-07", routes });

    expect(await screen.findByRole("heading", { name: "Calendar", level: 1 })).toBeInTheDocument();
    const grid = await screen.findByRole("grid", { name: "Bookings calendar" });
    expect(within(grid).getAllByRole("columnheader").map((h) => h.textContent)).toEqual(["Time", "Room A", "Room B", "Room C"]);

    await user.click(await screen.findByRole("button", { name: "Copper Vale — Confirmed, Room A 10:00–13:00" }));
    const panel = within(await screen.findByRole("dialog", { name: "Booking #12" }));
    expect(await panel.findByText("Second album")).toBeInTheDocument();
    await user.click(panel.getByRole("button", { name: "Close" }));

    await user.click(screen.getByRole("gridcell", { name: "Room C Mon 7 Dec 15:00" }));
    const quote = within(await screen.findByRole("dialog", { name: "New booking" }));
    expect(quote.getByLabelText("Room")).toHaveValue("3");
    expect(quote.getByLabelText("Start")).toHaveValue("15:00");
    expect(quote.getByLabelText("End")).toHaveValue("16:00");
    expect(await quote.findByText("Total $285.00")).toBeInTheDocument();
  });

  it("moves by day and week with Previous, Next and Today, keeping the place in the address", async () => {
    const { calls } = mockApi([...signedInAs(manager), ...studioData, { method: "GET", path: "/api/bookings", reply: { body: [] } }]);
    const { user, router } = renderWithApp(null, { at: "/calendar?date=2026-12-07", routes });

    await user.click(await screen.findByRole("button", { name: "Next" }));
    expect(router.state.location.search).toBe("?view=day&date=2026-12-08");
    await user.click(screen.getByRole("button", { name: "Week" }));
    await user.click(screen.getByRole("button", { name: "Previous" }));
    expect(router.state.location.search).toBe("?view=week&date=2026-12-01");
    expect(screen.getByRole("heading", { name: "Mon 30 Nov – Sun 6 Dec 2026" })).toBeInTheDocument();
    await user.click(screen.getByRole("button", { name: "Today" }));
    expect(router.state.location.search).toMatch(/^\?view=week&date=\d{4}-\d{2}-\d{2}$/);
    expect(calls.some((c) => c.path.startsWith("/api/bookings?from=2026-11-30"))).toBe(true);
  });

  it("is read-only for the bookkeeper: no quote opens from free time", async () => {
    mockApi([
      ...signedInAs(bookkeeper),
      { method: "GET", path: "/api/rooms", reply: { body: rooms } },
      { method: "GET", path: "/api/bookings", reply: { body: [] } },
    ]);
    const { user } = renderWithApp(null, { at: "/calendar?date=2026-12-07", routes });

    await user.click(await screen.findByRole("gridcell", { name: "Room A Mon 7 Dec 10:00" }));
    expect(screen.queryByRole("dialog", { name: "New booking" })).not.toBeInTheDocument();
  });
});

describe("the rooms and rates page", () => {
  it("gives the owner rate card versions, room feeds, equipment and engineer rates", async () => {
    mockApi([
      ...signedInAs(owner),
      ...studioData,
      { method: "GET", path: "/api/engineer-rates", reply: { body: [{ id: 1, grade: "engineer", staffUserId: null, staffName: null, hourlyRateCents: 3000, effectiveFrom: "2026-01-01T06:00:00.000Z" }] } },
      { method: "GET", path: "/api/rooms/1/rate-cards", reply: { body: [rooms[0]!.currentRateCard] } },
    ]);
    const { user } = renderWithApp(null, { at: "/rooms", routes });

    expect(await screen.findByRole("heading", { name: "Rooms and rates", level: 1 })).toBeInTheDocument();
    expect(await screen.findByRole("button", { name: "New rate card version for Room A" })).toBeInTheDocument();
    expect(screen.getByRole("button", { name: "Calendar feed for Room A" })).toBeInTheDocument();
    expect(screen.getByRole("cell", { name: "$65.00" })).toBeInTheDocument();
    expect(await screen.findByRole("cell", { name: "Two-inch 24-track tape machine" })).toBeInTheDocument();
    expect(await screen.findByRole("cell", { name: "$30.00" })).toBeInTheDocument();

    await user.click(screen.getByRole("button", { name: "Rate card history for Room A" }));
    const history = await screen.findByRole("table", { name: "Rate card history for Room A" });
    expect(within(history).getByText("In force")).toBeInTheDocument();
    expect(within(history).getByText("22:00–08:00")).toBeInTheDocument();
    expect(within(history).getByText("25%")).toBeInTheDocument();

    await user.click(screen.getByRole("button", { name: "New rate card version for Room A" }));
    expect(screen.getByRole("dialog", { name: "New rate card version for Room A" })).toBeInTheDocument();
  });

  it("lets the bookkeeper read the prices but change nothing, and keeps the equipment list out", async () => {
    const { calls } = mockApi([
      ...signedInAs(bookkeeper),
      { method: "GET", path: "/api/rooms", reply: { body: rooms } },
      { method: "GET", path: "/api/engineer-rates", reply: { body: [] } },
    ]);
    renderWithApp(null, { at: "/rooms", routes });

    expect(await screen.findByRole("button", { name: "Rate card history for Room A" })).toBeInTheDocument();
    expect(screen.queryByRole("button", { name: "New rate card version for Room A" })).not.toBeInTheDocument();
    expect(screen.queryByRole("button", { name: "Calendar feed for Room A" })).not.toBeInTheDocument();
    expect(screen.queryByRole("button", { name: "Add room" })).not.toBeInTheDocument();
    expect(calls.some((c) => c.path === "/api/equipment")).toBe(false);
  });
});

describe("the role home pages", () => {
  it("shows the owner's Today board with the rooms in use and the sessions still to come", async () => {
    const now = Date.now();
    const iso = (offsetHours: number) => new Date(now + offsetHours * 3_600_000).toISOString();
    mockApi([
      ...signedInAs(owner),
      { method: "GET", path: "/api/clients", reply: { body: clientSummaries } },
      { method: "GET", path: "/api/staff", reply: { body: { members: [], invitations: [] } } },
      {
        method: "GET",
        path: "/api/bookings",
        reply: {
          body: [
            booking({ id: 1, status: "in_session", startsAt: iso(-1), endsAt: iso(1), client: { id: 2, name: "The Quiet Orchard" } }),
            booking({ id: 2, status: "confirmed", startsAt: iso(2), endsAt: iso(3), room: { id: 3, name: "Room C", colour: "slate" }, client: { id: 5, name: "Blue Hour Records" } }),
          ],
        },
      },
    ]);
    renderWithApp(null, { at: "/", routes });

    const inUse = await screen.findByRole("region", { name: "Rooms in use now" });
    expect(await within(inUse).findByText("Room A · The Quiet Orchard")).toBeInTheDocument();
    expect(within(screen.getByRole("region", { name: "Next sessions" })).getByText("Room C · Blue Hour Records")).toBeInTheDocument();
  });

  it("shows an engineer today's sessions on My day, and the next 30 days with a calendar subscription on My sessions", async () => {
    mockApi([
      ...signedInAs(engineer),
      {
        method: "GET",
        path: "/api/bookings",
        reply: {
          body: [
            booking({
              startsAt: new Date(Date.now() + 3_600_000).toISOString(),
              endsAt: new Date(Date.now() + 4 * 3_600_000).toISOString(),
              engineers: [
                { userId: "u-priya", name: "Priya Oduya", grade: "engineer" },
                { userId: "u-jo", name: "Jo Kettering", grade: "assistant" },
              ],
            }),
          ],
        },
      },
      { method: "GET", path: "/api/calendar-feeds", reply: { body: [] } },
    ]);
    const { user } = renderWithApp(null, { at: "/", routes });

    expect(await screen.findByRole("heading", { name: "My day", level: 1 })).toBeInTheDocument();
    expect(await screen.findByText("With Jo Kettering")).toBeInTheDocument();
    await user.click(screen.getByRole("link", { name: "My sessions" }));
    expect(await screen.findByRole("heading", { name: "My sessions", level: 1 })).toBeInTheDocument();
    expect(await screen.findByText("Copper Vale")).toBeInTheDocument();
    expect(screen.getByRole("button", { name: "Subscribe to my calendar" })).toBeInTheDocument();
  });

  it("gives a client its sessions page with a way to request one", async () => {
    mockApi([
      ...signedInAs(clientUser),
      { method: "GET", path: "/api/rooms", reply: { body: rooms } },
      { method: "GET", path: "/api/bookings", reply: { body: [] } },
      { method: "GET", path: "/api/clients/1/projects", reply: { body: [] } },
      { method: "POST", path: "/api/quotes", reply: { body: quoteResult() } },
    ]);
    const { user } = renderWithApp(null, { at: "/sessions", routes });

    expect(await screen.findByRole("heading", { name: "Sessions", level: 1 })).toBeInTheDocument();
    expect(await screen.findByText(/Nothing booked yet/)).toBeInTheDocument();
    await user.click(screen.getByRole("button", { name: "Request a session" }));
    expect(within(screen.getByRole("dialog", { name: "Request a session" })).getByRole("button", { name: "Send request" })).toBeInTheDocument();
  });
});
