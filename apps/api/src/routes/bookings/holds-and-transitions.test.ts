import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import ICAL from "ical.js";
import { bookings } from "@takeup/db";
import { createTestApp, type TestApp } from "../../test/harness.ts";
import { demo } from "../../test/demo.ts";
import { at, demoIds } from "./test-helpers.ts";
import { expireLapsedHolds } from "./holds.ts";
import { loadStudio } from "../studio/studio.service.ts";
import { queueHoldNotices, queueReminders } from "./booking-jobs.ts";
import { deliverQueuedEmails } from "../../lib/outbox.ts";

let t: TestApp;
let manager: Awaited<ReturnType<TestApp["signIn"]>>;
let ids: Awaited<ReturnType<typeof demoIds>>;
/** A room of its own, so tests that need times near now never meet the seeded month. */
let scratchRoomId: number;
beforeAll(async () => {
  t = await createTestApp();
  manager = await t.signIn(demo.manager);
  ids = await demoIds(t);
  const owner = await t.signIn(demo.owner);
  const room = await owner.post("/api/rooms").send({ name: "Room T", capacity: 2, colour: "teal", turnoverMinutes: 0 });
  scratchRoomId = room.body.id;
  await owner.post(`/api/rooms/${scratchRoomId}/rate-cards`).send({
    effectiveFrom: "2026-01-01T00:00:00Z", hourlyRateCents: 5000, dayRateCents: 40000, dayCoversMinutes: 600, minimumBillableMinutes: 60,
    billingIncrementMinutes: 30, afterHoursStartMinute: 1320, afterHoursEndMinute: 480, afterHoursPremiumBp: 0, weekendPremiumBp: 0,
  });
});
afterAll(() => t.close());

const slot = (weeks: number, day: number, from: string, to: string) => ({ startsAt: at(weeks, day, from), endsAt: at(weeks, day, to) });
const hold = (client: string, times: ReturnType<typeof slot>, extra: Record<string, unknown> = {}) =>
  manager.post("/api/bookings").send({ roomId: ids.room("Room A"), clientAccountId: ids.client(client), ...times, ...extra });

