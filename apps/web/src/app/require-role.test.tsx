import { screen } from "@testing-library/react";
import { useLocation } from "react-router";
import { describe, expect, it } from "vitest";
import { engineer, owner, studio } from "../test/fixtures.ts";
import { mockApi } from "../test/mock-api.ts";
import { renderWithApp } from "../test/render.tsx";
import { RequireRole } from "./require-role.tsx";

function SignInMarker() {
  const location = useLocation();
  return <p>Sign-in page at {location.pathname + location.search}</p>;
}

const guarded = (
  <RequireRole roles={["owner"]}>
    <h1>Team</h1>
  </RequireRole>
);
const routes = [
  { path: "/sign-in", element: <SignInMarker /> },
  { path: "/team", element: guarded },
];

describe("RequireRole", () => {
  it("sends a signed-out visitor to sign in, remembering where they were going", async () => {
    mockApi([{ method: "GET", path: "/api/me", reply: { status: 401, body: { error: { code: "signed_out", message: "Sign in to continue" } } } }]);
    renderWithApp(null, { at: "/team", routes });

    expect(await screen.findByText("Sign-in page at /sign-in?next=%2Fteam")).toBeInTheDocument();
  });

  it("shows the not-allowed page to a role that may not use the screen", async () => {
    mockApi([
      { method: "GET", path: "/api/me", reply: { body: engineer } },
      { method: "GET", path: "/api/studio", reply: { body: studio } },
    ]);
    renderWithApp(null, { at: "/team", routes });

    expect(await screen.findByRole("heading", { name: "Not allowed here" })).toBeInTheDocument();
    expect(screen.queryByRole("heading", { name: "Team" })).not.toBeInTheDocument();
  });

  it("lets an allowed role through", async () => {
    mockApi([{ method: "GET", path: "/api/me", reply: { body: owner } }]);
    renderWithApp(null, { at: "/team", routes });

    expect(await screen.findByRole("heading", { name: "Team" })).toBeInTheDocument();
  });

  it("offers to try again when it cannot tell who is signed in", async () => {
    mockApi([
      { method: "GET", path: "/api/me", reply: { status: 503, body: { error: { code: "db_down", message: "The database is not answering" } } } },
    ]);
    renderWithApp(null, { at: "/team", routes });

    expect(await screen.findByText("The database is not answering")).toBeInTheDocument();
    expect(screen.getByRole("button", { name: "Try again" })).toBeInTheDocument();
  });
});
