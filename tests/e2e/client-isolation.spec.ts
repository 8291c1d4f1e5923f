import { describe, expect, it } from "vitest";
import { newPage, signIn, useBrowser } from "./support/browser.ts";

useBrowser();

describe("a client sees only its own account", () => {
  it("gets the not-allowed page on a staff page", async () => {
    const { context, page } = await newPage();
    await signIn(page, "band@lanternstatic.test");
    await page.goto("/team");
    await expect.poll(() => page.getByRole("heading", { name: "Not allowed here" }).count()).toBe(1);
    await context.close();
  });

  it("sees its own account and cannot read another client's through the API", async () => {
    const { context, page } = await newPage();
    await signIn(page, "band@lanternstatic.test");
    await expect.poll(() => page.getByRole("heading", { name: "Lantern Static" }).count()).toBeGreaterThan(0);
    const result = await page.evaluate(async () => {
      const me = await (await fetch("/api/me")).json();
      const statuses: number[] = [];
      for (let id = 1; id <= 6; id++) if (id !== me.clientAccount.id) statuses.push((await fetch(`/api/clients/${id}`)).status);
      const list = (await fetch("/api/clients")).status;
      const own = (await fetch(`/api/clients/${me.clientAccount.id}`)).status;
      return { statuses, list, own };
    });
    expect(result.own).toBe(200);
    expect(result.list).toBe(403);
    expect(new Set(result.statuses)).toEqual(new Set([404]));
    await context.close();
  });
});
