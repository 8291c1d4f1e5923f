import { screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { mockApi } from "../../../test/mock-api.ts";
import { renderWithApp } from "../../../test/render.tsx";
import { MyCalendarFeeds } from "./my-calendar-feeds.tsx";

const feed = {
  id: 5,
  kind: "engineer" as const,
  roomId: null,
  staffUserId: "u-priya",
  name: "Priya Oduya's sessions",
  createdAt: "2026-11-30T15:00:00.000Z",
  revokedAt: null,
  url: null,
};
const url = "https://takeup.test/api/calendar-feeds/5/abc123.ics";

describe("MyCalendarFeeds", () => {
  it("creates a feed for the engineer and shows its address once, with a copy button", async () => {
    let created = false;
    const { calls } = mockApi([
      { method: "GET", path: "/api/calendar-feeds", reply: () => ({ body: created ? [feed] : [] }) },
      {
        method: "POST",
        path: "/api/calendar-feeds",
        reply: () => {
          created = true;
          return { status: 201, body: { ...feed, url } };
        },
      },
    ]);
    const { user } = renderWithApp(<MyCalendarFeeds staffUserId="u-priya" timeZone="America/Chicago" />);

    expect(await screen.findByText("No subscriptions yet.")).toBeInTheDocument();
    await user.click(screen.getByRole("button", { name: "Subscribe to my calendar" }));

    expect(await screen.findByLabelText("Feed address")).toHaveValue(url);
    expect(screen.getByText(/cannot show it again/)).toBeInTheDocument();
    expect(calls.find((c) => c.method === "POST")?.body).toEqual({ staffUserId: "u-priya" });
    await user.click(screen.getByRole("button", { name: "Copy address" }));
    // user-event stands in for the clipboard.
    expect(await navigator.clipboard.readText()).toBe(url);
    expect(screen.getByRole("button", { name: "Copied" })).toBeInTheDocument();
    expect(await screen.findByText("Priya Oduya's sessions")).toBeInTheDocument();
  });

  it("revokes a feed after asking", async () => {
    const { calls } = mockApi([
      { method: "GET", path: "/api/calendar-feeds", reply: { body: [feed] } },
      { method: "DELETE", path: "/api/calendar-feeds/5", reply: { status: 204 } },
    ]);
    const { user } = renderWithApp(<MyCalendarFeeds staffUserId="u-priya" timeZone="America/Chicago" />);

    await user.click(await screen.findByRole("button", { name: "Revoke Priya Oduya's sessions" }));
    await user.click(screen.getByRole("button", { name: "Revoke feed" }));

    expect(await screen.findByText("Feed revoked")).toBeInTheDocument();
    expect(calls.some((c) => c.method === "DELETE" && c.path === "/api/calendar-feeds/5")).toBe(true);
  });
});
