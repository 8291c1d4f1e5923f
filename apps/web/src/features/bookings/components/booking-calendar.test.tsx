import { useState } from "react";
import { screen, within } from "@testing-library/react";
import { describe, expect, it, onTestFinished, vi } from "vitest";
import { booking } from "../../../test/fixtures.ts";
import { mockApi } from "../../../test/mock-api.ts";
import { renderWithApp } from "../../../test/render.tsx";
import { BookingCalendar, type CalendarView, type SlotSelection } from "./booking-calendar.tsx";

const calendarRooms = [
  { id: 1, name: "Room A", colour: "rust" as const },
  { id: 2, name: "Room B", colour: "moss" as const },
  { id: 3, name: "Room C", colour: "slate" as const },
];

function Harness({
  onSelectSlot,
  onOpenBooking = () => undefined,
  rooms = calendarRooms,
  initialView = "day",
  date = "2026-12-07",
}: {
  onSelectSlot?: (slot: SlotSelection) => void;
  onOpenBooking?: (id: number) => void;
  rooms?: typeof calendarRooms;
  initialView?: CalendarView;
  date?: string;
}) {
  const [at, setAt] = useState({ view: initialView, date });
  return (
    <BookingCalendar
      rooms={rooms}
      timeZone="America/Chicago"
      workweekStartDay={1}
      view={at.view}
      date={at.date}
      onNavigate={setAt}
      onSelectSlot={onSelectSlot}
      onOpenBooking={onOpenBooking}
    />
  );
}

const cellOf = (element: HTMLElement) => element.closest<HTMLElement>('[role="gridcell"]');

