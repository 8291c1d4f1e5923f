import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, eq, isNull } from "drizzle-orm";
import { DateTime } from "luxon";
import { auditEvents, bookingEngineers, bookings, staffProfiles, timeEntries } from "@takeup/db";
import { createTestApp, type TestApp } from "../../test/harness.ts";
import { demo } from "../../test/demo.ts";
import { clockState } from "./time-clock.service.ts";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe("the time clock", () => {
  it("clocks in as shop time, takes a break, and clocks out; twice in a row is 409", async () => {
    const sam = await t.signIn("sam@wrenfield.test");
    const clockedIn = await sam.post("/api/time-clock/clock-in").send({});
    expect(clockedIn.status).toBe(201);
    expect(clockedIn.body).toMatchObject({ kind: "shop", source: "clock", endedAt: null, payRateCode: "engineer" });
    const again = await sam.post("/api/time-clock/clock-in").send({});
    expect(again.status).toBe(409);
    expect(again.body.error).toMatchObject({ code: "already_clocked_in", message: expect.stringContaining("clock out first") });
    expect((await sam.post("/api/time-clock/break-start")).status).toBe(200);
    expect((await sam.post("/api/time-clock/break-start")).body.error.code).toBe("already_on_break");
    const state = await sam.get("/api/time-clock");
    expect(state.body).toMatchObject({ onBreak: true, openEntry: { id: clockedIn.body.id } });
    expect(state.body.week.days).toHaveLength(7);
    const out = await sam.post("/api/time-clock/clock-out");
    expect(out.status).toBe(200);
    expect(out.body.endedAt).not.toBeNull();
    expect(out.body.breaks[0].endedAt).not.toBeNull();
    const notIn = await sam.post("/api/time-clock/clock-out");
    expect(notIn.status).toBe(409);
    expect(notIn.body.error.code).toBe("not_clocked_in");
    const actions = (await t.db.select().from(auditEvents).where(eq(auditEvents.entityId, String(clockedIn.body.id)))).map((a) => a.action);
    expect(actions).toEqual(expect.arrayContaining(["time.clocked_in", "time.break_started", "time.clocked_out"]));
  });

  it("clocks in against a session the engineer is booked on, and refuses one they are not on", async () => {
    const priya = await t.signIn(demo.engineer);
    const from = new Date(Date.now() - 30 * 86_400_000).toISOString();
    const to = new Date(Date.now() + 30 * 86_400_000).toISOString();
    const all = (await (await t.signIn(demo.manager)).get(`/api/bookings?from=${from}&to=${to}`)).body as { id: number; engineers: { name: string }[]; status: string }[];
    const notMine = all.find((b) => !b.engineers.some((e) => e.name === "Priya Oduya") && b.status === "confirmed")!;
    const refused = await priya.post("/api/time-clock/clock-in").send({ bookingId: notMine.id });
    expect(refused.status).toBe(422);
    expect(refused.body.error.details[0].field).toBe("bookingId");
    const mine = all.find((b) => b.engineers.some((e) => e.name === "Priya Oduya") && b.status === "confirmed")!;
    // Clock-in takes a session near now (date-window.test.ts): this one is moved to have begun ten minutes ago.
    const startsAt = new Date(Date.now() - 10 * 60_000);
    const endsAt = new Date(startsAt.getTime() + 3 * 3_600_000);
    await t.db.update(bookings).set({ startsAt, endsAt }).where(eq(bookings.id, mine.id));
    await t.db.update(bookingEngineers).set({ startsAt, endsAt }).where(eq(bookingEngineers.bookingId, mine.id));
    const ok = await priya.post("/api/time-clock/clock-in").send({ bookingId: mine.id });
    expect(ok.status).toBe(201);
    expect(ok.body).toMatchObject({ kind: "session", booking: { id: mine.id } });
    await priya.post("/api/time-clock/clock-out");
  });

  it("flags an entry left open past the owner's limit instead of closing it", async () => {
    const jo = await t.signIn("jo@wrenfield.test");
    const opened = await jo.post("/api/time-clock/clock-in").send({});
    await t.db.update(timeEntries).set({ startedAt: new Date(Date.now() - 17 * 3_600_000) }).where(eq(timeEntries.id, opened.body.id));
    const state = await jo.get("/api/time-clock");
    expect(state.body.openEntry.flags).toContain("open_too_long");
    const stillOpen = await t.db.select().from(timeEntries).where(and(eq(timeEntries.id, opened.body.id), isNull(timeEntries.endedAt)));
    expect(stillOpen).toHaveLength(1);
    await jo.post("/api/time-clock/clock-out");
  });

  it("does not let a bookkeeper or a client use the clock", async () => {
    expect((await (await t.signIn(demo.bookkeeper)).post("/api/time-clock/clock-in").send({})).status).toBe(403);
    expect((await (await t.signIn(demo.client)).get("/api/time-clock")).status).toBe(403);
  });
});

