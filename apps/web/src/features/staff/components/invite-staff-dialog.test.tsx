import { screen, within } from "@testing-library/react";
import { describe, expect, it, vi } from "vitest";
import { mockApi } from "../../../test/mock-api.ts";
import { renderWithApp } from "../../../test/render.tsx";
import { InviteStaffDialog } from "./invite-staff-dialog.tsx";

const pending = { id: 4, name: "Jo Kettering", email: "jo@wrenfield.test", role: "engineer", expiresAt: "2026-03-10T12:00:00.000Z" };

describe("InviteStaffDialog", () => {
  it("sends the name, e-mail and role, then closes and confirms with a toast", async () => {
    const { calls } = mockApi([{ method: "POST", path: "/api/staff/invitations", reply: { status: 201, body: pending } }]);
    const onClose = vi.fn();
    const { user } = renderWithApp(<InviteStaffDialog open onClose={onClose} />);
    const dialog = within(screen.getByRole("dialog", { name: "Invite someone to the team" }));

    await user.type(dialog.getByLabelText("Name"), "Jo Kettering");
    await user.type(dialog.getByLabelText("E-mail"), "jo@wrenfield.test");
    await user.selectOptions(dialog.getByLabelText("Role"), "bookkeeper");
    await user.click(dialog.getByRole("button", { name: "Send invitation" }));

    expect(await screen.findByText("Invitation sent to jo@wrenfield.test")).toBeInTheDocument();
    expect(calls).toEqual([
      {
        method: "POST",
        path: "/api/staff/invitations",
        body: { name: "Jo Kettering", email: "jo@wrenfield.test", role: "bookkeeper" },
        credentials: "same-origin",
      },
    ]);
    expect(onClose).toHaveBeenCalled();
  });

  it("shows the API's field error under the field it names", async () => {
    mockApi([
      {
        method: "POST",
        path: "/api/staff/invitations",
        reply: {
          status: 400,
          body: {
            error: {
              code: "invalid_input",
              message: "Check the request: name: Use at most 120 characters",
              details: [{ field: "name", rule: "too_big", message: "That name is already on the team list" }],
            },
          },
        },
      },
    ]);
    const onClose = vi.fn();
    const { user } = renderWithApp(<InviteStaffDialog open onClose={onClose} />);

    await user.type(screen.getByLabelText("Name"), "Sam Reyes");
    await user.type(screen.getByLabelText("E-mail"), "sam@wrenfield.test");
    await user.click(screen.getByRole("button", { name: "Send invitation" }));

    expect(await screen.findByText("That name is already on the team list")).toBeInTheDocument();
    expect(screen.getByLabelText("Name")).toHaveAttribute("aria-invalid", "true");
    expect(onClose).not.toHaveBeenCalled();
  });

  it("puts a taken e-mail address on the E-mail field", async () => {
    mockApi([
      {
        method: "POST",
        path: "/api/staff/invitations",
        reply: { status: 409, body: { error: { code: "email_taken", message: "Someone already signs in with that e-mail" } } },
      },
    ]);
    const { user } = renderWithApp(<InviteStaffDialog open onClose={() => undefined} />);

    await user.type(screen.getByLabelText("Name"), "Priya Oduya");
    await user.type(screen.getByLabelText("E-mail"), "priya@wrenfield.test");
    await user.click(screen.getByRole("button", { name: "Send invitation" }));

    expect(await screen.findByText("Someone already signs in with that e-mail")).toBeInTheDocument();
    expect(screen.getByLabelText("E-mail")).toHaveAccessibleDescription("Someone already signs in with that e-mail");
  });

  it("checks the form before sending anything", async () => {
    const { calls } = mockApi([]);
    const { user } = renderWithApp(<InviteStaffDialog open onClose={() => undefined} />);

    await user.type(screen.getByLabelText("E-mail"), "not-an-address");
    await user.click(screen.getByRole("button", { name: "Send invitation" }));

    expect(await screen.findByText("Enter a name")).toBeInTheDocument();
    expect(screen.getByText("Enter a valid e-mail address")).toBeInTheDocument();
    expect(calls).toEqual([]);
  });
});
