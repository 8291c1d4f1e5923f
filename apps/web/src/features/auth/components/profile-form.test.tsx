import { screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { mockApi } from "../../../test/mock-api.ts";
import { renderWithApp } from "../../../test/render.tsx";
import { ProfileForm } from "./profile-form.tsx";

const me = { id: "u1", name: "Band", email: "band@lanternstatic.test", role: "client" as const, clientAccount: { id: 1, name: "Lantern Static" } };

describe("ProfileForm", () => {
  it("saves one's own name through PATCH /api/me", async () => {
    const { calls } = mockApi([{ method: "PATCH", path: "/api/me", reply: { status: 200, body: { ...me, name: "Lantern Static band" } } }]);
    const { user } = renderWithApp(<ProfileForm me={me} />);

    const name = screen.getByLabelText("Your name");
    await user.clear(name);
    await user.type(name, "  Lantern Static band ");
    await user.click(screen.getByRole("button", { name: "Save" }));

    expect(await screen.findByText("Your name is saved")).toBeInTheDocument();
    expect(calls[0]).toMatchObject({ path: "/api/me", body: { name: "Lantern Static band" } });
  });

  it("refuses markup before sending anything", async () => {
    const { calls } = mockApi([]);
    const { user } = renderWithApp(<ProfileForm me={me} />);

    const name = screen.getByLabelText("Your name");
    await user.clear(name);
    await user.type(name, "<b>Band</b>");
    await user.click(screen.getByRole("button", { name: "Save" }));

    expect(await screen.findByText(/Use plain text/)).toBeInTheDocument();
    expect(calls).toHaveLength(0);
  });
});
