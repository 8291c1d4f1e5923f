import { screen, within } from "@testing-library/react";
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { mockApi } from "../../../test/mock-api.ts";
import { renderWithApp } from "../../../test/render.tsx";
import { edit, entry } from "../test-fixtures.ts";
import { MyTimesheet } from "./my-timesheet.tsx";

const timeZone = "America/Chicago";
const cells = (row: HTMLElement) => within(row).getAllByRole("cell").map((c) => c.textContent);

describe("MyTimesheet", () => {
  // Friday 18 December 2026 at the studio, so the weeks shown are in the past.
  beforeEach(() => {
    vi.useFakeTimers({ toFake: ["Date"] });
    vi.setSystemTime(new Date("2026-12-18T18:00:00.000Z"));
  });
  afterEach(() => {
    vi.useRealTimers();
  });

  it("lists the week's entries in studio time and moves a week at a time, asking for the person's own entries", async () => {
    const { calls } = mockApi([
      {
        method: "GET",
        path: "/api/time-entries",
        reply: { body: [entry(), entry({ id: 502, booking: null, kind: "shop", startedAt: "2026-12-08T14:00:00.000Z", endedAt: "2026-12-08T20:12:00.000Z", breaks: [], workedMinutes: 372, flags: ["pending_edit"] })] },
      },
      { method: "GET", path: "/api/time-entry-edits", reply: { body: [] } },
    ]);
    const { user, router } = renderWithApp(<MyTimesheet staffUserId="u-priya" timeZone={timeZone} workweekStartDay={1} />, { at: "/timesheet?week=2026-12-09" });

    expect(await screen.findByRole("heading", { name: "Week of Mon 7 Dec – Sun 13 Dec 2026" })).toBeInTheDocument();
    const table = within(await screen.findByRole("table", { name: "Time entries" }));
    const [, first, second] = table.getAllByRole("row");
    expect(cells(first!)).toEqual(["Mon 7 Dec", "09:58", "18:30", "30 min", "8 h 2 min", "Lantern Static — Room A", "engineer", "Clock", "", "Ask for a correction"]);
    expect(cells(second!).slice(0, 9)).toEqual(["Tue 8 Dec", "08:00", "14:12", "—", "6 h 12 min", "Shop time", "engineer", "Clock", "Correction waiting"]);
    expect(within(second!).queryByRole("button")).not.toBeInTheDocument();
    expect(screen.getByText(/Worked 14 h 14 min in closed entries/)).toBeInTheDocument();
    expect(calls.find((c) => c.path.startsWith("/api/time-entries"))?.path).toBe("/api/time-entries?from=2026-12-07&to=2026-12-13&staffUserId=u-priya");

    await user.click(screen.getByRole("button", { name: "Previous week" }));
    expect(router.state.location.search).toBe("?week=2026-11-30");
    expect(await screen.findByRole("heading", { name: "Week of Mon 30 Nov – Sun 6 Dec 2026" })).toBeInTheDocument();
    expect(calls.some((c) => c.path === "/api/time-entries?from=2026-11-30&to=2026-12-06&staffUserId=u-priya")).toBe(true);
  });

  it("opens the correction dialog from a row, and Add missing time opens it empty", async () => {
    mockApi([
      { method: "GET", path: "/api/time-entries", reply: { body: [entry()] } },
      { method: "GET", path: "/api/time-entry-edits", reply: { body: [] } },
    ]);
    const { user } = renderWithApp(<MyTimesheet staffUserId="u-priya" timeZone={timeZone} workweekStartDay={1} />, { at: "/timesheet?week=2026-12-07" });

    await user.click(await screen.findByRole("button", { name: "Ask for a correction to Mon 7 Dec 09:58–18:30" }));
    const correction = within(screen.getByRole("dialog", { name: "Ask for a correction" }));
    expect(correction.getByLabelText("Start")).toHaveValue("2026-12-07T09:58");
    await user.click(correction.getByRole("button", { name: "Cancel" }));

    await user.click(screen.getByRole("button", { name: "Add missing time" }));
    const missing = within(screen.getByRole("dialog", { name: "Add missing time" }));
    expect(missing.getByLabelText("Start")).toHaveValue("");
  });

  it("lists my corrections with their status and the decision's note, leaving out other people's", async () => {
    mockApi([
      { method: "GET", path: "/api/time-entries", reply: { body: [] } },
      {
        method: "GET",
        path: "/api/time-entry-edits",
        reply: {
          body: [
            edit(),
            edit({ id: 30, status: "rejected", decidedByName: "Theo Vance", decidedAt: "2026-12-08T16:00:00.000Z", decisionNote: "The session started at 10:00" }),
            edit({ id: 29, timeEntryId: null, current: null, status: "approved", decidedByName: "Theo Vance", decidedAt: "2026-12-08T16:05:00.000Z" }),
            edit({ id: 28, staffUserId: "u-sam", staffName: "Sam Reyes" }),
          ],
        },
      },
    ]);
    renderWithApp(<MyTimesheet staffUserId="u-priya" timeZone={timeZone} workweekStartDay={1} />, { at: "/timesheet?week=2026-12-07" });

    const list = within((await screen.findAllByRole("list")).find((l) => l.textContent?.includes("Correction for"))!);
    const items = list.getAllByRole("listitem");
    expect(items).toHaveLength(3);
    expect(items[0]).toHaveTextContent("Correction for Mon 7 DecWaiting");
    expect(items[0]).toHaveTextContent("In09:58 → changes to09:30Out18:30 (no change)");
    expect(items[1]).toHaveTextContent("Rejected by Theo Vance on Tue 8 Dec, 10:00");
    expect(items[1]).toHaveTextContent("Note: “The session started at 10:00”");
    expect(items[2]).toHaveTextContent("Missing time for Mon 7 DecApproved");
    expect(screen.queryByText(/Sam Reyes/)).not.toBeInTheDocument();
  });

  it("shows the entries as cards on a phone, each with its correction button", async () => {
    vi.stubGlobal("matchMedia", (query: string) => ({ matches: false, media: query, addEventListener: () => undefined, removeEventListener: () => undefined }));
    mockApi([
      { method: "GET", path: "/api/time-entries", reply: { body: [entry()] } },
      { method: "GET", path: "/api/time-entry-edits", reply: { body: [] } },
    ]);
    const { user } = renderWithApp(<MyTimesheet staffUserId="u-priya" timeZone={timeZone} workweekStartDay={1} />, { at: "/timesheet?week=2026-12-07" });

    const card = within(await screen.findByRole("list", { name: "Time entries" })).getByRole("listitem");
    expect(card).toHaveTextContent("Mon 7 Dec8 h 2 min09:58–18:30 · break 30 minLantern Static — Room A · paid as engineer · Clock");
    expect(screen.queryByRole("table")).not.toBeInTheDocument();
    await user.click(within(card).getByRole("button", { name: "Ask for a correction to Mon 7 Dec 09:58–18:30" }));
    expect(screen.getByRole("dialog", { name: "Ask for a correction" })).toBeInTheDocument();
  });
});
