import { screen, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { mockApi } from "../../../test/mock-api.ts";
import { renderWithApp } from "../../../test/render.tsx";
import { edit } from "../test-fixtures.ts";
import { CorrectionsReview } from "./corrections-review.tsx";

const timeZone = "America/Chicago";

describe("CorrectionsReview", () => {
  it("shows each waiting correction as current → proposed in studio time, and approves it", async () => {
    let decided = false;
    const { calls } = mockApi([
      { method: "GET", path: "/api/time-entry-edits", reply: () => ({ body: decided ? [] : [edit()] }) },
      {
        method: "POST",
        path: "/api/time-entry-edits/31/approve",
        reply: () => {
          decided = true;
          return { body: edit({ status: "approved", decidedByName: "Theo Vance", decidedAt: "2026-12-08T16:00:00.000Z" }) };
        },
      },
    ]);
    const { user } = renderWithApp(<CorrectionsReview timeZone={timeZone} />);

    const table = within(await screen.findByRole("table", { name: "Corrections waiting for a decision" }));
    const row = table.getAllByRole("row")[1]!;
    expect(row).toHaveTextContent("Priya Oduya");
    expect(row).toHaveTextContent("Mon 7 Dec");
    expect(row).toHaveTextContent("In09:58 → changes to09:30");
    expect(row).toHaveTextContent("Out18:30 (no change)");
    expect(row).toHaveTextContent("Worked8 h 2 min → changes to8 h 30 min(+28 min)");
    expect(row).toHaveTextContent("Started the mic setup before clocking in");
    expect(screen.getByRole("tab", { name: "Waiting (1)" })).toHaveAttribute("aria-selected", "true");

    await user.click(within(row).getByRole("button", { name: "Approve: Priya Oduya, Mon 7 Dec" }));

    expect(await screen.findByText("Correction approved: Priya Oduya, Mon 7 Dec")).toBeInTheDocument();
    expect(calls.find((c) => c.method === "POST")).toMatchObject({ path: "/api/time-entry-edits/31/approve", body: {} });
    expect(await screen.findByText("No corrections waiting.")).toBeInTheDocument();
    expect(calls.some((c) => c.path === "/api/time-entry-edits?status=pending")).toBe(true);
  });

  it("offers no Approve on a manager's own time, says who decides, and names who asked for someone else's", async () => {
    mockApi([
      {
        method: "GET",
        path: "/api/time-entry-edits",
        reply: {
          body: [
            edit({ id: 41, staffName: "Theo Vance", staffUserId: "u-theo", proposedByName: "Theo Vance", approvalRule: "own_time", reason: "trust me" }),
            edit({ id: 42, proposedByName: "Mara Linden" }),
          ],
        },
      },
    ]);
    renderWithApp(<CorrectionsReview timeZone={timeZone} />);

    const own = await screen.findByRole("button", { name: "Approve: Theo Vance, Mon 7 Dec" });
    expect(own).toBeDisabled();
    expect(screen.getByText("Your own time: an owner or another manager decides.")).toBeInTheDocument();
    expect(screen.getByRole("button", { name: "Reject: Theo Vance, Mon 7 Dec" })).toBeEnabled();
    expect(screen.getByRole("button", { name: "Approve: Priya Oduya, Mon 7 Dec" })).toBeEnabled();
    expect(screen.getByText("asked by Mara Linden")).toBeInTheDocument();
  });

  it("asks the sole owner to confirm a self-approval, which the bookkeeper will see flagged", async () => {
    const { calls } = mockApi([
      { method: "GET", path: "/api/time-entry-edits", reply: { body: [edit({ id: 43, staffName: "Mara Linden", staffUserId: "u-mara", proposedByName: "Mara Linden", approvalRule: "self_approval" })] } },
      { method: "POST", path: "/api/time-entry-edits/43/approve", reply: { body: edit({ id: 43, status: "approved", selfApproved: true }) } },
    ]);
    const { user } = renderWithApp(<CorrectionsReview timeZone={timeZone} />);

    await user.click(await screen.findByRole("button", { name: "Approve: Mara Linden, Mon 7 Dec" }));
    const dialog = within(screen.getByRole("dialog", { name: "Approve your own correction?" }));
    expect(dialog.getByText(/recorded as self-approved, and the bookkeeper sees it flagged/)).toBeInTheDocument();
    expect(calls.some((c) => c.method === "POST")).toBe(false);
    await user.click(dialog.getByRole("button", { name: "Self-approve" }));

    expect(await screen.findByText("Correction self-approved: Mara Linden, Mon 7 Dec")).toBeInTheDocument();
    expect(calls.find((c) => c.method === "POST")).toMatchObject({ path: "/api/time-entry-edits/43/approve" });
  });

  it("rejects with an optional note", async () => {
    const { calls } = mockApi([
      { method: "GET", path: "/api/time-entry-edits", reply: { body: [edit()] } },
      { method: "POST", path: "/api/time-entry-edits/31/reject", reply: { body: edit({ status: "rejected" }) } },
    ]);
    const { user } = renderWithApp(<CorrectionsReview timeZone={timeZone} />);

    await user.click(await screen.findByRole("button", { name: "Reject: Priya Oduya, Mon 7 Dec" }));
    const dialog = within(screen.getByRole("dialog", { name: "Reject this correction?" }));
    await user.type(dialog.getByLabelText("Note"), "The session started at 10:00");
    await user.click(dialog.getByRole("button", { name: "Reject correction" }));

    expect(await screen.findByText("Correction rejected: Priya Oduya, Mon 7 Dec")).toBeInTheDocument();
    expect(calls.find((c) => c.method === "POST")).toMatchObject({ path: "/api/time-entry-edits/31/reject", body: { note: "The session started at 10:00" } });
    expect(screen.queryByRole("dialog")).not.toBeInTheDocument();
  });

  it("shows the API's refusal, such as a locked pay period, in a toast", async () => {
    const message = "The pay period 2026-11-30 to 2026-12-13 is locked; only the owner can unlock it before time in it changes";
    mockApi([
      { method: "GET", path: "/api/time-entry-edits", reply: { body: [edit()] } },
      { method: "POST", path: "/api/time-entry-edits/31/approve", reply: { status: 423, body: { error: { code: "period_locked", message } } } },
    ]);
    const { user } = renderWithApp(<CorrectionsReview timeZone={timeZone} />);

    await user.click(await screen.findByRole("button", { name: "Approve: Priya Oduya, Mon 7 Dec" }));
    expect(await screen.findByText(message)).toBeInTheDocument();
  });

  it("lists recent decisions under Decided, with who decided and the note", async () => {
    mockApi([
      {
        method: "GET",
        path: "/api/time-entry-edits",
        reply: {
          body: [
            edit({ id: 40 }),
            edit({ id: 30, status: "rejected", decidedByName: "Theo Vance", decidedAt: "2026-12-08T16:00:00.000Z", decisionNote: "The session started at 10:00" }),
            edit({ id: 29, staffName: "Sam Reyes", staffUserId: "u-sam", timeEntryId: null, current: null, status: "approved", decidedByName: "Mara Linden", decidedAt: "2026-12-08T17:00:00.000Z" }),
          ],
        },
      },
    ]);
    const { user } = renderWithApp(<CorrectionsReview timeZone={timeZone} />);

    await screen.findByRole("table", { name: "Corrections waiting for a decision" });
    await user.click(screen.getByRole("tab", { name: "Decided" }));
    const rows = within(await screen.findByRole("table", { name: "Decided corrections" })).getAllByRole("row").slice(1);
    expect(rows).toHaveLength(2);
    expect(rows[0]).toHaveTextContent("Sam Reyes");
    expect(rows[0]).toHaveTextContent("New entry on Mon 7 Dec");
    expect(rows[0]).toHaveTextContent("ApprovedMara Linden, Tue 8 Dec, 11:00");
    expect(rows[1]).toHaveTextContent("RejectedTheo Vance, Tue 8 Dec, 10:00“The session started at 10:00”");
  });

  it("moves between the tabs with the arrow keys", async () => {
    mockApi([{ method: "GET", path: "/api/time-entry-edits", reply: { body: [] } }]);
    const { user } = renderWithApp(<CorrectionsReview timeZone={timeZone} />);

    const waiting = await screen.findByRole("tab", { name: "Waiting (0)" });
    waiting.focus();
    await user.keyboard("{ArrowRight}");
    expect(screen.getByRole("tab", { name: "Decided" })).toHaveFocus();
    expect(screen.getByRole("tab", { name: "Decided" })).toHaveAttribute("aria-selected", "true");
    expect(await screen.findByText("Nothing decided yet.")).toBeInTheDocument();
  });
});
