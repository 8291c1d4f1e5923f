// Browser journeys drive Debian's Chromium through playwright-core against the app that
// `npm test` started (E2E_BASE_URL). A page error or console error fails the journey.
import { chromium, type Browser, type BrowserContext, type Page } from "playwright-core";
import { afterAll, afterEach, beforeAll, expect } from "vitest";
import { browserWaitMs } from "../../support/waits";

export const baseUrl = process.env.E2E_BASE_URL ?? "http://localhost:3100";
const mailUrl = process.env.E2E_MAIL_URL ?? "http://127.0.0.1:2580";
export const demoPassword = "studio-demo-2026";

export const phone = { width: 390, height: 844 };
export const desktop = { width: 1280, height: 800 };

// Chromium logs every 4xx fetch as a console error; the journeys provoke those on purpose.
const expectedNoise = /Failed to load resource: the server responded with a status of (401|403|404|409|423|429)/;

let browser: Browser;
const problems: string[] = [];

/** Starts one headless Chromium for the test file and checks each journey left no errors. */
export function useBrowser() {
  beforeAll(async () => {
    browser = await chromium.launch({
      executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
      headless: true,
      args: ["--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
    });
  });
  afterAll(async () => {
    await browser?.close();
  });
  afterEach(() => {
    const found = problems.splice(0);
    expect(found, "errors in the browser").toEqual([]);
  });
}

/** A fresh browser profile (own cookies) with one page. */
export async function newPage(viewport = desktop): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser.newContext({ viewport, baseURL: baseUrl, locale: "en-US" });
  context.setDefaultTimeout(browserWaitMs);
  context.setDefaultNavigationTimeout(browserWaitMs);
  const page = await context.newPage();
  page.on("pageerror", (error) => problems.push(`page error: ${error.message}`));
  page.on("console", (message) => {
    if (message.type() === "error" && !expectedNoise.test(message.text())) problems.push(`console: ${message.text()}`);
  });
  return { context, page };
}

export async function signIn(page: Page, email: string, password = demoPassword) {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
}

type Caught = { to: string[]; subject: string; text: string };

/** Waits for an e-mail to arrive at the local catcher and returns the newest one. */
export async function waitForMail(to: string, timeoutMs = browserWaitMs): Promise<Caught> {
  const started = Date.now();
  for (;;) {
    const response = await fetch(`${mailUrl}/messages?to=${encodeURIComponent(to)}`);
    const messages = (await response.json()) as Caught[];
    if (messages[0]) return messages[0];
    if (Date.now() - started > timeoutMs) throw new Error(`no e-mail to ${to}`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

export function linkIn(text: string, pathPrefix: string): string {
  const match = text.match(new RegExp(`https?://[^\\s]+${pathPrefix}[^\\s]+`));
  if (!match) throw new Error(`no ${pathPrefix} link in ${text}`);
  return match[0];
}

/** A unique suffix so journeys can run again on the same database. */
export const unique = () => Date.now().toString(36) + Math.floor(Math.random() * 1000).toString(36);
