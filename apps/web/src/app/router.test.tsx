import { screen, within } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { clientUser, lanternStatic, owner, studio } from "../test/fixtures.ts";
import { mockApi } from "../test/mock-api.ts";
import { renderWithApp } from "../test/render.tsx";
import { routes } from "./router.tsx";

const signedInAs = (me: typeof owner) => [
  { method: "GET" as const, path: "/api/me", reply: { body: me } },
  { method: "GET" as const, path: "/api/studio", reply: { body: studio } },
];

describe("the app's routes", () => {
  it("shows Page not found inside the shell for an unknown address", async () => {
    mockApi(signedInAs(owner));
    renderWithApp(null, { at: "/rate-cards-someday", routes });

    expect(await screen.findByRole("heading", { name: "Page not found" })).toBeInTheDocument();
    expect(screen.getByRole("navigation", { name: "Main" })).toBeInTheDocument();
  });

  it("greets a client with its own account on the home page", async () => {
    mockApi([
      ...signedInAs(clientUser),
      { method: "GET", path: "/api/clients/1", reply: { body: lanternStatic } },
      { method: "GET", path: "/api/bookings", reply: { body: [] } },
    ]);
    renderWithApp(null, { at: "/", routes });

    expect(await screen.findByRole("heading", { name: "Lantern Static", level: 1 })).toBeInTheDocument();
    const nav = within(screen.getByRole("navigation", { name: "Main" }));
    expect(nav.getAllByRole("link").map((l) => l.textContent)).toEqual(["Our account", "Sessions", "Invoices", "Your reels"]);
    expect(screen.getByRole("heading", { name: "People with sign-ins" })).toBeInTheDocument();
  });

  it("keeps a client out of the staff pages", async () => {
    mockApi(signedInAs(clientUser));
    renderWithApp(null, { at: "/clients", routes });

    expect(await screen.findByRole("heading", { name: "Not allowed here" })).toBeInTheDocument();
  });
});
