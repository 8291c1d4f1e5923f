import { readFile } from "node:fs/promises";
import ExcelJS from "exceljs";
import { DateTime } from "luxon";
import type { Locator, Page } from "playwright-core";
import { describe, expect, it } from "vitest";
import { newPage, phone, signIn, unique, useBrowser } from "./support/browser.ts";

useBrowser();

// The journeys run in this order on the seeded demo studio: two weeks of clocked time
// before this one (packages/db/src/seed/demo-time.ts), weekly pay periods from Monday.
const zone = "America/Chicago";
const thisMonday = () => DateTime.now().setZone(zone).startOf("week");
const tablet = { width: 1024, height: 768 };
const emails: Record<string, string> = { "Priya Oduya": "priya@wrenfield.test", "Sam Reyes": "sam@wrenfield.test", "Jo Kettering": "jo@wrenfield.test" };

/** Calls the API from inside the signed-in page, as the app itself does. */
const api = <T = unknown>(page: Page, path: string, method = "GET", body?: unknown) =>
  page.evaluate(
    async ({ path, method, body }) => {
      const response = await fetch(path, { method, headers: { "content-type": "application/json" }, body: body ? JSON.stringify(body) : undefined });
      return { status: response.status, body: (await response.json().catch(() => null)) as unknown };
    },
    { path, method, body },
  ) as Promise<{ status: number; body: T }>;

/** "16–22 Nov 2026", "30 Nov – 6 Dec 2026": how the screens name a period. */
function periodLabel(start: DateTime) {
  const end = start.plus({ days: 6 });
  const d = (at: DateTime, format: string) => at.setLocale("en-GB").toFormat(format);
  return start.month === end.month ? `${d(start, "d")}–${d(end, "d LLL yyyy")}` : `${d(start, "d LLL")} – ${d(end, "d LLL yyyy")}`;
}

/**
 * Books a session running now for one of the engineers, in whichever room and for whichever
 * engineer is free (the demo month may already have something on now). Returns who and where.
 */
async function bookSessionNow(manager: Page, title: string) {
  const engineers = (await api<{ userId: string; name: string }[]>(manager, "/api/engineers")).body;
  const rooms = (await api<{ id: number; name: string }[]>(manager, "/api/rooms")).body;
  const clients = (await api<{ id: number; name: string }[]>(manager, "/api/clients")).body;
  const client = clients.find((c) => c.name === "Blue Hour Records")!;
  const start = DateTime.now().setZone(zone).startOf("hour").minus({ hours: 1 });
  for (const engineer of engineers.filter((e) => emails[e.name])) {
    for (const room of rooms) {
      const created = await api<{ id: number }>(manager, "/api/bookings", "POST", {
        roomId: room.id,
        clientAccountId: client.id,
        startsAt: start.toUTC().toISO(),
        endsAt: start.plus({ hours: 4 }).toUTC().toISO(),
        engineerIds: [engineer.userId],
        title,
        status: "confirmed",
      });
      if (created.status === 201) return { engineer: engineer.name, room: room.name };
      expect(created.status, JSON.stringify(created.body)).toBe(409);
    }
  }
  throw new Error("no room and engineer free now to book a session on");
}

/** "$1,234.56" → 123456; "41.50 h" → 41.5. */
const cents = (text: string) => Math.round(Number(text.replace(/[^0-9.-]/g, "")) * 100);
const hours = (text: string) => Number(text.replace(/[^0-9.]/g, ""));

type Figures = { regular: number; overtime: number; doubleTime: number; total: number; straightTime: number; overtimePremium: number; doubleTimePremium: number; gross: number };

