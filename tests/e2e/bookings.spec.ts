import { describe, expect, it } from "vitest";
import { DateTime } from "luxon";
import ICAL from "ical.js";
import type { Page } from "playwright-core";
import { baseUrl, newPage, signIn, useBrowser } from "./support/browser.ts";

useBrowser();

const zone = "America/Chicago";
/** A studio-local date weeks ahead, clear of the seeded month. */
const day = (weeks: number, weekday: number) => DateTime.now().setZone(zone).startOf("week").plus({ weeks, days: weekday - 1 });
const cell = (page: Page, room: string, date: DateTime, time: string) =>
  page.getByRole("gridcell", { name: `${room} ${date.setLocale("en-GB").toFormat("ccc d LLL")} ${time}`, exact: true });

async function openDay(page: Page, date: DateTime) {
  await page.goto(`/calendar?view=day&date=${date.toISODate()}`);
  await expect.poll(() => page.getByRole("grid", { name: "Bookings calendar" }).count()).toBe(1);
}

async function quoteSlot(page: Page, room: string, date: DateTime, from: string, to: string, client: string) {
  await cell(page, room, date, from).click();
  const panel = page.getByRole("dialog", { name: "New booking" });
  await panel.getByLabel("End").fill(to);
  await panel.getByLabel("Client").selectOption({ label: client });
  await expect.poll(() => panel.getByText(/^Total \$/).count()).toBeGreaterThan(0);
  return panel;
}

/** Calls the API from inside the signed-in page, as the app itself does. */
const api = (page: Page, path: string, method = "GET", body?: unknown) =>
  page.evaluate(
    async ({ path, method, body }) => {
      const response = await fetch(path, { method, headers: { "content-type": "application/json" }, body: body ? JSON.stringify(body) : undefined });
      return { status: response.status, body: await response.json().catch(() => null) };
    },
    { path, method, body },
  );

