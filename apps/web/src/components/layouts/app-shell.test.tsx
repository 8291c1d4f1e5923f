import { screen } from "@testing-library/react";
import { describe, expect, it, vi } from "vitest";
import { navigationFor } from "../../config/navigation.ts";
import { renderWithApp } from "../../test/render.tsx";
import { AppShell } from "./app-shell.tsx";

describe("AppShell", () => {
  it("shows the studio, the person and their role, and signs out from the button", async () => {
    const onSignOut = vi.fn();
    const { user } = renderWithApp(
      <AppShell studioName="Wrenfield Sound" person={{ name: "Theo Vance", roleLabel: "Studio manager" }} items={navigationFor("manager")} onSignOut={onSignOut}>
        <h1>Today</h1>
      </AppShell>,
    );

    expect(screen.getAllByText("Wrenfield Sound").length).toBeGreaterThan(0);
    expect(screen.getByText("Theo Vance")).toBeInTheDocument();
    expect(screen.getByText("Studio manager")).toBeInTheDocument();
    await user.click(screen.getByRole("button", { name: "Sign out" }));
    expect(onSignOut).toHaveBeenCalledOnce();
  });

  it("opens the phone menu from the Menu button and closes it with Escape", async () => {
    const { user } = renderWithApp(
      <AppShell studioName="Wrenfield Sound" person={{ name: "Jo Kettering", roleLabel: "Engineer" }} items={navigationFor("engineer")} onSignOut={() => undefined}>
        <h1>My day</h1>
      </AppShell>,
    );
    const menu = screen.getByRole("button", { name: "Menu" });
    expect(menu).toHaveAttribute("aria-expanded", "false");

    await user.click(menu);
    expect(menu).toHaveAttribute("aria-expanded", "true");
    // The desktop sidebar and the opened phone menu: CSS shows only one of them at a time.
    expect(screen.getAllByRole("navigation", { name: "Main" })).toHaveLength(2);

    await user.keyboard("{Escape}");
    expect(menu).toHaveAttribute("aria-expanded", "false");
    expect(screen.getAllByRole("navigation", { name: "Main" })).toHaveLength(1);
  });
});