/** The review screen's table, read as the bookkeeper sees it: one row per person, then the totals. */
async function readScreenTable(table: Locator): Promise<Map<string, Figures>> {
  const rows = new Map<string, Figures>();
  for (const row of await table.locator("tbody tr, tfoot tr").all()) {
    // A person's row header holds the name first, then their rates; the totals row says "Total".
    const name = await row.locator("th").first().evaluate((th) => (th.querySelector("span") ?? th).textContent ?? "");
    const cells = await row.locator("td").allTextContents();
    const [regular, overtime, doubleTime, total, , straightTime, overtimePremium, doubleTimePremium, gross] = cells as [string, string, string, string, string, string, string, string, string];
    rows.set(name.trim(), {
      regular: hours(regular),
      overtime: hours(overtime),
      doubleTime: hours(doubleTime),
      total: hours(total),
      straightTime: cents(straightTime),
      overtimePremium: cents(overtimePremium),
      doubleTimePremium: cents(doubleTimePremium),
      gross: cents(gross),
    });
  }
  return rows;
}

/** The Summary sheet (docs/payroll-export.md): headers on row 4, then people, then "Total". */
async function readSummarySheet(file: string): Promise<Map<string, Figures>> {
  const workbook = new ExcelJS.Workbook();
  await workbook.xlsx.readFile(file);
  const sheet = workbook.getWorksheet("Summary")!;
  expect(sheet.getRow(4).getCell(2).value).toBe("Name");
  expect(String(sheet.getRow(2).getCell(1).value)).toMatch(/labour law/);
  const rows = new Map<string, Figures>();
  for (let r = 5; r <= sheet.rowCount; r++) {
    const row = sheet.getRow(r);
    const name = String(row.getCell(2).value ?? row.getCell(1).value ?? "");
    if (!name) continue;
    const n = (col: number) => Number(row.getCell(col).value ?? 0);
    rows.set(name, {
      regular: n(5),
      overtime: n(6),
      doubleTime: n(7),
      total: n(8),
      straightTime: Math.round(n(11) * 100),
      overtimePremium: Math.round(n(12) * 100),
      doubleTimePremium: Math.round(n(13) * 100),
      gross: Math.round(n(14) * 100),
    });
  }
  return rows;
}

/** RFC 4180 fields; the summary CSV quotes only where it must. */
function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let field = "";
  let quoted = false;
  const endField = () => {
    row.push(field);
    field = "";
  };
  for (let i = 0; i < text.length; i++) {
    const ch = text[i]!;
    if (quoted && ch === '"' && text[i + 1] === '"') {
      field += '"';
      i++;
    } else if (ch === '"') {
      quoted = !quoted;
    } else if (quoted || (ch !== "," && ch !== "\r" && ch !== "\n")) {
      field += ch;
    } else if (ch === ",") {
      endField();
    } else {
      if (ch === "\r" && text[i + 1] === "\n") i++;
      endField();
      rows.push(row);
      row = [];
    }
  }
  if (field || row.length > 0) {
    endField();
    rows.push(row);
  }
  return rows;
}

async function readSummaryCsv(file: string): Promise<Map<string, Figures>> {
  const [header, ...lines] = parseCsv(await readFile(file, "utf8"));
  const col = (name: string) => header!.indexOf(name);
  const rows = new Map<string, Figures>();
  for (const line of lines) {
    const n = (name: string) => Number(line[col(name)]);
    rows.set(line[col("Name")]!, {
      regular: n("Regular hours"),
      overtime: n("Overtime hours"),
      doubleTime: n("Double-time hours"),
      total: n("Total hours"),
      straightTime: Math.round(n("Straight-time pay") * 100),
      overtimePremium: Math.round(n("Overtime premium") * 100),
      doubleTimePremium: Math.round(n("Double-time premium") * 100),
      gross: Math.round(n("Gross pay") * 100),
    });
  }
  return rows;
}

async function download(page: Page, button: string): Promise<string> {
  const [file] = await Promise.all([page.waitForEvent("download"), page.getByRole("button", { name: button }).click()]);
  const path = await file.path();
  expect(path).toBeTruthy();
  await expect.poll(() => page.getByRole("status").filter({ hasText: `Saved ${file.suggestedFilename()}` }).count()).toBe(1);
  return path;
}

