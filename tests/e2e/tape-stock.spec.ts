import { describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { newPage, signIn, useBrowser } from "./support/browser.ts";

useBrowser();

// A small PDF as a supplier would send it: the server checks the bytes, not the name.
const receiptPdf = Buffer.from("%PDF-1.4\n1 0 obj<< /Type /Catalog >>endobj\ntrailer<< /Root 1 0 R >>\n%%EOF\n");
const product = "1/4-inch tape, 2500 ft";

const row = (page: Page) => page.getByRole("row").filter({ hasText: product });
const onHandIn = async (page: Page) => Number((await row(page).getByRole("cell").nth(1).innerText()).trim());
const averageIn = async (page: Page) => (await row(page).getByRole("cell").nth(3).innerText()).trim();

describe("tape stock", () => {
  it("the manager receives reels with a receipt, sells some to a band's project, and is refused a sale beyond stock", async () => {
    const { context, page } = await newPage();
    await signIn(page, "manager@wrenfield.test");
    await page.getByRole("link", { name: "Tape stock" }).click();
    await expect.poll(() => row(page).count()).toBe(1);
    const before = await onHandIn(page);
    const averageBefore = await averageIn(page);

    await page.getByRole("button", { name: `Receive ${product}` }).click();
    const receive = page.getByRole("dialog", { name: `Receive ${product}` });
    await receive.getByLabel("Reels received").fill("5");
    await receive.getByLabel("Cost per reel").fill("52.00");
    await receive.getByLabel("Supplier").fill("Northgate Media Supply");
    await receive.getByLabel("Receipt", { exact: true }).setInputFiles({ name: "delivery-note.pdf", mimeType: "application/pdf", buffer: receiptPdf });
    await receive.getByRole("button", { name: "Receive stock" }).click();
    await expect.poll(() => receive.getByText("100 % uploaded").count()).toBe(1);
    await expect.poll(() => receive.getByText(`now ${before + 5} on hand`).count()).toBe(1);
    await receive.getByRole("button", { name: "Done" }).click();
    await expect.poll(() => onHandIn(page)).toBe(before + 5);
    expect(await averageIn(page)).not.toBe(averageBefore);

    await page.getByRole("button", { name: `Sell ${product}` }).click();
    const sell = page.getByRole("dialog", { name: `Sell ${product}` });
    await sell.getByLabel("Reels").fill("2");
    await sell.getByLabel("Client").selectOption({ label: "Lantern Static" });
    await expect.poll(() => sell.getByLabel("Project").locator("option", { hasText: "Harbour Lights" }).count()).toBe(1);
    await sell.getByLabel("Project").selectOption({ label: "Harbour Lights" });
    await sell.getByRole("button", { name: "Sell reels" }).click();
    await expect.poll(() => page.getByText(/sold to Lantern Static/).count()).toBe(1);
    await expect.poll(() => onHandIn(page)).toBe(before + 3);

    await page.getByRole("button", { name: `Sell ${product}` }).click();
    const tooMany = page.getByRole("dialog", { name: `Sell ${product}` });
    await tooMany.getByLabel("Reels").fill(String(before + 10));
    await tooMany.getByLabel("Client").selectOption({ label: "Lantern Static" });
    await tooMany.getByRole("button", { name: "Sell reels" }).click();
    await expect.poll(() => tooMany.getByText(`only ${before + 3} are left`).count()).toBeGreaterThan(0);
    await tooMany.getByRole("button", { name: "Cancel" }).click();
    expect(await onHandIn(page)).toBe(before + 3);

    await page.getByRole("button", { name: `History of ${product}` }).click();
    const history = page.getByRole("dialog", { name: `History of ${product}` });
    await expect.poll(() => history.getByRole("link", { name: "Receipt" }).count()).toBeGreaterThan(0);
    await expect.poll(() => history.getByText(/Lantern Static · Harbour Lights/).count()).toBeGreaterThan(0);
    await context.close();
  });

  it("the planner lays an album out on reels with no take split", async () => {
    const { context, page } = await newPage();
    await signIn(page, "manager@wrenfield.test");
    await page.goto("/tape/planner");
    const songs = [
      ["Harbour Lights", "4.5", "3"],
      ["Salt Road", "6", "2"],
      ["Paper Moon Rising", "3.5", "4"],
    ];
    for (const [i, [title, minutes, takes]] of songs.entries()) {
      await page.getByLabel(`Song ${i + 1} title`).fill(title!);
      await page.getByLabel(`Song ${i + 1} minutes`).fill(minutes!);
      await page.getByLabel(`Song ${i + 1} takes`).fill(takes!);
    }
    await page.getByLabel("Tape product").selectOption({ label: "2-inch tape, 2500 ft" });
    await page.getByLabel("Speed").selectOption("15");
    await page.getByRole("button", { name: "Plan reels" }).click();
    // 13.5 + 12 + 14 = 39.5 minutes of takes; 32.33 usable minutes a reel at 15 in/s.
    await expect.poll(() => page.getByText("2 reels needed").count()).toBe(1);
    const layout = page.getByRole("list", { name: "Reel layout" });
    expect(await layout.getByRole("listitem").count()).toBe(2);
    expect(await page.getByRole("list", { name: "Other speeds" }).innerText()).toContain("At 7.5 in/s: 1 reel");
    await context.close();
  });
});
