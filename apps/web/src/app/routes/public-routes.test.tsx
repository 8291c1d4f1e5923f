import { screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { owner, studio } from "../../test/fixtures.ts";
import { mockApi } from "../../test/mock-api.ts";
import { renderWithApp } from "../../test/render.tsx";
import { routes } from "../router.tsx";

const token = "a".repeat(40);

describe("screens reached from e-mailed links", () => {
  it("explains an expired invitation instead of showing the form", async () => {
    mockApi([
      {
        method: "GET",
        path: `/api/invitations/${token}`,
        reply: { status: 404, body: { error: { code: "invitation_not_found", message: "That invitation has expired" } } },
      },
    ]);
    renderWithApp(null, { at: `/invitations/${token}`, routes });

    expect(await screen.findByRole("heading", { name: "This invitation has expired" })).toBeInTheDocument();
    expect(screen.queryByRole("button", { name: "Accept and sign in" })).not.toBeInTheDocument();
  });

  it("shows who is invited, to which studio and role", async () => {
    mockApi([
      {
        method: "GET",
        path: `/api/invitations/${token}`,
        reply: {
          body: { name: "Jo Kettering", email: "jo@wrenfield.test", role: "engineer", studioName: "Wrenfield Sound", clientAccountName: null, expiresAt: "2026-04-01T12:00:00.000Z" },
        },
      },
    ]);
    renderWithApp(null, { at: `/invitations/${token}`, routes });

    expect(await screen.findByText("Jo Kettering")).toBeInTheDocument();
    expect(screen.getByText("You're invited to Wrenfield Sound as Engineer.")).toBeInTheDocument();
    expect(screen.getByLabelText("Password")).toBeInTheDocument();
    expect(screen.getByLabelText("Confirm password")).toBeInTheDocument();
  });

  it("offers a new reset link when the reset link is marked invalid", async () => {
    mockApi([]);
    renderWithApp(null, { at: "/reset-password?error=INVALID_TOKEN", routes });

    expect(await screen.findByRole("link", { name: "Ask for a new link" })).toHaveAttribute("href", "/forgot-password");
  });

  it("says plainly when caught e-mail is off because mail goes to a real server", async () => {
    mockApi([
      { method: "GET", path: "/api/me", reply: { body: owner } },
      { method: "GET", path: "/api/studio", reply: { body: studio } },
      {
        method: "GET",
        path: "/api/dev/mail",
        reply: { status: 404, body: { error: { code: "mail_catcher_off", message: "No local mail catcher" } } },
      },
    ]);
    renderWithApp(null, { at: "/dev/mail", routes });

    expect(await screen.findByText("E-mail is going to a real mail server; nothing is caught here.")).toBeInTheDocument();
  });
});
