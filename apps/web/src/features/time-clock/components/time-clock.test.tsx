import { act, screen, within } from "@testing-library/react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { mockApi } from "../../../test/mock-api.ts";
import { renderWithApp } from "../../../test/render.tsx";
import { clockState, copperValeNow, entry, lanternStaticNow } from "../test-fixtures.ts";
import { TimeClock } from "./time-clock.tsx";

const timeZone = "America/Chicago";

// 13:10 on Tuesday 8 December 2026 at the studio.
const now = new Date("2026-12-08T19:10:00.000Z");
const openEntry = entry({ id: 502, startedAt: "2026-12-08T15:58:00.000Z", endedAt: null, breaks: [], workedMinutes: null });

afterEach(() => {
  vi.useRealTimers();
});

describe("TimeClock", () => {
  it("shows Clock in when not clocked in, and posts the booking id of the session chosen", async () => {
    const { calls } = mockApi([
      { method: "GET", path: "/api/time-clock", reply: { body: clockState({ sessionsNow: [lanternStaticNow, copperValeNow] }) } },
      { method: "POST", path: "/api/time-clock/clock-in", reply: { status: 201, body: entry({ id: 503, booking: { id: 14, roomName: "Room C", clientName: "Copper Vale" }, endedAt: null, startedAt: "2026-12-08T17:02:00.000Z" }) } },
    ]);
    const { user } = renderWithApp(<TimeClock timeZone={timeZone} />);

    expect(await screen.findByText("Not clocked in")).toBeInTheDocument();
    const choice = within(screen.getByRole("group", { name: "Which session?" }));
    expect(choice.getByRole("radio", { name: "Lantern Static — Room A, 10:00–20:00" })).toBeChecked();
    expect(choice.getByRole("radio", { name: "Shop time" })).not.toBeChecked();
    expect(screen.queryByRole("button", { name: "Start break" })).not.toBeInTheDocument();

    await user.click(choice.getByRole("radio", { name: "Copper Vale — Room C, 11:00–15:00" }));
    await user.click(screen.getByRole("button", { name: "Clock in" }));

    expect(await screen.findByText("Clocked in at 11:02 for Copper Vale")).toBeInTheDocument();
    expect(calls.find((c) => c.method === "POST")).toMatchObject({ path: "/api/time-clock/clock-in", body: { bookingId: 14 } });
  });

  it("clocks in for shop time with no booking id", async () => {
    const { calls } = mockApi([
      { method: "GET", path: "/api/time-clock", reply: { body: clockState({ sessionsNow: [lanternStaticNow] }) } },
      { method: "POST", path: "/api/time-clock/clock-in", reply: { status: 201, body: entry({ booking: null, kind: "shop", endedAt: null }) } },
    ]);
    const { user } = renderWithApp(<TimeClock timeZone={timeZone} />);

    await user.click(await screen.findByRole("radio", { name: "Shop time" }));
    await user.click(screen.getByRole("button", { name: "Clock in" }));

    expect(await screen.findByText("Clocked in at 09:58 for shop time")).toBeInTheDocument();
    expect(calls.find((c) => c.method === "POST")?.body).toEqual({});
  });

  it("shows Clock out with the time since clocking in, updates it every 30 seconds, and posts clock-out", async () => {
    vi.useFakeTimers({ toFake: ["Date", "setInterval", "clearInterval"] });
    vi.setSystemTime(now);
    const { calls } = mockApi([
      { method: "GET", path: "/api/time-clock", reply: { body: clockState({ openEntry }) } },
      { method: "POST", path: "/api/time-clock/clock-out", reply: { body: entry({ id: 502, startedAt: openEntry.startedAt, endedAt: "2026-12-08T19:10:00.000Z", breaks: [], workedMinutes: 192 }) } },
    ]);
    const { user } = renderWithApp(<TimeClock timeZone={timeZone} />);

    expect(await screen.findByText("Clocked in since 09:58 — 3 h 12 min")).toBeInTheDocument();
    expect(screen.getByText("Lantern Static — Room A")).toBeInTheDocument();
    expect(screen.queryByRole("group", { name: "Which session?" })).not.toBeInTheDocument();

    act(() => {
      vi.advanceTimersByTime(60_000);
    });
    expect(screen.getByText("Clocked in since 09:58 — 3 h 13 min")).toBeInTheDocument();

    const button = screen.getByRole("button", { name: "Clock out" });
    expect(screen.queryByRole("button", { name: "Clock in" })).not.toBeInTheDocument();
    await user.click(button);

    expect(await screen.findByText("Clocked out at 13:10: 3 h 12 min worked")).toBeInTheDocument();
    expect(calls.filter((c) => c.method === "POST").map((c) => c.path)).toEqual(["/api/time-clock/clock-out"]);
  });

  it("starts a break, then offers to end it", async () => {
    let onBreak = false;
    const withBreak = () =>
      clockState({
        openEntry: { ...openEntry, breaks: onBreak ? [{ id: 80, startedAt: "2026-12-08T18:00:00.000Z", endedAt: null }] : [] },
        onBreak,
      });
    const { calls } = mockApi([
      { method: "GET", path: "/api/time-clock", reply: () => ({ body: withBreak() }) },
      {
        method: "POST",
        path: "/api/time-clock/break-start",
        reply: () => {
          onBreak = true;
          return { body: withBreak().openEntry };
        },
      },
      {
        method: "POST",
        path: "/api/time-clock/break-end",
        reply: () => {
          onBreak = false;
          return { body: { ...openEntry, breaks: [{ id: 80, startedAt: "2026-12-08T18:00:00.000Z", endedAt: "2026-12-08T18:20:00.000Z" }] } };
        },
      },
    ]);
    const { user } = renderWithApp(<TimeClock timeZone={timeZone} />);

    await user.click(await screen.findByRole("button", { name: "Start break" }));
    expect(await screen.findByText("Break started at 12:00")).toBeInTheDocument();
    expect(screen.getByText("On a break since 12:00")).toBeInTheDocument();

    await user.click(screen.getByRole("button", { name: "End break" }));
    expect(await screen.findByText("Break over: back on the clock")).toBeInTheDocument();
    expect(await screen.findByRole("button", { name: "Start break" })).toBeInTheDocument();
    expect(calls.filter((c) => c.method === "POST").map((c) => c.path)).toEqual(["/api/time-clock/break-start", "/api/time-clock/break-end"]);
  });

  it("warns when the open entry has been open too long", async () => {
    vi.useFakeTimers({ toFake: ["Date"] });
    vi.setSystemTime(new Date("2026-12-09T09:00:00.000Z"));
    mockApi([{ method: "GET", path: "/api/time-clock", reply: { body: clockState({ openEntry: { ...openEntry, flags: ["open_too_long"] } }) } }]);
    renderWithApp(<TimeClock timeZone={timeZone} />);

    expect(await screen.findByRole("alert")).toHaveTextContent(
      "You have been clocked in for over 17 hours — clock out, then ask for a correction if needed.",
    );
    expect(screen.getByText("Clocked in since Tue 8 Dec, 09:58 — 17 h 2 min")).toBeInTheDocument();
  });

  it("shows the week so far, day by day, with the total", async () => {
    mockApi([{ method: "GET", path: "/api/time-clock", reply: { body: clockState() } }]);
    renderWithApp(<TimeClock timeZone={timeZone} />);

    const week = within(await screen.findByRole("region", { name: "This week" }));
    expect(week.getByRole("row", { name: /Mon 7 Dec/ })).toHaveTextContent("8 h 2 min");
    expect(week.getByRole("row", { name: /Tue 8 Dec/ })).toHaveTextContent("6 h 12 min");
    expect(week.getByRole("row", { name: /Week total/ })).toHaveTextContent("14 h 14 min");
  });

  it("shows the API's refusal in studio time", async () => {
    mockApi([
      { method: "GET", path: "/api/time-clock", reply: { body: clockState() } },
      {
        method: "POST",
        path: "/api/time-clock/clock-in",
        reply: { status: 409, body: { error: { code: "already_clocked_in", message: "You have been clocked in since 2026-12-08T15:58:00.000Z; clock out first" } } },
      },
    ]);
    const { user } = renderWithApp(<TimeClock timeZone={timeZone} />);

    await user.click(await screen.findByRole("button", { name: "Clock in" }));
    expect(await screen.findByText("You have been clocked in since Tue 8 Dec, 09:58; clock out first")).toBeInTheDocument();
  });
});