describe("BookingCalendar", () => {
  it("places a booking in its room's column at its studio-time row, whatever the browser's zone", async () => {
    // 16:00 UTC is 10:00 in Chicago in December; the grid must show it at 10:00, not at the
    // browser's 16:00 (UTC) or 05:00 the next day (Auckland).
    vi.stubEnv("TZ", "Pacific/Auckland");
    onTestFinished(() => {
      vi.unstubAllEnvs();
    });
    expect(new Date("2026-12-07T16:00:00.000Z").getHours()).toBe(5);
    const { calls } = mockApi([{ method: "GET", path: "/api/bookings", reply: { body: [booking({ room: { id: 2, name: "Room B", colour: "moss" } })] } }]);
    renderWithApp(<Harness />);

    const block = await screen.findByRole("button", { name: "Copper Vale — Confirmed, Room B 10:00–13:00" });
    expect(cellOf(block)).toHaveAccessibleName("Room B Mon 7 Dec 10:00");
    expect(screen.getByRole("grid", { name: "Bookings calendar" })).toBeInTheDocument();
    // The day asked for is the studio's day, midnight to midnight Chicago time.
    expect(calls[0]?.path).toBe(`/api/bookings?from=${encodeURIComponent("2026-12-07T00:00:00-06:00")}&to=${encodeURIComponent("2026-12-08T00:00:00-06:00")}`);
  });

  it("draws a hold hatched with a dashed outline and the word Hold, a second hold dotted as 2nd hold, apart from a confirmed booking", async () => {
    mockApi([
      {
        method: "GET",
        path: "/api/bookings",
        reply: {
          body: [
            booking({ id: 1, status: "confirmed", client: { id: 1, name: "Lantern Static" }, startsAt: "2026-12-07T14:00:00.000Z", endsAt: "2026-12-07T15:00:00.000Z" }),
            booking({ id: 2, status: "hold", allowedActions: ["confirm", "release"], client: { id: 3, name: "Copper Vale" } }),
            booking({ id: 3, status: "hold", queuedBehindId: 2, client: { id: 2, name: "The Quiet Orchard" } }),
          ],
        },
      },
    ]);
    renderWithApp(<Harness />);

    const confirmed = await screen.findByRole("button", { name: "Lantern Static — Confirmed, Room A 08:00–09:00" });
    const hold = screen.getByRole("button", { name: "Copper Vale — Hold, Room A 10:00–13:00" });
    const second = screen.getByRole("button", { name: "The Quiet Orchard — Hold (2nd hold), Room A 10:00–13:00" });

    expect(hold).toHaveStyle({ borderStyle: "dashed" });
    expect(hold.style.backgroundImage).toContain("repeating-linear-gradient");
    expect(within(hold).getByText(/^Hold/)).toBeInTheDocument();
    expect(second).toHaveStyle({ borderStyle: "dotted" });
    expect(within(second).getByText(/^2nd hold/)).toBeInTheDocument();
    expect(confirmed).toHaveStyle({ borderStyle: "solid" });
    expect(confirmed.style.backgroundImage).toBe("");
    // The hold and its second hold share the slot side by side.
    expect(hold.style.width).toBe(second.style.width);
    expect(hold.style.left).not.toBe(second.style.left);
  });

  it("keeps cancelled bookings out of sight until asked for", async () => {
    mockApi([
      {
        method: "GET",
        path: "/api/bookings",
        reply: {
          body: [
            booking({ status: "cancelled", allowedActions: [] }),
            booking({ id: 13, room: { id: 2, name: "Room B", colour: "moss" }, client: { id: 1, name: "Lantern Static" } }),
          ],
        },
      },
    ]);
    const { user } = renderWithApp(<Harness />);

    expect(await screen.findByRole("button", { name: /^Lantern Static — Confirmed/ })).toBeInTheDocument();
    expect(screen.queryByRole("button", { name: /^Copper Vale — Cancelled/ })).not.toBeInTheDocument();
    await user.click(screen.getByRole("checkbox", { name: "Cancelled" }));
    expect(await screen.findByRole("button", { name: "Copper Vale — Cancelled, Room A 10:00–13:00" })).toBeInTheDocument();
  });

  it("opens a quote for an hour from the empty slot clicked, and for exactly the stretch dragged across", async () => {
    mockApi([{ method: "GET", path: "/api/bookings", reply: { body: [] } }]);
    const onSelectSlot = vi.fn();
    const { user } = renderWithApp(<Harness onSelectSlot={onSelectSlot} />);

    await user.click(screen.getByRole("gridcell", { name: "Room C Mon 7 Dec 14:30" }));
    expect(onSelectSlot).toHaveBeenLastCalledWith({ roomId: 3, date: "2026-12-07", start: "14:30", end: "15:30" });

    await user.pointer([
      { keys: "[MouseLeft>]", target: screen.getByRole("gridcell", { name: "Room B Mon 7 Dec 09:00" }) },
      { target: screen.getByRole("gridcell", { name: "Room B Mon 7 Dec 10:00" }) },
      { target: screen.getByRole("gridcell", { name: "Room B Mon 7 Dec 11:45" }) },
      { keys: "[/MouseLeft]" },
    ]);
    expect(onSelectSlot).toHaveBeenLastCalledWith({ roomId: 2, date: "2026-12-07", start: "09:00", end: "12:00" });
  });

  it("moves a focus cursor with the arrow keys, starts a quote with Enter, and lets Tab reach the bookings", async () => {
    mockApi([{ method: "GET", path: "/api/bookings", reply: { body: [booking({ startsAt: "2026-12-07T18:00:00.000Z", endsAt: "2026-12-07T20:00:00.000Z" })] } }]);
    const onSelectSlot = vi.fn();
    const onOpenBooking = vi.fn();
    const { user } = renderWithApp(<Harness onSelectSlot={onSelectSlot} onOpenBooking={onOpenBooking} />);
    await screen.findByRole("button", { name: /^Copper Vale — Confirmed/ });

    // The grid is one Tab stop: the cursor's cell.
    const start = screen.getByRole("gridcell", { name: "Room A Mon 7 Dec 10:00" });
    expect(start).toHaveAttribute("tabindex", "0");
    start.focus();
    await user.keyboard("{ArrowRight}{ArrowDown}{ArrowDown}");
    expect(screen.getByRole("gridcell", { name: "Room B Mon 7 Dec 10:30" })).toHaveFocus();
    await user.keyboard("{Enter}");
    expect(onSelectSlot).toHaveBeenCalledWith({ roomId: 2, date: "2026-12-07", start: "10:30", end: "11:30" });

    // Enter on time a booking covers opens that booking instead.
    await user.keyboard("{ArrowLeft}{PageDown}{PageDown}");
    expect(screen.getByRole("gridcell", { name: "Room A Mon 7 Dec 12:30" })).toHaveFocus();
    await user.keyboard("{Enter}");
    expect(onOpenBooking).toHaveBeenCalledWith(12);

    // Bookings are in the Tab order around the cursor's cell; this one starts just above it.
    await user.tab({ shift: true });
    expect(screen.getByRole("button", { name: "Copper Vale — Confirmed, Room A 12:00–14:00" })).toHaveFocus();
  });

  it("shows the night hours only when asked, and says how many bookings they hide", async () => {
    mockApi([{ method: "GET", path: "/api/bookings", reply: { body: [booking({ startsAt: "2026-12-07T08:00:00.000Z", endsAt: "2026-12-07T11:00:00.000Z" })] } }]);
    const { user } = renderWithApp(<Harness />);

    expect(await screen.findByText(/1 booking is before 08:00/)).toBeInTheDocument();
    expect(screen.queryByRole("gridcell", { name: "Room A Mon 7 Dec 02:00" })).not.toBeInTheDocument();
    await user.click(screen.getByRole("checkbox", { name: "Night hours" }));
    const block = screen.getByRole("button", { name: "Copper Vale — Confirmed, Room A 02:00–05:00" });
    expect(cellOf(block)).toHaveAccessibleName("Room A Mon 7 Dec 02:00");
  });

  it("shows a week from the studio's first workday, each day a group of room columns, and a booking past midnight on both days", async () => {
    const { calls } = mockApi([
      { method: "GET", path: "/api/bookings", reply: { body: [booking({ startsAt: "2026-12-10T03:00:00.000Z", endsAt: "2026-12-10T08:00:00.000Z" })] } },
    ]);
    const { user } = renderWithApp(<Harness rooms={calendarRooms.slice(0, 1)} date="2026-12-09" />);
    await user.click(screen.getByRole("button", { name: "Week" }));

    expect(screen.getByRole("button", { name: "Week" })).toHaveAttribute("aria-pressed", "true");
    expect(screen.getByRole("heading", { name: "Mon 7 Dec – Sun 13 Dec 2026" })).toBeInTheDocument();
    // Wednesday 21:00 to Thursday 02:00 in Chicago: drawn on Wednesday from 21:00, and on Thursday before 08:00 (hidden).
    const block = await screen.findByRole("button", { name: "Copper Vale — Confirmed, Room A Wed 9 Dec 21:00 – Thu 10 Dec 02:00" });
    expect(cellOf(block)).toHaveAccessibleName("Room A Wed 9 Dec 21:00");
    expect(calls.at(-1)?.path).toContain(`from=${encodeURIComponent("2026-12-07T00:00:00-06:00")}`);
    expect(calls.at(-1)?.path).toContain(`to=${encodeURIComponent("2026-12-14T00:00:00-06:00")}`);
  });

  it("stays read-only for someone who may not book: free time does nothing", async () => {
    mockApi([{ method: "GET", path: "/api/bookings", reply: { body: [] } }]);
    const onOpenBooking = vi.fn();
    const { user } = renderWithApp(<Harness onOpenBooking={onOpenBooking} />);

    expect(screen.getByRole("grid", { name: "Bookings calendar" })).toHaveAttribute("aria-readonly", "true");
    await user.click(screen.getByRole("gridcell", { name: "Room A Mon 7 Dec 10:00" }));
    expect(onOpenBooking).not.toHaveBeenCalled();
  });
});
