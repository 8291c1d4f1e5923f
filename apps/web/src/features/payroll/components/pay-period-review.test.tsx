import { screen, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { mockApi } from "../../../test/mock-api.ts";
import { renderWithApp } from "../../../test/render.tsx";
import { period, review, staffRow } from "../test-fixtures.ts";
import { PayPeriodReview } from "./pay-period-review.tsx";

const cells = (row: HTMLElement) => within(row).getAllByRole("cell").map((c) => c.textContent);
const table = () => within(screen.getByRole("table", { name: "Hours and pay per person" }));

describe("PayPeriodReview", () => {
  it("shows a row per person and a totals row that is the sum of the rows", () => {
    mockApi([]);
    renderWithApp(<PayPeriodReview review={review()} role="bookkeeper" currency="USD" />);

    const [, priya, jo, total] = table().getAllByRole("row");
    expect(within(priya!).getByRole("rowheader")).toHaveTextContent("Priya Oduyaengineer $28.00/h6 entries");
    expect(cells(priya!)).toEqual(["40.00 h", "1.50 h", "0.00 h", "41.50 h", "—one rate", "$697.20", "$21.00", "$0.00", "$718.20"]);
    expect(within(jo!).getByRole("rowheader")).toHaveTextContent("Jo Ketteringassistant $22.00/hengineer $24.00/h7 entries");
    expect(cells(jo!)).toEqual(["40.00 h", "4.75 h", "1.00 h", "45.75 h", "$22.25", "$1,017.75", "$52.50", "$22.25", "$1,092.50"]);
    expect(within(total!).getByRole("rowheader")).toHaveTextContent("Total");
    // 40 + 40, 1.5 + 4.75, 0 + 1, 41.5 + 45.75; $697.20 + $1,017.75, $21.00 + $52.50, $0 + $22.25, $718.20 + $1,092.50.
    expect(cells(total!)).toEqual(["80.00 h", "6.25 h", "1.00 h", "87.25 h", "No total", "$1,714.95", "$73.50", "$22.25", "$1,810.70"]);
  });

  it("says which overtime belongs to a week still open at the period's end (29 CFR 778.106)", () => {
    mockApi([]);
    const note =
      "The week of 2026-01-12 is still open at the period's end (its last day is 2026-01-18): the straight time worked so far is paid in this period; its overtime, if any, is paid in the period holding 2026-01-18 (29 CFR 778.106).";
    const open = { workweekStart: "2026-01-12", lastWorkday: "2026-01-18", begunEarlier: false, stillOpen: true, workedMinutes: 1920, overtimeMinutes: 0, doubleTimeMinutes: 0, weekOvertimeMinutes: 0, weekDoubleTimeMinutes: 0, overtimePremiumCents: 0, doubleTimePremiumCents: 0, note };
    renderWithApp(<PayPeriodReview review={review({ staff: [staffRow({ straddlingWeeks: [open] })] })} role="bookkeeper" currency="USD" />);

    const weeks = within(screen.getByRole("region", { name: "Weeks across the period's edge" }));
    expect(weeks.getByText("Priya Oduya · still open at the period's end")).toBeInTheDocument();
    expect(weeks.getByText(note)).toBeInTheDocument();
  });

  it("shows no list of straddling weeks when every week lies inside the period", () => {
    mockApi([]);
    renderWithApp(<PayPeriodReview review={review()} role="bookkeeper" currency="USD" />);
    expect(screen.queryByRole("region", { name: "Weeks across the period's edge" })).toBeNull();
  });

  it("names the rules in plain words and lists each flag's message in studio time", () => {
    mockApi([]);
    renderWithApp(<PayPeriodReview review={review()} role="bookkeeper" currency="USD" />);

    expect(screen.getByText("Weekly: 1.5× over 40 hours in the workweek")).toBeInTheDocument();
    expect(screen.getByText("Nearest quarter hour")).toBeInTheDocument();
    const flags = within(screen.getByRole("region", { name: "Flags (2)" }));
    expect(flags.getByText("Sam Reyes has been clocked in since Sat 5 Dec, 09:00 and has not clocked out")).toBeInTheDocument();
    expect(flags.getByText("Priya Oduya has a correction waiting for a decision: “Left later than clocked”")).toBeInTheDocument();
  });

  it("shows the bookkeeper an owner's self-approved correction among the flags", () => {
    mockApi([]);
    const message = "Mara Linden approved a correction to their own time (no other owner to ask); check it before approving the period";
    renderWithApp(<PayPeriodReview review={review({ flags: [{ kind: "self_approved", staffName: "Mara Linden", entryId: 700, message }] })} role="bookkeeper" currency="USD" />);

    const flags = within(screen.getByRole("region", { name: "Flags (1)" }));
    expect(flags.getByText("Self-approved correction")).toBeInTheDocument();
    expect(flags.getByText(message)).toBeInTheDocument();
  });

  it("offers a manager approval, never locking or the export", async () => {
    const { calls } = mockApi([
      { method: "POST", path: "/api/pay-periods/9/approve", reply: { body: period({ status: "approved", approvedByName: "Theo Vance", approvedAt: "2026-12-07T16:00:00.000Z" }) } },
    ]);
    const { user, unmount } = renderWithApp(<PayPeriodReview review={review()} role="manager" currency="USD" />);

    expect(screen.queryByRole("button", { name: "Download XLSX" })).not.toBeInTheDocument();
    await user.click(screen.getByRole("button", { name: "Approve period" }));
    expect(await screen.findByText("Pay period 30 Nov – 6 Dec 2026 approved")).toBeInTheDocument();
    expect(calls.map((c) => `${c.method} ${c.path}`)).toContain("POST /api/pay-periods/9/approve");

    unmount();
    renderWithApp(<PayPeriodReview review={review({ period: period({ status: "approved", approvedByName: "Theo Vance", approvedAt: "2026-12-07T16:00:00.000Z" }) })} role="manager" currency="USD" />);
    expect(screen.getByText(/Approved by Theo Vance on Monday 7 December 2026 at 10:00/)).toBeInTheDocument();
    expect(screen.getByRole("button", { name: "Reopen period" })).toBeInTheDocument();
    expect(screen.queryByRole("button", { name: "Lock period" })).not.toBeInTheDocument();
  });

  it("asks before locking, saying only the owner can unlock", async () => {
    const { calls } = mockApi([{ method: "POST", path: "/api/pay-periods/9/lock", reply: { body: period({ status: "locked" }) } }]);
    const { user } = renderWithApp(<PayPeriodReview review={review({ period: period({ status: "approved", approvedByName: "Theo Vance" }) })} role="bookkeeper" currency="USD" />);

    await user.click(screen.getByRole("button", { name: "Lock period" }));
    const dialog = within(screen.getByRole("dialog", { name: "Lock this pay period?" }));
    expect(dialog.getByText("Locked periods cannot change; only the owner can unlock.")).toBeInTheDocument();
    expect(calls).toEqual([]);
    await user.click(dialog.getByRole("button", { name: "Lock period" }));

    expect(await screen.findByText("Pay period 30 Nov – 6 Dec 2026 locked")).toBeInTheDocument();
    expect(calls.map((c) => `${c.method} ${c.path}`)).toEqual(["POST /api/pay-periods/9/lock"]);
  });

  it("shows who locked the period, and lets only the owner unlock it, with a reason", async () => {
    const locked = review({ period: period({ status: "locked", approvedByName: "Theo Vance", lockedByName: "Lena Marsh", lockedAt: "2026-12-08T22:30:00.000Z" }) });
    const { calls } = mockApi([{ method: "POST", path: "/api/pay-periods/9/unlock", reply: { body: period() } }]);
    const first = renderWithApp(<PayPeriodReview review={locked} role="bookkeeper" currency="USD" />);

    expect(screen.getByText(/Locked by Lena Marsh on Tuesday 8 December 2026 at 16:30/)).toBeInTheDocument();
    expect(screen.queryByRole("button", { name: "Unlock period" })).not.toBeInTheDocument();

    first.unmount();
    const { user } = renderWithApp(<PayPeriodReview review={locked} role="owner" currency="USD" />);
    await user.click(screen.getByRole("button", { name: "Unlock period" }));
    const dialog = within(screen.getByRole("dialog", { name: "Unlock this pay period?" }));
    await user.click(dialog.getByRole("button", { name: "Unlock period" }));
    expect(await dialog.findByText("Say why the period is reopened")).toBeInTheDocument();
    expect(calls).toEqual([]);

    await user.type(dialog.getByLabelText("Reason"), "Sam's Saturday was missing");
    await user.click(dialog.getByRole("button", { name: "Unlock period" }));
    expect(await screen.findByText("Pay period 30 Nov – 6 Dec 2026 unlocked")).toBeInTheDocument();
    expect(calls[0]).toMatchObject({ path: "/api/pay-periods/9/unlock", body: { reason: "Sam's Saturday was missing" } });
  });

  it("shows the API's refusal to approve while corrections wait", async () => {
    mockApi([
      {
        method: "POST",
        path: "/api/pay-periods/9/approve",
        reply: { status: 409, body: { error: { code: "edits_pending", message: "Decide the 1 pending correction in this period before approving it" } } },
      },
    ]);
    const { user } = renderWithApp(<PayPeriodReview review={review()} role="owner" currency="USD" />);

    await user.click(screen.getByRole("button", { name: "Approve period" }));
    expect(await screen.findByText("Decide the 1 pending correction in this period before approving it")).toBeInTheDocument();
  });
});
