import { fireEvent, screen, within } from "@testing-library/react";
import { describe, expect, it, vi } from "vitest";
import { mockApi } from "../../../test/mock-api.ts";
import { renderWithApp } from "../../../test/render.tsx";
import { booking } from "../../../test/fixtures.ts";
import { edit, entry } from "../test-fixtures.ts";
import { CorrectionDialog } from "./correction-dialog.tsx";

const timeZone = "America/Chicago";
const dialog = (name: string) => within(screen.getByRole("dialog", { name }));

describe("CorrectionDialog", () => {
  it("prefills the entry in studio time and sends ISO instants with the studio's offset (−06:00 in December)", async () => {
    const { calls } = mockApi([
      { method: "GET", path: "/api/bookings", reply: { body: [] } },
      { method: "POST", path: "/api/time-entry-edits", reply: { status: 201, body: edit() } },
    ]);
    const onClose = vi.fn();
    const { user } = renderWithApp(<CorrectionDialog open onClose={onClose} entry={entry()} staffUserId="u-priya" timeZone={timeZone} />);
    const form = dialog("Ask for a correction");

    expect(form.getByLabelText("Start")).toHaveValue("2026-12-07T09:58");
    expect(form.getByLabelText("End")).toHaveValue("2026-12-07T18:30");
    expect(form.getByLabelText("Break from")).toHaveValue("2026-12-07T13:00");
    expect(form.getByLabelText("Break to")).toHaveValue("2026-12-07T13:30");

    fireEvent.change(form.getByLabelText("Start"), { target: { value: "2026-12-07T09:30" } });
    await user.type(form.getByLabelText("Reason"), "Started the mic setup before clocking in");
    await user.click(form.getByRole("button", { name: "Send for approval" }));

    expect(await screen.findByText("Correction sent for approval")).toBeInTheDocument();
    expect(calls.filter((c) => c.method === "POST")).toEqual([
      {
        method: "POST",
        path: "/api/time-entry-edits",
        credentials: "same-origin",
        body: {
          timeEntryId: 501,
          startedAt: "2026-12-07T09:30:00-06:00",
          endedAt: "2026-12-07T18:30:00-06:00",
          breaks: [{ startedAt: "2026-12-07T13:00:00-06:00", endedAt: "2026-12-07T13:30:00-06:00" }],
          bookingId: 12,
          reason: "Started the mic setup before clocking in",
        },
      },
    ]);
    expect(onClose).toHaveBeenCalled();
  });

  it("requires a reason before sending anything", async () => {
    const { calls } = mockApi([]);
    const { user } = renderWithApp(<CorrectionDialog open onClose={() => undefined} entry={entry()} staffUserId="u-priya" timeZone={timeZone} />);

    await user.click(screen.getByRole("button", { name: "Send for approval" }));

    expect(await screen.findByText("Say why the change is needed")).toBeInTheDocument();
    expect(screen.getByLabelText("Reason")).toHaveAttribute("aria-invalid", "true");
    expect(calls.filter((c) => c.method === "POST")).toEqual([]);
  });

  it("adds missing time as a new entry, without an entry id and with no empty break, tied to a session that day", async () => {
    const session = booking({ id: 44, startsAt: "2026-12-05T18:00:00.000Z", endsAt: "2026-12-05T22:00:00.000Z", engineers: [{ userId: "u-priya", name: "Priya Oduya", grade: "engineer" }] });
    const { calls } = mockApi([
      { method: "GET", path: "/api/bookings", reply: { body: [session] } },
      { method: "POST", path: "/api/time-entry-edits", reply: { status: 201, body: edit({ timeEntryId: null, current: null }) } },
    ]);
    const { user } = renderWithApp(<CorrectionDialog open onClose={() => undefined} staffUserId="u-priya" timeZone={timeZone} />);
    const form = dialog("Add missing time");

    fireEvent.change(form.getByLabelText("Start"), { target: { value: "2026-12-05T12:00" } });
    fireEvent.change(form.getByLabelText("End"), { target: { value: "2026-12-05T16:15" } });
    const choice = await form.findByRole("option", { name: `${session.client.name} — ${session.room.name}, Sat 5 Dec 12:00–16:00` });
    await user.selectOptions(form.getByLabelText("Session"), choice);
    await user.type(form.getByLabelText("Reason"), "Forgot to clock in for the overdubs");
    await user.click(form.getByRole("button", { name: "Send for approval" }));

    expect(await screen.findByText("Missing time sent for approval")).toBeInTheDocument();
    // The sessions are looked up from the day before to the day after, studio days.
    expect(calls[0]?.path).toBe(`/api/bookings?from=${encodeURIComponent("2026-12-04T00:00:00-06:00")}&to=${encodeURIComponent("2026-12-07T00:00:00-06:00")}&engineerId=u-priya`);
    expect(calls.find((c) => c.method === "POST")?.body).toEqual({
      startedAt: "2026-12-05T12:00:00-06:00",
      endedAt: "2026-12-05T16:15:00-06:00",
      breaks: [],
      bookingId: 44,
      reason: "Forgot to clock in for the overdubs",
    });
  });

  it("refuses an end before the start, and a break outside the entry", async () => {
    const { calls } = mockApi([]);
    const { user } = renderWithApp(<CorrectionDialog open onClose={() => undefined} entry={entry()} staffUserId="u-priya" timeZone={timeZone} />);
    const form = dialog("Ask for a correction");

    fireEvent.change(form.getByLabelText("End"), { target: { value: "2026-12-07T09:00" } });
    await user.type(form.getByLabelText("Reason"), "Wrong end");
    await user.click(form.getByRole("button", { name: "Send for approval" }));
    expect(await form.findByText("The end must be after the start")).toBeInTheDocument();

    fireEvent.change(form.getByLabelText("End"), { target: { value: "2026-12-07T18:30" } });
    fireEvent.change(form.getByLabelText("Break from"), { target: { value: "2026-12-07T08:00" } });
    await user.click(form.getByRole("button", { name: "Send for approval" }));
    expect(await form.findByText("A break falls between the start and the end")).toBeInTheDocument();
    expect(calls.filter((c) => c.method === "POST")).toEqual([]);
  });

  it("shows the API's refusal at the top of the form", async () => {
    mockApi([
      {
        method: "POST",
        path: "/api/time-entry-edits",
        reply: { status: 409, body: { error: { code: "edit_pending", message: "A correction to this entry is already waiting for a decision" } } },
      },
    ]);
    const { user } = renderWithApp(<CorrectionDialog open onClose={() => undefined} entry={entry()} staffUserId="u-priya" timeZone={timeZone} />);

    await user.type(screen.getByLabelText("Reason"), "Left later than clocked");
    await user.click(screen.getByRole("button", { name: "Send for approval" }));

    expect(await screen.findByRole("alert")).toHaveTextContent("A correction to this entry is already waiting for a decision");
  });
});