describe("first and second holds", () => {
  it("queues a second hold behind a first, and moves it up when the first is released", async () => {
    const times = slot(6, 1, "10:00", "16:00");
    const first = await hold("Copper Vale", times);
    const refused = await hold("The Quiet Orchard", times);
    expect(refused.status).toBe(409);
    const second = await hold("The Quiet Orchard", times, { queueBehindHold: true });
    expect(second.status).toBe(201);
    expect(second.body).toMatchObject({ status: "hold", queuedBehindId: first.body.id, holdExpiresAt: null, allowedActions: ["release"] });
    expect((await manager.post(`/api/bookings/${second.body.id}/confirm`).send({})).body.error.code).toBe("second_hold");

    const released = await manager.post(`/api/bookings/${first.body.id}/release`);
    expect(released.body).toMatchObject({ status: "cancelled", cancellationFeeCents: 0 });
    const promoted = await manager.get(`/api/bookings/${second.body.id}`);
    expect(promoted.body).toMatchObject({ status: "hold", queuedBehindId: null });
    expect(new Date(promoted.body.holdExpiresAt).getTime()).toBeGreaterThan(Date.now() + 47 * 3600_000);
    const confirmed = await manager.post(`/api/bookings/${second.body.id}/confirm`).send({ depositReceived: true });
    expect(confirmed.body).toMatchObject({ status: "confirmed", holdExpiresAt: null });
    expect(confirmed.body.depositReceivedAt).not.toBeNull();
  });

  it("drops the second hold when the first is confirmed", async () => {
    const times = slot(6, 2, "10:00", "16:00");
    const first = await hold("Copper Vale", times);
    const second = await hold("Ines Halloran", times, { queueBehindHold: true });
    await manager.post(`/api/bookings/${first.body.id}/confirm`).send({});
    const dropped = await manager.get(`/api/bookings/${second.body.id}`);
    expect(dropped.body).toMatchObject({ status: "cancelled", cancellationReason: "The first hold was confirmed" });
  });

  it("frees the slot of a lapsed hold without anyone clicking, and the sweeper moves the second hold up", async () => {
    const times = slot(6, 3, "10:00", "16:00");
    const first = await hold("Copper Vale", times);
    const second = await hold("Ines Halloran", times, { queueBehindHold: true });
    await t.db.update(bookings).set({ holdExpiresAt: new Date(Date.now() - 1000) }).where(eq(bookings.id, first.body.id));
    const quote = await manager.post("/api/quotes").send({ roomId: ids.room("Room A"), ...times });
    expect(quote.body.conflicts).toEqual([]);
    expect(await expireLapsedHolds(t.db, await loadStudio(t.db))).toBe(1);
    expect((await manager.get(`/api/bookings/${first.body.id}`)).body).toMatchObject({ status: "cancelled", cancellationReason: "The hold lapsed" });
    expect((await manager.get(`/api/bookings/${second.body.id}`)).body).toMatchObject({ status: "hold", queuedBehindId: null });
  });

  it("re-checks conflicts when confirming a hold", async () => {
    const times = slot(6, 4, "10:00", "13:00");
    const first = await hold("Copper Vale", times);
    await t.db.update(bookings).set({ holdExpiresAt: new Date(Date.now() - 1000) }).where(eq(bookings.id, first.body.id));
    const taker = await hold("Lantern Static", times, { status: "confirmed" });
    expect(taker.status).toBe(201);
    await t.db.update(bookings).set({ holdExpiresAt: new Date(Date.now() + 3600_000) }).where(eq(bookings.id, first.body.id));
    const confirm = await manager.post(`/api/bookings/${first.body.id}/confirm`).send({});
    expect(confirm.status).toBe(409);
    expect(confirm.body.error.code).toBe("booking_conflict");
  });
});

describe("session states and cancellation", () => {
  it("starts and wraps a confirmed session, and refuses to skip a step", async () => {
    const booked = await hold("Blue Hour Records", slot(7, 1, "10:00", "14:00"), { status: "confirmed", engineerIds: [ids.person("Priya Oduya")] });
    expect((await manager.post(`/api/bookings/${booked.body.id}/wrap`)).status).toBe(409);
    // A session starts only near its booked time (date-window.test.ts): the day has come.
    const startsAt = new Date(Date.now() - 10 * 60_000);
    const endsAt = new Date(startsAt.getTime() + 4 * 3600_000);
    await t.db.update(bookings).set({ startsAt, endsAt }).where(eq(bookings.id, booked.body.id));
    const engineer = await t.signIn(demo.engineer);
    expect((await engineer.post(`/api/bookings/${booked.body.id}/start`)).body.status).toBe("in_session");
    expect((await engineer.post(`/api/bookings/${booked.body.id}/wrap`)).body.status).toBe("wrapped");
    const invalid = await manager.post(`/api/bookings/${booked.body.id}/cancel`).send({});
    expect(invalid.body.error).toMatchObject({ code: "invalid_transition", message: "A booking that is wrapped cannot be cancelled" });
  });

  it("shows the cancellation fee by notice before cancelling: under 48 h costs 50% [P] studio-set tiers", async () => {
    const soon = new Date(Date.now() + 24 * 3600_000);
    soon.setUTCMinutes(0, 0, 0);
    const end = new Date(soon.getTime() + 4 * 3600_000);
    const booked = await manager.post("/api/bookings").send({ roomId: scratchRoomId, clientAccountId: ids.client("Copper Vale"), startsAt: soon.toISOString(), endsAt: end.toISOString(), status: "confirmed" });
    expect(booked.status).toBe(201);
    const preview = await manager.get(`/api/bookings/${booked.body.id}/cancellation-preview`);
    expect(preview.body.feeCents).toBe(Math.floor((booked.body.quoteTotalCents * 5000 + 5000) / 10000));
    expect(preview.body.explanation).toContain("under 48 h notice costs 50%");
    const cancelled = await manager.post(`/api/bookings/${booked.body.id}/cancel`).send({ reason: "Band split up" });
    expect(cancelled.body).toMatchObject({ status: "cancelled", cancellationFeeCents: preview.body.feeCents, cancellationReason: "Band split up" });
  });

  it("e-mails the client a confirmation with an .ics attachment", async () => {
    const first = await hold("Lantern Static", slot(7, 2, "10:00", "14:00"));
    await manager.post(`/api/bookings/${first.body.id}/confirm`).send({ depositReceived: true });
    const message = t.mailTo("band@lanternstatic.test").find((m) => m.subject.startsWith("Booking confirmed"));
    expect(message?.subject).toMatch(/^Booking confirmed: Room A, \w{3} \d+ \w{3} 10:00–14:00$/);
    expect(message?.attachments).toEqual([expect.objectContaining({ filename: "session.ics", contentType: "text/calendar" })]);
  });
});

