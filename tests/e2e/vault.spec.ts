import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { newPage, signIn, useBrowser } from "./support/browser.ts";
import { pdfText } from "../support/pdf-text.ts";

useBrowser();

type Reel = { id: number; labelId: string; projectName: string | null; clientName: string };

describe("the tape vault", () => {
  it("an engineer fills in a track sheet of her lockout's reel", async () => {
    const { context, page } = await newPage();
    await signIn(page, "priya@wrenfield.test");
    const reel = await page.evaluate(async () => ((await (await fetch("/api/reels")).json()) as Reel[]).find((r) => r.projectName === "Harbour Lights")!);
    await page.goto(`/vault/reels/${reel.id}`);
    const track = page.getByRole("textbox", { name: "Track 3", exact: true });
    await track.fill("Snare top (second mic)");
    await page.getByRole("button", { name: "Save track sheet" }).click();
    await expect.poll(() => page.getByText("Track sheet saved").count()).toBeGreaterThan(0);
    const saved = await page.evaluate(async (id) => (await (await fetch(`/api/reels/${id}`)).json()).tracks as { trackNo: number; contents: string }[], reel.id);
    expect(saved.find((t) => t.trackNo === 3)?.contents).toBe("Snare top (second mic)");
    await context.close();
  });

  it("the manager checks a reel out and back in by scanning its label, and downloads its box label", async () => {
    const { context, page } = await newPage();
    await signIn(page, "manager@wrenfield.test");
    const reel = await page.evaluate(async () => ((await (await fetch("/api/reels?status=in_vault")).json()) as Reel[]).find((r) => r.projectName === "Night Ferries")!);
    await page.goto("/vault");
    await page.getByLabel("Scan or type a label id").fill(reel.labelId.toLowerCase());
    await page.getByRole("button", { name: "Find reel" }).click();
    await expect.poll(() => page.getByRole("heading", { name: reel.labelId }).count()).toBe(1);
    await page.getByLabel("Taken by").fill("Corin Mayfield");
    await page.getByLabel("Why").fill("Transfer to digital");
    await page.getByLabel("Due back").fill("2099-01-31");
    await page.getByRole("button", { name: "Check out" }).click();
    await expect.poll(() => page.getByRole("button", { name: "Check in" }).count()).toBe(1);
    await page.getByLabel("Brought back by").fill("Corin Mayfield");
    await page.getByRole("button", { name: "Check in" }).click();
    await expect.poll(() => page.getByRole("button", { name: "Check out" }).count()).toBe(1);
    await expect.poll(() => page.getByRole("list", { name: "Movements" }).getByText("Checked in").count()).toBe(1);

    const [file] = await Promise.all([page.waitForEvent("download"), page.getByRole("link", { name: "Download box label (PDF)" }).click()]);
    const text = await pdfText(readFileSync((await file.path())!));
    expect(text).toContain(reel.labelId);
    expect(text).toContain("Track sheet");
    await context.close();
  });

  it("a client sees its reels and their track sheets and nothing of another client's", async () => {
    const { context, page } = await newPage();
    await signIn(page, "band@lanternstatic.test");
    await page.getByRole("link", { name: "Your reels" }).click();
    await expect.poll(() => page.getByRole("heading", { name: "Your reels" }).count()).toBe(1);
    await expect.poll(() => page.getByRole("table", { name: "Reels" }).getByText("Harbour Lights").count()).toBeGreaterThan(0);
    expect(await page.getByText("Night Ferries").count()).toBe(0);
    await page.getByRole("table", { name: "Reels" }).getByRole("link").first().click();
    await expect.poll(() => page.getByRole("heading", { name: "Track sheet" }).count()).toBe(1);
    expect(await page.getByRole("button", { name: "Save track sheet" }).count()).toBe(0);
    const statuses = await page.evaluate(async () => {
      const mine = ((await (await fetch("/api/reels")).json()) as Reel[]).map((r) => r.id);
      const others = Array.from({ length: 45 }, (_, i) => i + 1).filter((id) => !mine.includes(id));
      return Promise.all(others.map(async (id) => (await fetch(`/api/reels/${id}`)).status));
    });
    expect(new Set(statuses)).toEqual(new Set([404]));
    await context.close();
  });

  it("the owner sees on the home page that a recorder is due for alignment", async () => {
    const { context, page } = await newPage();
    await signIn(page, "owner@wrenfield.test");
    const card = page.getByRole("region", { name: "Recorders due" });
    await expect.poll(() => card.getByText("24-track 2-inch tape recorder").count()).toBeGreaterThan(0);
    expect(await card.getByText(/alignment due/).count()).toBeGreaterThan(0);
    await context.close();
  });
});