describe("time clock and payroll", () => {
  it("an engineer clocks in on a tablet against the session in progress, takes a break and clocks out", async () => {
    const title = `Overdubs ${unique()}`;
    const { context: managerContext, page: manager } = await newPage();
    await signIn(manager, "manager@wrenfield.test");
    const booked = await bookSessionNow(manager, title);
    await managerContext.close();

    const { context, page } = await newPage(tablet);
    await signIn(page, emails[booked.engineer]!);
    // The engineer's home is the clock.
    await expect.poll(() => page.getByRole("heading", { name: "My day" }).count()).toBe(1);
    const sessions = page.getByRole("group", { name: "Which session?" });
    const ours = sessions.getByRole("radio", { name: new RegExp(`^Blue Hour Records — ${booked.room}, `) });
    await expect.poll(() => ours.count()).toBe(1);
    await ours.check();
    const clockIn = page.getByRole("button", { name: "Clock in" });
    // One large control, easy to hit on a tablet by the console.
    expect((await clockIn.boundingBox())!.height).toBeGreaterThanOrEqual(80);
    await clockIn.click();
    await expect.poll(() => page.getByText(/^Clocked in since \d\d:\d\d/).count()).toBe(1);
    await expect.poll(() => page.getByText(`Blue Hour Records — ${booked.room}`, { exact: true }).count()).toBe(1);

    await page.getByRole("button", { name: "Start break" }).click();
    await expect.poll(() => page.getByText(/^On a break since/).count()).toBe(1);
    await page.getByRole("button", { name: "End break" }).click();
    await expect.poll(() => page.getByRole("button", { name: "Start break" }).count()).toBe(1);
    await page.getByRole("button", { name: "Clock out" }).click();
    await expect.poll(() => page.getByText("Not clocked in").count()).toBe(1);
    await expect.poll(() => page.getByText(/^Clocked out at \d\d:\d\d/).count()).toBe(1);

    // Clocking out twice is refused by the API with a clear message.
    const again = await api<{ error: { message: string } }>(page, "/api/time-clock/clock-out", "POST");
    expect(again.status).toBe(409);
    expect(again.body.error.message).toMatch(/not clocked in/i);

    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "My timesheet" }).click();
    await expect.poll(() => page.getByRole("heading", { name: "My timesheet" }).count()).toBe(1);
    await expect.poll(() => page.getByText(new RegExp(`Blue Hour Records`)).count()).toBeGreaterThan(0);
    await context.close();
  });

  it("the clock fits a phone: the big button spans the screen and nothing scrolls sideways", async () => {
    const { context, page } = await newPage(phone);
    await signIn(page, "sam@wrenfield.test");
    const button = page.getByRole("button", { name: /^Clock (in|out)$/ });
    await expect.poll(() => button.count()).toBe(1);
    const box = (await button.boundingBox())!;
    expect(box.width).toBeGreaterThan(phone.width * 0.7);
    expect(box.x + box.width).toBeLessThanOrEqual(phone.width);
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(phone.width);
    await context.close();
  });

  it("an engineer asks for a correction and the manager approves it", async () => {
    const lastWeek = thisMonday().minus({ weeks: 1 });
    const saturday = lastWeek.plus({ days: 5 });
    const { context, page } = await newPage();
    await signIn(page, "priya@wrenfield.test");
    await page.goto(`/timesheet?week=${lastWeek.toISODate()}`);
    await page.getByRole("button", { name: /^Ask for a correction to .*10:00–16:03$/ }).click();
    const dialog = page.getByRole("dialog", { name: "Ask for a correction" });
    await dialog.getByLabel("End").fill(`${saturday.toISODate()}T16:45`);
    await dialog.getByLabel("Reason").fill("Stayed on to label and shelve the reels");
    await dialog.getByRole("button", { name: "Send for approval" }).click();
    await expect.poll(() => page.getByText("Correction sent for approval").count()).toBe(1);
    await expect.poll(() => page.getByText("Stayed on to label and shelve the reels").count()).toBeGreaterThan(0);

    const { context: managerContext, page: manager } = await newPage();
    await signIn(manager, "manager@wrenfield.test");
    await manager.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Corrections" }).click();
    await expect.poll(() => manager.getByRole("heading", { name: "Corrections" }).count()).toBe(1);
    await manager.getByRole("button", { name: /^Approve: Priya Oduya, / }).click();
    await expect.poll(() => manager.getByText(/^Correction approved: Priya Oduya/).count()).toBe(1);
    await managerContext.close();

    await page.reload();
    await expect.poll(() => page.getByRole("button", { name: /^Ask for a correction to .*10:00–16:45$/ }).count()).toBe(1);
    await context.close();
  });

  it("the bookkeeper approves and locks a period, downloads the XLSX and the CSV, and their figures match the screen", async () => {
    const start = thisMonday().minus({ weeks: 2 });
    const label = periodLabel(start);
    const { context, page } = await newPage();
    await signIn(page, "books@wrenfield.test");
    await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Pay periods" }).click();
    await page.getByRole("link", { name: label, exact: true }).click();
    await expect.poll(() => page.getByRole("heading", { name: `Pay period ${label}` }).count()).toBe(1);
    await expect.poll(() => page.getByRole("complementary", { name: "Payroll caution" }).count()).toBeGreaterThan(0);

    await page.getByRole("button", { name: "Approve period" }).click();
    await page.getByRole("button", { name: "Lock period" }).click();
    const confirm = page.getByRole("dialog", { name: "Lock this pay period?" });
    await confirm.getByRole("button", { name: "Lock period" }).click();
    await expect.poll(() => page.getByText(`Pay period ${label} locked`).count()).toBe(1);

    const table = page.getByRole("table", { name: "Hours and pay per person" });
    const screen = await readScreenTable(table);
    expect([...screen.keys()].sort()).toEqual(["Jo Kettering", "Priya Oduya", "Sam Reyes", "Total"]);
    expect(screen.get("Total")!.gross).toBeGreaterThan(0);

    const xlsx = await readSummarySheet(await download(page, "Download XLSX"));
    const csv = await readSummaryCsv(await download(page, "Download CSV"));
    expect(xlsx).toEqual(screen);
    // The CSV has no totals row: the summary rows alone.
    expect(csv).toEqual(new Map([...screen].filter(([name]) => name !== "Total")));

    // Every figure leads to the entries behind it.
    await table.getByRole("link", { name: "Priya Oduya" }).click();
    await expect.poll(() => page.getByRole("heading", { name: `Priya Oduya, ${label}` }).count()).toBe(1);
    await expect.poll(() => page.getByRole("table", { name: "Time entries" }).locator("tbody tr").count()).toBe(4);
    await page.getByRole("link", { name: `← Pay period ${label}` }).click();

    await page.getByRole("link", { name: "← All pay periods" }).click();
    const row = page.getByRole("row").filter({ has: page.getByRole("link", { name: label, exact: true }) });
    await expect.poll(() => row.getByText("Locked").count()).toBeGreaterThan(0);
    await expect.poll(() => row.getByText("Lena Marsh").count()).toBeGreaterThan(0);
    await context.close();
  });

  it("time in a locked period cannot change: a correction is refused with a message", async () => {
    const start = thisMonday().minus({ weeks: 2 });
    const { context, page } = await newPage();
    await signIn(page, "priya@wrenfield.test");
    await page.goto(`/timesheet?week=${start.toISODate()}`);
    await page.getByRole("button", { name: /^Ask for a correction to / }).first().click();
    const dialog = page.getByRole("dialog", { name: "Ask for a correction" });
    await dialog.getByLabel("End").fill(`${start.toISODate()}T18:30`);
    await dialog.getByLabel("Reason").fill("Left later than the clock says");
    await dialog.getByRole("button", { name: "Send for approval" }).click();
    await expect.poll(() => dialog.getByRole("alert").filter({ hasText: /is locked; only the owner can unlock it/ }).count()).toBe(1);
    await dialog.getByRole("button", { name: "Cancel" }).click();
    await expect.poll(() => page.getByText("Left later than the clock says").count()).toBe(0);
    await context.close();
  });
});