describe("booking a room", () => {
  it("the manager quotes every line, pencils a hold, assigns an engineer and confirms it", async () => {
    const { context, page } = await newPage();
    await signIn(page, "manager@wrenfield.test");
    const date = day(6, 2);
    await openDay(page, date);
    const panel = await quoteSlot(page, "Room C", date, "10:00", "14:00", "Copper Vale");
    await expect.poll(() => panel.getByText("Total $280.00").count()).toBe(1);
    await expect.poll(() => panel.getByText(/Room C rate card v1/).count()).toBeGreaterThan(0);
    await panel.getByRole("button", { name: "Pencil a hold" }).click();
    const block = page.getByRole("button", { name: /^Copper Vale — Hold, Room C 10:00–14:00/ });
    await expect.poll(() => block.count()).toBe(1);

    await block.click();
    const booking = page.getByRole("dialog", { name: /^Booking #\d+$/ });
    await booking.getByRole("button", { name: "Assign engineers" }).click();
    await booking.getByRole("checkbox", { name: /Sam Reyes/ }).check();
    await booking.getByRole("button", { name: "Save engineers" }).click();
    await expect.poll(() => booking.getByText("Sam Reyes").count()).toBeGreaterThan(0);
    await booking.getByRole("button", { name: "Confirm booking" }).click();
    await expect.poll(() => booking.getByText("Confirmed").count()).toBeGreaterThan(0);
    await context.close();
  });

  it("refuses an overlapping booking with a message naming what clashes", async () => {
    const { context, page } = await newPage();
    await signIn(page, "manager@wrenfield.test");
    const date = day(6, 3);
    const rooms = (await api(page, "/api/rooms")).body as { id: number; name: string }[];
    const clients = (await api(page, "/api/clients")).body as { id: number; name: string }[];
    const roomA = rooms.find((r) => r.name === "Room A")!.id;
    const first = await api(page, "/api/bookings", "POST", {
      roomId: roomA,
      clientAccountId: clients.find((c) => c.name === "Ines Halloran")!.id,
      startsAt: date.set({ hour: 10 }).toISO(),
      endsAt: date.set({ hour: 13 }).toISO(),
      status: "confirmed",
    });
    expect(first.status).toBe(201);
    await openDay(page, date);
    await cell(page, "Room A", date, "14:00").click();
    const panel = page.getByRole("dialog", { name: "New booking" });
    await panel.getByLabel("Start").fill("12:00");
    await panel.getByLabel("End").fill("15:00");
    await panel.getByLabel("Client").selectOption({ label: "Copper Vale" });
    await expect.poll(() => panel.getByText(/Room A is (already )?booked .*10:00–13:00.*Ines Halloran/).count()).toBeGreaterThan(0);
    expect(await panel.getByRole("button", { name: "Book and confirm" }).isDisabled()).toBe(true);
    await context.close();
  });

  it("moves a second hold up when the first hold is released", async () => {
    const { context, page } = await newPage();
    await signIn(page, "manager@wrenfield.test");
    const date = day(6, 4);
    const rooms = (await api(page, "/api/rooms")).body as { id: number; name: string }[];
    const clients = (await api(page, "/api/clients")).body as { id: number; name: string }[];
    await api(page, "/api/bookings", "POST", {
      roomId: rooms.find((r) => r.name === "Room B")!.id,
      clientAccountId: clients.find((c) => c.name === "Lantern Static")!.id,
      startsAt: date.set({ hour: 10 }).toISO(),
      endsAt: date.set({ hour: 14 }).toISO(),
    });
    await openDay(page, date);
    await cell(page, "Room B", date, "15:00").click();
    const panel = page.getByRole("dialog", { name: "New booking" });
    await panel.getByLabel("Start").fill("10:00");
    await panel.getByLabel("End").fill("14:00");
    await panel.getByLabel("Client").selectOption({ label: "The Quiet Orchard" });
    await panel.getByRole("button", { name: "Queue as second hold" }).click();
    await expect.poll(() => page.getByRole("button", { name: /^The Quiet Orchard — Hold \(2nd hold\)/ }).count()).toBe(1);

    await page.getByRole("button", { name: /^Lantern Static — Hold, Room B/ }).click();
    await page.getByRole("dialog", { name: /^Booking #\d+$/ }).getByRole("button", { name: "Release hold" }).click();
    await page.keyboard.press("Escape");
    await expect.poll(() => page.getByRole("button", { name: /^The Quiet Orchard — Hold, Room B 10:00–14:00/ }).count()).toBe(1);
    await context.close();
  });
});

describe("lockouts", () => {
  it("the manager quotes and holds a three-day lockout and sees three day-rate lines, $850.00 each, $2,550.00 in all (docs/pricing.md)", async () => {
    const { context, page } = await newPage();
    await signIn(page, "manager@wrenfield.test");
    const monday = day(8, 1);
    await openDay(page, monday);
    await cell(page, "Room A", monday, "10:00").click();
    const panel = page.getByRole("dialog", { name: "New booking" });
    await panel.getByRole("checkbox", { name: /^Lockout/ }).check();
    await panel.getByLabel("Last day").fill(monday.plus({ days: 2 }).toISODate()!);
    await panel.getByLabel("Client").selectOption({ label: "Lantern Static" });
    await expect.poll(() => panel.getByText("Total $2,550.00").count()).toBe(1);
    const days = ["Mon", "Tue", "Wed"].map((_, i) => `Lockout day — ${monday.plus({ days: i }).setLocale("en-GB").toFormat("ccc d LLL")}`);
    for (const label of days) expect(await panel.getByText(label, { exact: true }).count()).toBe(1);
    expect(await panel.getByText("$850.00", { exact: true }).count()).toBe(3);
    await panel.getByRole("button", { name: "Pencil a hold" }).click();
    await expect.poll(() => page.getByRole("button", { name: /^Lantern Static — Hold, Room A/ }).count()).toBeGreaterThan(0);

    // The booking holds the whole days: the room is taken at 03:00 on the Tuesday too.
    const held = (await api(page, `/api/bookings?from=${encodeURIComponent(monday.toISO()!)}&to=${encodeURIComponent(monday.plus({ days: 3 }).toISO()!)}`)).body as { lockout: boolean; startsAt: string; endsAt: string; quoteTotalCents: number }[];
    expect(held.filter((b) => b.lockout).map((b) => [b.startsAt, b.endsAt, b.quoteTotalCents])).toEqual([
      [new Date(monday.toISO()!).toISOString(), new Date(monday.plus({ days: 3 }).toISO()!).toISOString(), 255000],
    ]);
    await context.close();
  });
});

describe("rate cards", () => {
  it("the owner adds a rate-card version; an existing booking keeps its price", async () => {
    const { context, page } = await newPage();
    await signIn(page, "owner@wrenfield.test");
    const from = encodeURIComponent(DateTime.now().minus({ days: 20 }).toISO()!);
    const to = encodeURIComponent(DateTime.now().plus({ days: 30 }).toISO()!);
    const before = ((await api(page, `/api/bookings?from=${from}&to=${to}`)).body as { id: number; room: { name: string }; quoteTotalCents: number; status: string }[]).filter((b) => b.room.name === "Room B");
    expect(before.length).toBeGreaterThan(0);
    await page.goto("/rooms");
    await page.getByRole("button", { name: "New rate card version for Room B" }).click();
    const form = page.getByRole("dialog");
    await form.getByLabel("Hourly rate").fill("65");
    await form.getByLabel("Note").fill("New prices");
    await form.getByRole("button", { name: "Save new version" }).click();
    await expect.poll(async () => (await api(page, "/api/rooms")).body.find((r: { name: string }) => r.name === "Room B").currentRateCard.hourlyRateCents).toBe(6500);
    const after = (await api(page, `/api/bookings?from=${from}&to=${to}`)).body as { id: number; quoteTotalCents: number }[];
    for (const b of before) expect(after.find((a) => a.id === b.id)!.quoteTotalCents).toBe(b.quoteTotalCents);
    await context.close();
  });
});

describe("who sees what", () => {
  it("the engineer sees their session and subscribes to a valid iCalendar feed", async () => {
    const { context, page } = await newPage();
    await signIn(page, "priya@wrenfield.test");
    await page.goto("/my-sessions");
    await expect.poll(() => page.getByRole("heading", { name: "My sessions", exact: true }).count()).toBe(1);
    await expect.poll(() => page.getByText("Lantern Static").count()).toBeGreaterThan(0);
    await page.getByRole("button", { name: "Subscribe to my calendar" }).click();
    const address = page.getByLabel("Feed address");
    await expect.poll(() => address.count()).toBe(1);
    const url = await address.inputValue();
    expect(url).toMatch(new RegExp(`^${baseUrl}/api/feeds/[A-Za-z0-9_-]+\\.ics$`));
    const text = await (await fetch(url)).text();
    const events = new ICAL.Component(ICAL.parse(text)).getAllSubcomponents("vevent").map((e) => new ICAL.Event(e));
    expect(events.length).toBeGreaterThan(0);
    expect(events.every((e) => e.uid.startsWith("booking-"))).toBe(true);
    await context.close();
  });

  it("a client sees only its own sessions", async () => {
    const { context, page } = await newPage();
    await signIn(page, "band@lanternstatic.test");
    await page.goto("/sessions");
    await expect.poll(() => page.getByRole("heading", { name: "Sessions", exact: true }).count()).toBe(1);
    await expect.poll(() => page.getByText(/Tracking live|Room A/).count()).toBeGreaterThan(0);
    for (const other of ["Copper Vale", "Blue Hour Records", "Ines Halloran", "The Quiet Orchard"]) expect(await page.getByText(other).count()).toBe(0);
    await context.close();
  });
});
