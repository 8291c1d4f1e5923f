import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { bookingEngineers, bookings } from "@takeup/db";
import { createTestApp, type TestApp } from "../../test/harness.ts";
import { demo } from "../../test/demo.ts";
import { at, demoIds } from "./test-helpers.ts";

let t: TestApp;
let manager: Awaited<ReturnType<TestApp["signIn"]>>;
let priya: Awaited<ReturnType<TestApp["signIn"]>>;
let ids: Awaited<ReturnType<typeof demoIds>>;
let roomId: number;
const hour = 3_600_000;

beforeAll(async () => {
  t = await createTestApp();
  ids = await demoIds(t);
  manager = await t.signIn(demo.manager);
  priya = await t.signIn(demo.engineer);
  const owner = await t.signIn(demo.owner);
  // A room of this file's own, so the sessions moved to "now" below meet nothing seeded.
  roomId = (await owner.post("/api/rooms").send({ name: "Room W", capacity: 2, colour: "teal", turnoverMinutes: 0 })).body.id;
  await owner.post(`/api/rooms/${roomId}/rate-cards`).send({
    effectiveFrom: "2026-01-01T00:00:00Z", hourlyRateCents: 5000, dayRateCents: 40000, dayCoversMinutes: 600, minimumBillableMinutes: 60,
    billingIncrementMinutes: 30, afterHoursStartMinute: 1320, afterHoursEndMinute: 480, afterHoursPremiumBp: 0, weekendPremiumBp: 0,
  });
});
afterAll(() => t.close());

const booking = (extra: Record<string, unknown>) => ({ roomId, clientAccountId: ids.client("Blue Hour Records"), engineerIds: [ids.person("Priya Oduya")], ...extra });

/** Books a session weeks ahead (clear of everything), then moves it to start `offsetMinutes` from now, as if time had passed. */
async function sessionAround(offsetMinutes: number, status: "hold" | "confirmed", weeks: number) {
  const created = await manager.post("/api/bookings").send(booking({ startsAt: at(weeks, 2, "10:00"), endsAt: at(weeks, 2, "13:00"), status }));
  expect(created.status).toBe(201);
  const startsAt = new Date(Date.now() + offsetMinutes * 60_000);
  const endsAt = new Date(startsAt.getTime() + 3 * hour);
  await t.db.update(bookings).set({ startsAt, endsAt }).where(eq(bookings.id, created.body.id));
  await t.db.update(bookingEngineers).set({ startsAt, endsAt }).where(eq(bookingEngineers.bookingId, created.body.id));
  return created.body.id as number;
}

describe("dates in a sane window", () => {
  it("refuses a quote, booking, request or move in the year 0999 or ten years ahead with 400 naming the field and the rule", async () => {
    const quote = await manager.post("/api/quotes").send({ roomId, startsAt: "0999-12-07T10:00:00-06:00", endsAt: "0999-12-07T14:00:00-06:00" });
    expect(quote.status).toBe(400);
    expect(quote.body.error.details[0]).toMatchObject({ field: "startsAt", rule: "date_window" });
    const year = new Date().getUTCFullYear() + 10;
    const far = await manager.post("/api/bookings").send(booking({ startsAt: `${year}-12-07T10:00:00-06:00`, endsAt: `${year}-12-07T14:00:00-06:00`, status: "confirmed" }));
    expect(far.status).toBe(400);
    expect(far.body.error).toMatchObject({ code: "invalid_input", message: expect.stringContaining("3 years ahead") });
    expect(far.body.error.details.map((d: { field: string }) => d.field)).toEqual(["startsAt", "endsAt"]);
    const request = await (await t.signIn(demo.client)).post("/api/booking-requests").send({ roomId, startsAt: "0999-12-07T10:00:00-06:00", endsAt: "0999-12-07T14:00:00-06:00" });
    expect(request.status).toBe(400);
    expect(request.body.error.details[0].rule).toBe("date_window");
    const ok = await manager.post("/api/bookings").send(booking({ startsAt: at(9, 3, "10:00"), endsAt: at(9, 3, "12:00") }));
    expect(ok.status).toBe(201);
    const moved = await manager.patch(`/api/bookings/${ok.body.id}`).send({ endsAt: `${year}-12-07T14:00:00-06:00` });
    expect(moved.status).toBe(400);
    expect(moved.body.error.details[0]).toMatchObject({ field: "endsAt", rule: "date_window" });
  });

  it("lets an engineer start a session only near its booked time, then wrap it", async () => {
    const later = await manager.post("/api/bookings").send(booking({ startsAt: at(10, 2, "10:00"), endsAt: at(10, 2, "13:00"), status: "confirmed" }));
    expect(later.body.allowedActions).not.toContain("start");
    const early = await priya.post(`/api/bookings/${later.body.id}/start`);
    expect(early.status).toBe(409);
    expect(early.body.error).toMatchObject({ code: "not_session_time", message: expect.stringContaining("60 minutes before its booked start") });
    const now = await sessionAround(-30, "confirmed", 11);
    expect((await priya.get(`/api/bookings/${now}`)).body.allowedActions).toContain("start");
    expect((await priya.post(`/api/bookings/${now}/start`)).body.status).toBe("in_session");
    expect((await priya.post(`/api/bookings/${now}/wrap`)).body.status).toBe("wrapped");
  });

  it("clocks in only against a confirmed session near now: not a hold, not one weeks ahead", async () => {
    const held = await sessionAround(-10, "hold", 12);
    const onHold = await priya.post("/api/time-clock/clock-in").send({ bookingId: held });
    expect(onHold.status).toBe(422);
    expect(onHold.body.error).toMatchObject({ code: "session_not_confirmed", message: expect.stringContaining("only a hold") });
    await manager.post(`/api/bookings/${held}/release`);
    const ahead = await manager.post("/api/bookings").send(booking({ startsAt: at(13, 2, "10:00"), endsAt: at(13, 2, "13:00"), status: "confirmed" }));
    const tooEarly = await priya.post("/api/time-clock/clock-in").send({ bookingId: ahead.body.id });
    expect(tooEarly.status).toBe(422);
    expect(tooEarly.body.error.code).toBe("not_session_time");
    expect(tooEarly.body.error.details[0]).toMatchObject({ field: "bookingId", rule: "near_now" });
    const soon = await sessionAround(40, "confirmed", 14);
    const clocked = await priya.post("/api/time-clock/clock-in").send({ bookingId: soon });
    expect(clocked.status).toBe(201);
    await priya.post("/api/time-clock/clock-out");
  });

  it("refuses a correction for time not yet worked, or in the year 0999, naming the field", async () => {
    const future = await priya.post("/api/time-entry-edits").send({ startedAt: new Date(Date.now() + 2 * hour).toISOString(), endedAt: new Date(Date.now() + 5 * hour).toISOString(), reason: "Tomorrow's shift" });
    expect(future.status).toBe(400);
    expect(future.body.error.details).toEqual([
      expect.objectContaining({ field: "startedAt", rule: "date_window" }),
      expect.objectContaining({ field: "endedAt", rule: "date_window", message: expect.stringContaining("not yet worked") }),
    ]);
    const ancient = await priya.post("/api/time-entry-edits").send({ startedAt: "0999-12-07T10:00:00-06:00", endedAt: "0999-12-07T14:00:00-06:00", reason: "Long ago" });
    expect(ancient.status).toBe(400);
    expect(ancient.body.error.details[0]).toMatchObject({ field: "startedAt", rule: "date_window" });
  });
});
