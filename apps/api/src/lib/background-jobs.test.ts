import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, eq, like } from "drizzle-orm";
import { auditEvents, bookings, createDb, emailMessages } from "@takeup/db";
import { createTestApp, type TestApp } from "../test/harness.ts";
import { demo } from "../test/demo.ts";
import { demoIds } from "../routes/bookings/test-helpers.ts";
import { queueReminders } from "../routes/bookings/booking-jobs.ts";
import { backgroundJobs } from "../jobs.ts";
import { createMailer, type Mailer } from "./mailer.ts";
import { deliverQueuedEmails, enqueueEmail, maxDeliveryAttempts } from "./outbox.ts";
import { runDueJobs } from "./scheduler.ts";

let t: TestApp;
/** A second API process: its own pool and mailer on the same database. */
let other: { db: ReturnType<typeof createDb>["db"]; pool: ReturnType<typeof createDb>["pool"]; mailer: Mailer };
let manager: Awaited<ReturnType<TestApp["signIn"]>>;
let ids: Awaited<ReturnType<typeof demoIds>>;
let roomId: number;

beforeAll(async () => {
  t = await createTestApp();
  const url = new URL(process.env.TEST_DATABASE_URL!);
  url.pathname = `/${t.databaseName}`;
  other = { ...createDb(url.toString()), mailer: createMailer(t.db, t.config.smtpUrl, t.config.mailFrom, async () => "Wrenfield Sound") };
  manager = await t.signIn(demo.manager);
  ids = await demoIds(t);
  const owner = await t.signIn(demo.owner);
  roomId = (await owner.post("/api/rooms").send({ name: "Room J", capacity: 2, colour: "teal", turnoverMinutes: 0 })).body.id;
  await owner.post(`/api/rooms/${roomId}/rate-cards`).send({
    effectiveFrom: "2026-01-01T00:00:00Z", hourlyRateCents: 5000, dayRateCents: 40000, dayCoversMinutes: 600, minimumBillableMinutes: 60,
    billingIncrementMinutes: 30, afterHoursStartMinute: 1320, afterHoursEndMinute: 480, afterHoursPremiumBp: 0, weekendPremiumBp: 0,
  });
});
afterAll(async () => {
  other.mailer.close();
  await other.pool.end();
  await t.close();
});

/** A booking in Room J starting `hoursAhead` from now, for `hours` hours. */
async function book(client: string, hoursAhead: number, hours: number, status: "hold" | "confirmed") {
  const start = new Date(Date.now() + hoursAhead * 3600_000);
  start.setUTCMinutes(0, 0, 0);
  const response = await manager.post("/api/bookings").send({ roomId, clientAccountId: ids.client(client), startsAt: start.toISOString(), endsAt: new Date(start.getTime() + hours * 3600_000).toISOString(), status });
  expect(response.status).toBe(201);
  return response.body.id as number;
}

const messagesFor = (subjectStart: string) => t.catcher.messages.filter((m) => m.subject.startsWith(subjectStart));

