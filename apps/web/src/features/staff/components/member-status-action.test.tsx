import { screen, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { member } from "../../../test/fixtures.ts";
import { mockApi } from "../../../test/mock-api.ts";
import { renderWithApp } from "../../../test/render.tsx";
import { MemberStatusAction } from "./member-status-action.tsx";

describe("MemberStatusAction", () => {
  it("asks first, explaining that deactivating signs the person out everywhere, then sends active: false", async () => {
    const { calls } = mockApi([
      { method: "PATCH", path: "/api/staff/u-sam", reply: { body: member({ active: false }) } },
      { method: "GET", path: "/api/staff", reply: { body: { members: [member({ active: false })], invitations: [] } } },
    ]);
    const { user } = renderWithApp(<MemberStatusAction member={member()} />);

    await user.click(screen.getByRole("button", { name: "Deactivate Sam Reyes" }));
    const dialog = within(screen.getByRole("dialog", { name: "Deactivate Sam Reyes?" }));
    expect(dialog.getByText(/signs Sam Reyes out everywhere at once/)).toBeInTheDocument();
    await user.click(dialog.getByRole("button", { name: "Deactivate" }));

    expect(await screen.findByText("Sam Reyes is deactivated and signed out")).toBeInTheDocument();
    expect(calls.find((c) => c.method === "PATCH")).toMatchObject({ path: "/api/staff/u-sam", body: { active: false } });
    expect(screen.queryByRole("dialog")).not.toBeInTheDocument();
  });

  it("shows the API's refusal, such as removing the last owner, as an error toast", async () => {
    mockApi([
      {
        method: "PATCH",
        path: "/api/staff/u-mara",
        reply: { status: 409, body: { error: { code: "last_owner", message: "The studio needs at least one active owner" } } },
      },
    ]);
    const mara = member({ userId: "u-mara", name: "Mara Linden", role: "owner" });
    const { user } = renderWithApp(<MemberStatusAction member={mara} />);

    await user.click(screen.getByRole("button", { name: "Deactivate Mara Linden" }));
    await user.click(within(screen.getByRole("dialog")).getByRole("button", { name: "Deactivate" }));

    expect(await screen.findByText("The studio needs at least one active owner")).toBeInTheDocument();
  });
});
