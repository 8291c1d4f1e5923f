import { screen } from "@testing-library/react";
import { describe, expect, it, vi } from "vitest";
import { owner } from "../../../test/fixtures.ts";
import { mockApi } from "../../../test/mock-api.ts";
import { renderWithApp } from "../../../test/render.tsx";
import { SignInForm } from "./sign-in-form.tsx";

describe("SignInForm", () => {
  it("signs in with the e-mail and password and hands back who signed in", async () => {
    const { calls } = mockApi([{ method: "POST", path: "/api/session", reply: { body: owner } }]);
    const onSignedIn = vi.fn();
    const { user } = renderWithApp(<SignInForm onSignedIn={onSignedIn} />);

    await user.type(screen.getByLabelText("E-mail"), "owner@wrenfield.test");
    await user.type(screen.getByLabelText("Password"), "studio-demo-2026");
    await user.click(screen.getByRole("button", { name: "Sign in" }));

    await vi.waitFor(() => expect(onSignedIn).toHaveBeenCalledWith(owner));
    expect(calls[0]).toMatchObject({ method: "POST", path: "/api/session", body: { email: "owner@wrenfield.test", password: "studio-demo-2026" } });
  });

  it("says plainly when the e-mail and password do not match", async () => {
    mockApi([
      {
        method: "POST",
        path: "/api/session",
        reply: { status: 401, body: { error: { code: "invalid_credentials", message: "That e-mail and password do not match" } } },
      },
    ]);
    const onSignedIn = vi.fn();
    const { user } = renderWithApp(<SignInForm onSignedIn={onSignedIn} />);

    await user.type(screen.getByLabelText("E-mail"), "owner@wrenfield.test");
    await user.type(screen.getByLabelText("Password"), "wrong-password");
    await user.click(screen.getByRole("button", { name: "Sign in" }));

    expect(await screen.findByRole("alert")).toHaveTextContent("That e-mail and password do not match");
    expect(onSignedIn).not.toHaveBeenCalled();
  });

  it("offers the way to reset a forgotten password", () => {
    mockApi([]);
    renderWithApp(<SignInForm onSignedIn={() => undefined} />);
    expect(screen.getByRole("link", { name: "Forgot your password?" })).toHaveAttribute("href", "/forgot-password");
  });
});
