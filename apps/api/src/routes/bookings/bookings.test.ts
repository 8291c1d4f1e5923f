import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { auditEvents, bookings } from "@takeup/db";
import { createTestApp, type TestApp } from "../../test/harness.ts";
import { demo } from "../../test/demo.ts";
import { at, demoIds } from "./test-helpers.ts";

let t: TestApp;
let manager: Awaited<ReturnType<TestApp["signIn"]>>;
let ids: Awaited<ReturnType<typeof demoIds>>;
beforeAll(async () => {
  t = await createTestApp();
  manager = await t.signIn(demo.manager);
  ids = await demoIds(t);
});
afterAll(() => t.close());

const book = (body: Record<string, unknown>) => manager.post("/api/bookings").send(body);

describe("quotes", () => {
  it("prices a weekday Room A session line by line and stores nothing (demo rates: $95/h, 3 h)", async () => {
    const before = (await t.db.select().from(bookings)).length;
    const response = await manager.post("/api/quotes").send({ roomId: ids.room("Room A"), startsAt: at(6, 2, "10:00"), endsAt: at(6, 2, "13:00") });
    expect(response.status).toBe(200);
    expect(response.body.quote.totalCents).toBe(28500);
    expect(response.body.quote.lines[0].explanation).toMatch(/\$95\.00/);
    expect(response.body.quote.rateCardLabel).toMatch(/^Room A rate card v1/);
    expect(response.body.depositRequiredCents).toBe(8550);
    expect(response.body.conflicts).toEqual([]);
    expect((await t.db.select().from(bookings)).length).toBe(before);
  });

  it("caps a long day at the day rate: 9 h and 10 h both cost $850, 11 h $945 (demo rates)", async () => {
    const price = async (end: string) =>
      (await manager.post("/api/quotes").send({ roomId: ids.room("Room A"), startsAt: at(6, 3, "09:00"), endsAt: at(6, 3, end) })).body.quote.totalCents;
    expect(await price("18:00")).toBe(85000);
    expect(await price("19:00")).toBe(85000);
    expect(await price("20:00")).toBe(94500);
  });

  it("adds engineer time per assigned engineer ($40/h engineer, $25/h assistant in the demo)", async () => {
    const response = await manager.post("/api/quotes").send({
      roomId: ids.room("Room B"),
      startsAt: at(6, 2, "10:00"),
      endsAt: at(6, 2, "13:00"),
      engineerIds: [ids.person("Priya Oduya"), ids.person("Jo Kettering")],
    });
    const engineerLines = response.body.quote.lines.filter((l: { kind: string }) => l.kind === "engineer");
    expect(engineerLines.map((l: { amountCents: number }) => l.amountCents).sort()).toEqual([12000, 7500].sort());
    expect(response.body.quote.totalCents).toBe(16500 + 12000 + 7500);
  });
});