describe("who sees which bookings", () => {
  it("shows a client only its own bookings, and 404 for another's", async () => {
    const client = await t.signIn(demo.client);
    const from = at(-2, 1, "00:00");
    const to = at(5, 1, "00:00");
    const list = await client.get(`/api/bookings?from=${encodeURIComponent(from)}&to=${encodeURIComponent(to)}`);
    expect(list.status).toBe(200);
    expect(list.body.length).toBeGreaterThan(0);
    expect(new Set(list.body.map((b: { client: { name: string } }) => b.client.name))).toEqual(new Set(["Lantern Static"]));
    const all = await manager.get(`/api/bookings?from=${encodeURIComponent(from)}&to=${encodeURIComponent(to)}`);
    const others = all.body.find((b: { client: { name: string } }) => b.client.name !== "Lantern Static");
    expect((await client.get(`/api/bookings/${others.id}`)).status).toBe(404);
  });

  it("lets a client request a session, which arrives as a hold, and hides other clients' names in quotes", async () => {
    const client = await t.signIn(demo.client);
    const times = slot(8, 1, "10:00", "14:00");
    await hold("Copper Vale", times);
    const quote = await client.post("/api/quotes").send({ roomId: ids.room("Room A"), ...times });
    expect(quote.body.conflicts[0]).toMatchObject({ resource: "room", clientName: null });
    const refused = await client.post("/api/booking-requests").send({ roomId: ids.room("Room A"), ...times });
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).not.toContain("Copper Vale");
    const request = await client.post("/api/booking-requests").send({ roomId: ids.room("Room B"), ...times, notes: "Vocals" });
    expect(request.status).toBe(201);
    expect(request.body).toMatchObject({ status: "hold", requestedByClient: true, client: { name: "Lantern Static" } });
  });

  it("shows an engineer only the sessions they are on", async () => {
    const engineer = await t.signIn(demo.engineer);
    const list = await engineer.get(`/api/bookings?from=${encodeURIComponent(at(-2, 1, "00:00"))}&to=${encodeURIComponent(at(4, 1, "00:00"))}`);
    expect(list.body.length).toBeGreaterThan(0);
    for (const b of list.body) expect(b.engineers.map((e: { name: string }) => e.name)).toContain("Priya Oduya");
  });

  it("refuses a window over 62 days", async () => {
    const response = await manager.get(`/api/bookings?from=${encodeURIComponent(at(0, 1, "00:00"))}&to=${encodeURIComponent(at(10, 1, "00:00"))}`);
    expect(response.status).toBe(400);
    expect(response.body.error.details[0]).toMatchObject({ field: "to", rule: "max_span" });
  });
});

