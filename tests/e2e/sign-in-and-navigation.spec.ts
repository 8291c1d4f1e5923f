import { describe, expect, it } from "vitest";
import { newPage, phone, signIn, useBrowser } from "./support/browser.ts";

useBrowser();

// What each role's navigation shows, and what it must not show (docs/roles.md).
const roles = [
  { who: "owner", email: "owner@wrenfield.test", sees: ["Today", "Clients", "Team", "Studio settings", "Activity"], hidden: [] },
  { who: "manager", email: "manager@wrenfield.test", sees: ["Today", "Clients"], hidden: ["Team", "Studio settings"] },
  { who: "engineer", email: "priya@wrenfield.test", sees: ["My day"], hidden: ["Clients", "Team"] },
  { who: "bookkeeper", email: "books@wrenfield.test", sees: ["Overview", "Clients"], hidden: ["Team", "Studio settings"] },
  { who: "client", email: "band@lanternstatic.test", sees: ["Our account"], hidden: ["Clients", "Team"] },
];

describe("signing in", () => {
  for (const role of roles) {
    it(`shows the ${role.who} only their own navigation`, async () => {
      const { context, page } = await newPage();
      await signIn(page, role.email);
      const nav = page.getByRole("navigation", { name: "Main" });
      for (const label of role.sees) await expect.poll(() => nav.getByRole("link", { name: label }).count()).toBe(1);
      for (const label of role.hidden) expect(await nav.getByRole("link", { name: label }).count()).toBe(0);
      // A full page load of the home address (not only in-app navigation) serves the app too.
      await page.goto("/");
      await expect.poll(() => page.getByRole("navigation", { name: "Main" }).count()).toBe(1);
      await context.close();
    });
  }

  it("says so when the password is wrong, and stays on the sign-in page", async () => {
    const { context, page } = await newPage();
    await page.goto("/sign-in");
    await page.getByLabel("E-mail").fill("owner@wrenfield.test");
    await page.getByLabel("Password").fill("not-the-password");
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect.poll(() => page.getByText("That e-mail and password do not match").count()).toBe(1);
    expect(new URL(page.url()).pathname).toBe("/sign-in");
    await context.close();
  });

  it("sends a signed-out visitor to sign-in and back to where they were going", async () => {
    const { context, page } = await newPage();
    await page.goto("/clients");
    await page.waitForURL(/\/sign-in/);
    await page.getByLabel("E-mail").fill("manager@wrenfield.test");
    await page.getByLabel("Password").fill("studio-demo-2026");
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL(/\/clients$/);
    await expect.poll(() => page.getByRole("cell", { name: "Lantern Static" }).count()).toBeGreaterThan(0);
    await context.close();
  });

  it("works on a phone: the menu opens and signing out returns to sign-in", async () => {
    const { context, page } = await newPage(phone);
    await signIn(page, "manager@wrenfield.test");
    await page.getByRole("button", { name: "Menu" }).click();
    await page.getByRole("button", { name: "Sign out" }).click();
    await page.waitForURL(/\/sign-in/);
    const width = await page.evaluate(() => document.documentElement.scrollWidth);
    expect(width).toBeLessThanOrEqual(390);
    await context.close();
  });
});