describe("background work with two API processes on one database", () => {
  it("lapses a hold once and sends each reminder once when both processes tick at the same moment", async () => {
    const lapsing = await book("Copper Vale", 30, 2, "hold");
    await t.db.update(bookings).set({ holdExpiresAt: new Date(Date.now() - 60_000) }).where(eq(bookings.id, lapsing));
    await book("Blue Hour Records", 20, 3, "confirmed");
    const now = new Date();

    const [first, second] = await Promise.all([runDueJobs({ db: t.db, mailer: t.mailer, appUrl: t.config.appUrl }, backgroundJobs, "process-a", now), runDueJobs({ db: other.db, mailer: other.mailer, appUrl: t.config.appUrl }, backgroundJobs, "process-b", now)]);

    // Each job ran in exactly one of the two processes.
    for (const job of backgroundJobs) expect([first, second].filter((handled) => job.name in handled).map(() => job.name)).toEqual([job.name]);
    const lapses = await t.db.select().from(auditEvents).where(and(eq(auditEvents.action, "booking.hold_lapsed"), eq(auditEvents.entityId, String(lapsing))));
    expect(lapses).toHaveLength(1);
    // The process that delivered mail may have run before the other queued the reminders: the
    // next delivery turn (15 s on) sends them, in one process.
    const next = new Date(now.getTime() + 16_000);
    const delivery = await Promise.all([runDueJobs({ db: t.db, mailer: t.mailer, appUrl: t.config.appUrl }, backgroundJobs, "process-a", next), runDueJobs({ db: other.db, mailer: other.mailer, appUrl: t.config.appUrl }, backgroundJobs, "process-b", next)]);
    expect(delivery.flatMap((handled) => Object.keys(handled))).toEqual(["deliver-email"]);
    const reminders = messagesFor("Tomorrow: Room J");
    expect(reminders.filter((m) => m.to.includes("accounts@bluehour.test"))).toHaveLength(1);
    expect(new Set(reminders.map((m) => m.to.join()))).toHaveProperty("size", reminders.length);

    // Ticking again at that moment runs nothing: no job is due yet.
    const again = await Promise.all([runDueJobs({ db: t.db, mailer: t.mailer, appUrl: t.config.appUrl }, backgroundJobs, "process-a", next), runDueJobs({ db: other.db, mailer: other.mailer, appUrl: t.config.appUrl }, backgroundJobs, "process-b", next)]);
    expect(again).toEqual([{}, {}]);
  });

  it("queues a reminder once and sends it once even when the work itself runs twice at the same time", async () => {
    const booking = await book("The Quiet Orchard", 16, 2, "confirmed");
    const claimed = await Promise.all([queueReminders(t.db), queueReminders(other.db)]);
    expect(claimed.reduce((a, b) => a + b, 0)).toBeGreaterThanOrEqual(1);
    const queued = await t.db.select().from(emailMessages).where(like(emailMessages.dedupeKey, `session-reminder:${booking}:%`));
    expect(queued.length).toBeGreaterThanOrEqual(1);

    await Promise.all([deliverQueuedEmails(t.db, t.mailer), deliverQueuedEmails(other.db, other.mailer)]);
    const sent = await t.db.select().from(emailMessages).where(like(emailMessages.dedupeKey, `session-reminder:${booking}:%`));
    expect(sent.map((m) => m.status)).toEqual(queued.map(() => "sent"));
    for (const row of sent) expect(t.catcher.messages.filter((m) => m.to.includes(row.toAddress) && m.subject === row.subject)).toHaveLength(1);
  });
});

describe("the e-mail outbox", () => {
  const message = (n: number) => ({ to: `outbox-${n}@example.test`, subject: `Outbox check ${n}`, text: "Plain text", html: "<p>Plain text</p>", template: "outbox_check" });

  it("queues a key once: a repeat queues nothing", async () => {
    expect(await enqueueEmail(t.db, "outbox-check:1", message(1))).toBe(true);
    expect(await enqueueEmail(t.db, "outbox-check:1", message(1))).toBe(false);
    expect(await t.db.select().from(emailMessages).where(eq(emailMessages.dedupeKey, "outbox-check:1"))).toHaveLength(1);
    await deliverQueuedEmails(t.db, t.mailer);
  });

  it("keeps a message queued after a failed attempt, sends it on the next run, and gives up after the last attempt", async () => {
    const failing: Mailer = { ...t.mailer, transmit: async () => Promise.reject(new Error("421 try again later")) };
    await enqueueEmail(t.db, "outbox-check:2", message(2));
    expect(await deliverQueuedEmails(t.db, failing)).toBe(0);
    const [afterFailure] = await t.db.select().from(emailMessages).where(eq(emailMessages.dedupeKey, "outbox-check:2"));
    expect(afterFailure).toMatchObject({ status: "queued", attempts: 1, error: "421 try again later", claimToken: null });
    expect(await deliverQueuedEmails(t.db, t.mailer)).toBe(1);
    expect(messagesFor("Outbox check 2")).toHaveLength(1);

    await enqueueEmail(t.db, "outbox-check:3", message(3));
    await t.db.update(emailMessages).set({ attempts: maxDeliveryAttempts - 1 }).where(eq(emailMessages.dedupeKey, "outbox-check:3"));
    await deliverQueuedEmails(t.db, failing);
    const [gaveUp] = await t.db.select().from(emailMessages).where(eq(emailMessages.dedupeKey, "outbox-check:3"));
    expect(gaveUp).toMatchObject({ status: "failed", attempts: maxDeliveryAttempts });
  });

  it("sends what a process claimed and died holding, once its claim has run out", async () => {
    await enqueueEmail(t.db, "outbox-check:4", message(4));
    const now = new Date();
    // The dead process's claim, still current.
    await t.db.update(emailMessages).set({ claimToken: "dead-process", claimedUntil: new Date(now.getTime() + 60_000), attempts: 1 }).where(eq(emailMessages.dedupeKey, "outbox-check:4"));
    expect(await deliverQueuedEmails(t.db, t.mailer, now)).toBe(0);
    expect(await deliverQueuedEmails(t.db, t.mailer, new Date(now.getTime() + 61_000))).toBe(1);
    expect(messagesFor("Outbox check 4")).toHaveLength(1);
  });
});