describe("calendar feeds (RFC 5545, parsed with ical.js)", () => {
  it("serves a room's bookings behind a secret token, with stable UIDs, and stops when revoked", async () => {
    const created = await manager.post("/api/calendar-feeds").send({ roomId: ids.room("Room A") });
    expect(created.status).toBe(201);
    const path = new URL(created.body.url).pathname;
    const feed = await t.client().get(path);
    expect(feed.status).toBe(200);
    expect(feed.headers["content-type"]).toMatch(/^text\/calendar/);
    const calendar = new ICAL.Component(ICAL.parse(feed.text));
    const events = calendar.getAllSubcomponents("vevent").map((e) => new ICAL.Event(e));
    expect(events.length).toBeGreaterThan(0);
    expect(events.every((e) => /^booking-\d+@localhost$/.test(e.uid))).toBe(true);
    expect(events.some((e) => e.summary === "Lantern Static — Room A")).toBe(true);
    const again = new ICAL.Component(ICAL.parse((await t.client().get(path)).text));
    expect(again.getAllSubcomponents("vevent").map((e) => e.getFirstPropertyValue("uid"))).toEqual(events.map((e) => e.uid));
    expect((await manager.get("/api/calendar-feeds")).body[0].url).toBeNull();
    await manager.delete(`/api/calendar-feeds/${created.body.id}`);
    expect((await t.client().get(path)).status).toBe(404);
  });

  it("lets an engineer subscribe to their own calendar only", async () => {
    const engineer = await t.signIn(demo.engineer);
    expect((await engineer.post("/api/calendar-feeds").send({ staffUserId: ids.person("Sam Reyes") })).status).toBe(404);
    const mine = await engineer.post("/api/calendar-feeds").send({ staffUserId: ids.person("Priya Oduya") });
    const text = (await t.client().get(new URL(mine.body.url).pathname)).text;
    const summaries = new ICAL.Component(ICAL.parse(text)).getAllSubcomponents("vevent").map((e) => String(e.getFirstPropertyValue("summary")));
    expect(summaries.some((s) => s.startsWith("Lantern Static"))).toBe(true);
  });
});

describe("reminders and hold notices", () => {
  it("reminds the client the day before a confirmed session, once", async () => {
    const start = new Date(Date.now() + 20 * 3600_000);
    start.setUTCMinutes(0, 0, 0);
    const booked = await manager.post("/api/bookings").send({ roomId: scratchRoomId, clientAccountId: ids.client("Blue Hour Records"), startsAt: start.toISOString(), endsAt: new Date(start.getTime() + 3 * 3600_000).toISOString(), status: "confirmed" });
    expect(booked.status).toBe(201);
    const reminders = () => t.mailTo("accounts@bluehour.test").filter((m) => m.subject.startsWith("Tomorrow: Room T"));
    expect(await queueReminders(t.db)).toBeGreaterThanOrEqual(1);
    await deliverQueuedEmails(t.db, t.mailer);
    expect(reminders()).toHaveLength(1);
    expect(await queueReminders(t.db)).toBe(0);
    await deliverQueuedEmails(t.db, t.mailer);
    expect(reminders()).toHaveLength(1);
  });

  it("warns when a hold is about to lapse, once", async () => {
    const first = await manager.post("/api/bookings").send({ roomId: scratchRoomId, clientAccountId: ids.client("Copper Vale"), ...slot(9, 1, "10:00", "13:00") });
    await t.db.update(bookings).set({ holdExpiresAt: new Date(Date.now() + 3 * 3600_000) }).where(eq(bookings.id, first.body.id));
    const notices = () => t.catcher.messages.filter((m) => m.subject.startsWith("Hold lapsing soon: Room T"));
    await queueHoldNotices(t.db);
    await deliverQueuedEmails(t.db, t.mailer);
    const sent = notices().length;
    expect(sent).toBeGreaterThanOrEqual(2);
    expect(await queueHoldNotices(t.db)).toBe(0);
    await deliverQueuedEmails(t.db, t.mailer);
    expect(notices()).toHaveLength(sent);
  });
});