describe("booking without double booking", () => {
  it("pencils a hold that lapses after the studio's hold period (48 h)", async () => {
    const response = await book({ roomId: ids.room("Room A"), clientAccountId: ids.client("Copper Vale"), startsAt: at(7, 1, "10:00"), endsAt: at(7, 1, "13:00") });
    expect(response.status).toBe(201);
    expect(response.body).toMatchObject({ status: "hold", quoteTotalCents: 28500, queuedBehindId: null, allowedActions: ["confirm", "release"] });
    const lapses = new Date(response.body.holdExpiresAt).getTime() - Date.now();
    expect(lapses).toBeGreaterThan(47.9 * 3600_000);
    expect(lapses).toBeLessThanOrEqual(48 * 3600_000);
    const [audit] = await t.db.select().from(auditEvents).where(eq(auditEvents.action, "booking.created_hold"));
    expect(audit!.entityId).toBe(String(response.body.id));
  });

  it("refuses an overlapping booking of the same room with 409 naming what clashes", async () => {
    const response = await book({ roomId: ids.room("Room A"), clientAccountId: ids.client("Ines Halloran"), startsAt: at(7, 1, "12:00"), endsAt: at(7, 1, "15:00"), status: "confirmed" });
    expect(response.status).toBe(409);
    expect(response.body.error.code).toBe("booking_conflict");
    expect(response.body.error.message).toMatch(/^Room A is already booked \w{3} \d+ \w{3} 10:00–13:00 by Copper Vale \(hold\)\.$/);
  });

  it("keeps the room's turnover free: 30 minutes after a Room A booking", async () => {
    const tooSoon = await book({ roomId: ids.room("Room A"), clientAccountId: ids.client("Ines Halloran"), startsAt: at(7, 1, "13:15"), endsAt: at(7, 1, "16:15") });
    expect(tooSoon.status).toBe(409);
    const afterTurnover = await book({ roomId: ids.room("Room A"), clientAccountId: ids.client("Ines Halloran"), startsAt: at(7, 1, "13:30"), endsAt: at(7, 1, "16:30") });
    expect(afterTurnover.status).toBe(201);
  });

  it("never books one engineer into two rooms at once", async () => {
    const priya = ids.person("Priya Oduya");
    const first = await book({ roomId: ids.room("Room B"), clientAccountId: ids.client("Ines Halloran"), startsAt: at(7, 2, "10:00"), endsAt: at(7, 2, "14:00"), engineerIds: [priya] });
    expect(first.status).toBe(201);
    const second = await book({ roomId: ids.room("Room C"), clientAccountId: ids.client("Blue Hour Records"), startsAt: at(7, 2, "13:00"), endsAt: at(7, 2, "17:00"), engineerIds: [priya] });
    expect(second.status).toBe(409);
    expect(second.body.error.message).toMatch(/^Priya Oduya is already booked/);
  });

  it("never books one tape recorder into two rooms at once", async () => {
    const recorder = (await manager.get("/api/equipment")).body.find((e: { name: string }) => e.name === "24-track 2-inch tape recorder").id;
    const first = await book({ roomId: ids.room("Room A"), clientAccountId: ids.client("Lantern Static"), startsAt: at(7, 3, "10:00"), endsAt: at(7, 3, "14:00"), equipmentIds: [recorder] });
    expect(first.status).toBe(201);
    const second = await book({ roomId: ids.room("Room C"), clientAccountId: ids.client("Blue Hour Records"), startsAt: at(7, 3, "12:00"), endsAt: at(7, 3, "16:00"), equipmentIds: [recorder] });
    expect(second.status).toBe(409);
    expect(second.body.error.message).toMatch(/^24-track 2-inch tape recorder is already booked/);
  });

  it("lets exactly one of 50 concurrent overlapping requests win; the other 49 get 409 booking_conflict", async () => {
    const requests = Array.from({ length: 50 }, (_, i) =>
      book({
        roomId: ids.room("Room C"),
        clientAccountId: ids.client("Copper Vale"),
        startsAt: at(8, 4, `${String(10 + (i % 3)).padStart(2, "0")}:00`),
        endsAt: at(8, 4, "16:00"),
        status: "confirmed",
      }),
    );
    const responses = await Promise.all(requests);
    const statuses = responses.map((r) => r.status);
    expect(statuses.filter((s) => s === 201)).toHaveLength(1);
    expect(statuses.filter((s) => s === 409)).toHaveLength(49);
    expect(new Set(responses.filter((r) => r.status === 409).map((r) => r.body.error.code))).toEqual(new Set(["booking_conflict"]));
  });

  it("refuses an end before the start, and bookings longer than 14 days, naming the field", async () => {
    const backwards = await book({ roomId: ids.room("Room B"), clientAccountId: ids.client("Copper Vale"), startsAt: at(9, 1, "12:00"), endsAt: at(9, 1, "10:00") });
    expect(backwards.status).toBe(400);
    expect(backwards.body.error.details[0].field).toBe("endsAt");
    const tooLong = await book({ roomId: ids.room("Room B"), clientAccountId: ids.client("Copper Vale"), startsAt: at(9, 1, "10:00"), endsAt: at(12, 1, "10:00") });
    expect(tooLong.status).toBe(400);
    expect(tooLong.body.error.details[0].rule).toBe("max_length");
  });

  it("refuses a time without an offset", async () => {
    const response = await book({ roomId: ids.room("Room B"), clientAccountId: ids.client("Copper Vale"), startsAt: "2027-02-01 10:00", endsAt: "2027-02-01 12:00" });
    expect(response.status).toBe(400);
    expect(response.body.error.details[0].field).toBe("startsAt");
  });
});