describe("corrections", () => {
  it("an engineer proposes a correction with a reason; the manager approves it; the audit log keeps before and after", async () => {
    const priya = await t.signIn(demo.engineer);
    const from = new Date(Date.now() - 20 * 86_400_000).toISOString().slice(0, 10);
    const to = new Date().toISOString().slice(0, 10);
    const entries = (await priya.get(`/api/time-entries?from=${from}&to=${to}`)).body as { id: number; startedAt: string; endedAt: string | null; staffName: string }[];
    expect(new Set(entries.map((e) => e.staffName))).toEqual(new Set(["Priya Oduya"]));
    const entry = entries.find((e) => e.endedAt)!;
    const newEnd = new Date(new Date(entry.endedAt!).getTime() - 30 * 60_000).toISOString();
    const noReason = await priya.post("/api/time-entry-edits").send({ timeEntryId: entry.id, startedAt: entry.startedAt, endedAt: newEnd, reason: "" });
    expect(noReason.status).toBe(400);
    expect(noReason.body.error.details[0]).toMatchObject({ field: "reason", message: "Say why the change is needed" });
    const proposed = await priya.post("/api/time-entry-edits").send({ timeEntryId: entry.id, startedAt: entry.startedAt, endedAt: newEnd, reason: "Left early for the dentist" });
    expect(proposed.status).toBe(201);
    expect(proposed.body).toMatchObject({ status: "pending", current: { endedAt: entry.endedAt } });
    const [unchanged] = await t.db.select().from(timeEntries).where(eq(timeEntries.id, entry.id));
    expect(unchanged!.endedAt!.toISOString()).toBe(entry.endedAt);
    expect((await priya.post(`/api/time-entry-edits/${proposed.body.id}/approve`).send({})).status).toBe(403);
    const manager = await t.signIn(demo.manager);
    const approved = await manager.post(`/api/time-entry-edits/${proposed.body.id}/approve`).send({ note: "OK" });
    expect(approved.body).toMatchObject({ status: "approved", decidedByName: "Theo Vance" });
    const [changed] = await t.db.select().from(timeEntries).where(eq(timeEntries.id, entry.id));
    expect(changed!.endedAt!.toISOString()).toBe(newEnd);
    const [audit] = await t.db.select().from(auditEvents).where(and(eq(auditEvents.action, "time_entry.corrected"), eq(auditEvents.entityId, String(entry.id))));
    expect(audit!.before).toMatchObject({ endedAt: entry.endedAt });
    expect(audit!.after).toMatchObject({ endedAt: newEnd });
  });

  it("refuses a correction that would overlap another entry of the same person", async () => {
    const priya = await t.signIn(demo.engineer);
    const from = new Date(Date.now() - 20 * 86_400_000).toISOString().slice(0, 10);
    const entries = (await priya.get(`/api/time-entries?from=${from}&to=${new Date().toISOString().slice(0, 10)}`)).body as { id: number; startedAt: string; endedAt: string | null }[];
    const [a] = entries.filter((e) => e.endedAt);
    const hour = 3_600_000;
    const edit = await priya.post("/api/time-entry-edits").send({
      startedAt: new Date(new Date(a!.startedAt).getTime() + hour).toISOString(),
      endedAt: new Date(new Date(a!.endedAt!).getTime() + hour).toISOString(),
      reason: "A shift I forgot to clock",
    });
    expect(edit.status).toBe(201);
    expect(edit.body.timeEntryId).toBeNull();
    const manager = await t.signIn(demo.manager);
    const approve = await manager.post(`/api/time-entry-edits/${edit.body.id}/approve`).send({});
    expect(approve.status).toBe(409);
    expect(approve.body.error.code).toBe("entry_overlap");
  });
});

describe("listing time entries", () => {
  it("answers a range of at most 62 days in full, and refuses a longer one naming the field", async () => {
    const manager = await t.signIn(demo.manager);
    const longer = await manager.get("/api/time-entries?from=2026-01-01&to=2026-04-01");
    expect(longer.status).toBe(400);
    expect(longer.body.error.details[0]).toMatchObject({ field: "to", rule: "max_range" });
    expect((await manager.get("/api/time-entries?from=2026-01-01&to=2026-03-03")).status).toBe(200);
  });
});

describe("the week so far on the clock", () => {
  it("counts the seeded shift past midnight on both days it touched", async () => {
    const [jo] = await t.db.select().from(staffProfiles).where(eq(staffProfiles.displayName, "Jo Kettering"));
    // Seen from last Sunday, the seed's last week: Jo's Thursday 20:00 to Friday 01:35 engineer shift.
    const lastWeek = DateTime.now().setZone("America/Chicago").startOf("week").minus({ weeks: 1 });
    const actor = { userId: jo!.userId, name: "Jo Kettering", email: "jo@wrenfield.test", role: "engineer" as const, clientAccountId: null, clientAccountName: null, active: true };
    const state = await clockState(t.db, actor, lastWeek.plus({ days: 6, hours: 12 }).toJSDate());
    expect(state.week.workweekStart).toBe(lastWeek.toISODate());
    // Wednesday is the lockout as assistant, 10:30–19:10 less a 30-minute break.
    expect(state.week.days.map((d) => d.workedMinutes)).toEqual([0, 0, 490, 240, 95, 0, 0]);
    expect(state.week.workedMinutes).toBe(825);
  });
});
