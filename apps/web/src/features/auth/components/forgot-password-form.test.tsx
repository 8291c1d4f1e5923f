import { screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { mockApi } from "../../../test/mock-api.ts";
import { renderWithApp } from "../../../test/render.tsx";
import { ForgotPasswordForm } from "./forgot-password-form.tsx";

describe("ForgotPasswordForm", () => {
  it("asks for a reset link and answers the same way whether or not the address exists", async () => {
    const { calls } = mockApi([{ method: "POST", path: "/api/session/password-reset-requests", reply: { status: 202, body: { ok: true } } }]);
    const { user } = renderWithApp(<ForgotPasswordForm />);

    await user.type(screen.getByLabelText("E-mail"), "books@wrenfield.test");
    await user.click(screen.getByRole("button", { name: "Send reset link" }));

    expect(await screen.findByText("If that address has a sign-in, a reset link is on its way.")).toBeInTheDocument();
    expect(calls[0]).toMatchObject({ path: "/api/session/password-reset-requests", body: { email: "books@wrenfield.test" } });
  });

  it("shows the wait when too many reset links were asked for from this address", async () => {
    mockApi([
      {
        method: "POST",
        path: "/api/session/password-reset-requests",
        reply: { status: 429, body: { error: { code: "too_many_attempts", message: "Too many password-reset requests. Try again in 12 minutes." } } },
      },
    ]);
    const { user } = renderWithApp(<ForgotPasswordForm />);

    await user.type(screen.getByLabelText("E-mail"), "books@wrenfield.test");
    await user.click(screen.getByRole("button", { name: "Send reset link" }));

    expect(await screen.findByText("Too many password-reset requests. Try again in 12 minutes.")).toBeInTheDocument();
  });
});