describe("lockouts", () => {
  it("quotes Room A Mon 10:00 – Wed 20:00 as a lockout: three day-rate lines of $850.00, $2,550.00 (docs/pricing.md worked example)", async () => {
    const response = await manager.post("/api/quotes").send({ roomId: ids.room("Room A"), startsAt: at(12, 1, "10:00"), endsAt: at(12, 3, "20:00"), lockout: true });
    expect(response.status).toBe(200);
    expect(response.body.quote.lockout).toBe(true);
    expect(response.body.quote.lines.map((l: { kind: string; amountCents: number }) => [l.kind, l.amountCents])).toEqual([["room_day", 85000], ["room_day", 85000], ["room_day", 85000]]);
    expect(response.body.quote.totalCents).toBe(255000);
  });

  it("holds whole studio days: a lockout booked Mon 10:00 – Wed 20:00 occupies Mon 00:00 to Thu 00:00, so a night session clashes", async () => {
    const held = await book({ roomId: ids.room("Room A"), clientAccountId: ids.client("Lantern Static"), startsAt: at(13, 1, "10:00"), endsAt: at(13, 3, "20:00"), lockout: true });
    expect(held.status, JSON.stringify(held.body)).toBe(201);
    expect(held.body).toMatchObject({ lockout: true, status: "hold", quoteTotalCents: 255000 });
    expect([held.body.startsAt, held.body.endsAt]).toEqual([new Date(at(13, 1, "00:00")).toISOString(), new Date(at(13, 4, "00:00")).toISOString()]);
    const night = await book({ roomId: ids.room("Room A"), clientAccountId: ids.client("Copper Vale"), startsAt: at(13, 2, "02:00"), endsAt: at(13, 2, "05:00") });
    expect(night.status).toBe(409);
    expect(night.body.error.code).toBe("booking_conflict");
    // Moving it keeps it a lockout, still whole days.
    const moved = await manager.patch(`/api/bookings/${held.body.id}`).send({ endsAt: at(13, 4, "12:00") });
    expect(moved.status, JSON.stringify(moved.body)).toBe(200);
    expect([moved.body.lockout, moved.body.endsAt, moved.body.quoteTotalCents]).toEqual([true, new Date(at(13, 5, "00:00")).toISOString(), 340000]);
  });

  it("seeds the demo's Lantern Static lockout as one lockout booking: three day-rate lines of $850.00 plus a working day of engineer time each", async () => {
    const [seeded] = await t.db.select().from(bookings).where(eq(bookings.title, "Tracking live (lockout, 3 days)"));
    expect(seeded?.lockout).toBe(true);
    expect(seeded?.quote.lines.filter((l) => l.kind === "room_day").map((l) => l.amountCents)).toEqual([85000, 85000, 85000]);
    // [D] 3 × $850.00 + 3 × 10 h × ($40.00 + $25.00) = $4,500.00.
    expect(seeded?.quoteTotalCents).toBe(450000);
  });

  it("prices lockouts at the card's own lockout day rate once the owner sets one, and refuses a zero rate naming the field", async () => {
    const owner = await t.signIn(demo.owner);
    const card = (await owner.get(`/api/rooms/${ids.room("Room C")}/rate-cards`)).body[0];
    const { id: _id, roomId: _r, version: _v, effectiveFrom: _e, createdAt: _c, ...fields } = card;
    const refused = await owner.post(`/api/rooms/${ids.room("Room C")}/rate-cards`).send({ ...fields, lockoutDayRateCents: 0 });
    expect(refused.status).toBe(400);
    expect(refused.body.error.details[0].field).toBe("lockoutDayRateCents");
    const added = await owner.post(`/api/rooms/${ids.room("Room C")}/rate-cards`).send({ ...fields, note: "Lockout price", lockoutDayRateCents: 50000 });
    expect(added.status, JSON.stringify(added.body)).toBe(201);
    expect(added.body).toMatchObject({ lockoutDayRateCents: 50000, lockoutWeekendPremium: false });
    const quoted = await manager.post("/api/quotes").send({ roomId: ids.room("Room C"), startsAt: at(14, 1, "10:00"), endsAt: at(14, 2, "20:00"), lockout: true });
    expect(quoted.body.quote.totalCents).toBe(100000);
  });
});

describe("rate-card versions", () => {
  it("keeps an existing booking's price when the owner changes the rate card; new quotes use the new version", async () => {
    const owner = await t.signIn(demo.owner);
    const booked = await book({ roomId: ids.room("Room B"), clientAccountId: ids.client("Lantern Static"), startsAt: at(10, 2, "10:00"), endsAt: at(10, 2, "14:00"), status: "confirmed" });
    expect(booked.body.quoteTotalCents).toBe(22000);
    const card = (await owner.get(`/api/rooms/${ids.room("Room B")}/rate-cards`)).body[0];
    const { id: _id, roomId: _r, version: _v, effectiveFrom: _e, createdAt: _c, ...fields } = card;
    const added = await owner.post(`/api/rooms/${ids.room("Room B")}/rate-cards`).send({ ...fields, note: "New year prices", hourlyRateCents: 6500 });
    expect(added.status, JSON.stringify(added.body)).toBe(201);
    expect(added.body.version).toBe(2);
    const kept = await manager.get(`/api/bookings/${booked.body.id}`);
    expect(kept.body.quoteTotalCents).toBe(22000);
    expect(kept.body.rateCardVersionId).toBe(card.id);
    const moved = await manager.patch(`/api/bookings/${booked.body.id}`).send({ notes: "Bring the ribbon mics" });
    expect(moved.body.quoteTotalCents).toBe(22000);
    const fresh = await manager.post("/api/quotes").send({ roomId: ids.room("Room B"), startsAt: at(10, 3, "10:00"), endsAt: at(10, 3, "14:00") });
    expect(fresh.body.quote.totalCents).toBe(26000);
    expect(fresh.body.quote.rateCardLabel).toMatch(/v2/);
  });

  it("refuses a rate card the pricing engine cannot honour (a minimum dearer than the day rate)", async () => {
    const owner = await t.signIn(demo.owner);
    const response = await owner.post(`/api/rooms/${ids.room("Room C")}/rate-cards`).send({
      hourlyRateCents: 10000, dayRateCents: 20000, dayCoversMinutes: 600, minimumBillableMinutes: 300, billingIncrementMinutes: 30,
      afterHoursStartMinute: 1320, afterHoursEndMinute: 480, afterHoursPremiumBp: 2500, weekendPremiumBp: 1500,
    });
    expect(response.status).toBe(422);
    expect(response.body.error.code).toBe("invalid_rate_card");
  });
});
