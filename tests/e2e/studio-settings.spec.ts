import { describe, expect, it } from "vitest";
import { newPage, signIn, useBrowser } from "./support/browser.ts";

useBrowser();

describe("studio settings", () => {
  it("the owner changes how long holds last and the deposit, and they are kept", async () => {
    const { context, page } = await newPage();
    await signIn(page, "owner@wrenfield.test");
    await page.goto("/settings");
    const holds = page.getByLabel("Holds last (hours)");
    const deposit = page.getByLabel("Deposit (%)");
    const [holdsBefore, depositBefore] = [await holds.inputValue(), await deposit.inputValue()];
    await holds.fill("36");
    await deposit.fill("40");
    await page.getByRole("button", { name: "Save settings" }).click();
    await expect.poll(() => page.getByText("Studio settings saved").count()).toBe(1);

    await page.reload();
    await expect.poll(() => page.getByLabel("Holds last (hours)").inputValue()).toBe("36");
    expect(await page.getByLabel("Deposit (%)").inputValue()).toBe("40");

    // The workweek is a payroll rule: it is shown here and changed with the payroll settings.
    await page.getByRole("link", { name: "Change in Payroll settings" }).click();
    await expect.poll(() => page.getByRole("heading", { name: "Payroll settings" }).count()).toBe(1);

    // Put the demo studio back as it was for the other journeys.
    await page.goto("/settings");
    await page.getByLabel("Holds last (hours)").fill(holdsBefore);
    await page.getByLabel("Deposit (%)").fill(depositBefore);
    await page.getByRole("button", { name: "Save settings" }).click();
    await expect.poll(() => page.getByText("Studio settings saved").count()).toBeGreaterThan(0);
    await context.close();
  });
});
