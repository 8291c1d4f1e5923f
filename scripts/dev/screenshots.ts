// Takes screenshots of the main screens for each role at desktop and phone sizes, for review.
// Usage: npx tsx scripts/dev/screenshots.ts [baseUrl] [outDir]   (with `npm start` running)
import { mkdirSync } from "node:fs";
import { chromium } from "playwright-core";

const baseUrl = process.argv[2] ?? "http://localhost:3000";
const outDir = process.argv[3] ?? ".tmp/screenshots";
const password = "studio-demo-2026";
const shots: { role: string; email: string; paths: string[] }[] = [
  { role: "owner", email: "owner@wrenfield.test", paths: ["/", "/team", "/clients", "/settings", "/activity", "/dev/mail", "/pay-rates", "/payroll-settings", "/clock"] },
  { role: "manager", email: "manager@wrenfield.test", paths: ["/", "/clients", "/approvals"] },
  { role: "engineer", email: "priya@wrenfield.test", paths: ["/", "/timesheet"] },
  { role: "bookkeeper", email: "books@wrenfield.test", paths: ["/", "/pay-periods"] },
  { role: "client", email: "band@lanternstatic.test", paths: ["/", "/team"] },
];
const extraPaths = (process.env.SHOT_PATHS ?? "").split(",").filter(Boolean);

mkdirSync(outDir, { recursive: true });
const browser = await chromium.launch({ executablePath: "/usr/bin/chromium", args: ["--no-sandbox", "--disable-gpu", "--disable-background-networking"] });
for (const viewport of [{ width: 1280, height: 800, name: "desktop" }, { width: 390, height: 844, name: "phone" }]) {
  const anon = await browser.newPage({ viewport });
  await anon.goto(`${baseUrl}/sign-in`);
  await anon.screenshot({ path: `${outDir}/${viewport.name}-sign-in.png` });
  await anon.close();
  for (const shot of shots) {
    if (process.env.SHOT_ROLE && process.env.SHOT_ROLE !== shot.role) continue;
    const context = await browser.newContext({ viewport });
    const page = await context.newPage();
    await page.goto(`${baseUrl}/sign-in`);
    await page.getByLabel("E-mail").fill(shot.email);
    await page.getByLabel("Password").fill(password);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
    for (const path of [...shot.paths, ...extraPaths]) {
      await page.goto(`${baseUrl}${path}`);
      await page.waitForLoadState("networkidle");
      const name = `${viewport.name}-${shot.role}${path.replace(/\//g, "-").replace(/-$/, "") || "-home"}`;
      await page.screenshot({ path: `${outDir}/${name}.png`, fullPage: viewport.name === "desktop" });
    }
    await context.close();
  }
}
await browser.close();
console.log(`screenshots in ${outDir}`);
