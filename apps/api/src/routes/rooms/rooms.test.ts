import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { auditEvents } from "@takeup/db";
import { createTestApp, type TestApp } from "../../test/harness.ts";
import { demo } from "../../test/demo.ts";

let t: TestApp;
let owner: Awaited<ReturnType<TestApp["signIn"]>>;
beforeAll(async () => {
  t = await createTestApp();
  owner = await t.signIn(demo.owner);
});
afterAll(() => t.close());

describe("rooms and equipment", () => {
  it("lists the demo rooms in order with the rate card in force", async () => {
    const response = await owner.get("/api/rooms");
    expect(response.body.map((r: { name: string }) => r.name)).toEqual(["Room A", "Room B", "Room C"]);
    expect(response.body[0].currentRateCard).toMatchObject({ version: 1, hourlyRateCents: 9500, dayRateCents: 85000, dayCoversMinutes: 600, minimumBillableMinutes: 180 });
    expect(response.body[0].currentRateCard).not.toHaveProperty("createdByUserId");
  });

  it("adds a room with a colour from our palette and refuses a duplicate name", async () => {
    const created = await owner.post("/api/rooms").send({ name: "Room D", capacity: 2, colour: "plum", turnoverMinutes: 15 });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ name: "Room D", colour: "plum", currentRateCard: null });
    const again = await owner.post("/api/rooms").send({ name: "Room D", capacity: 2, colour: "plum", turnoverMinutes: 15 });
    expect(again.status).toBe(409);
    const badColour = await owner.post("/api/rooms").send({ name: "Room E", capacity: 2, colour: "neon", turnoverMinutes: 15 });
    expect(badColour.body.error.details[0]).toMatchObject({ field: "colour", message: "Choose one of the room colours" });
  });

  it("refuses a booking in a room with no rate card yet (422 no_rate_card)", async () => {
    const manager = await t.signIn(demo.manager);
    const room = (await owner.get("/api/rooms")).body.find((r: { name: string }) => r.name === "Room D");
    const response = await manager.post("/api/quotes").send({ roomId: room.id, startsAt: "2027-03-01T10:00:00-06:00", endsAt: "2027-03-01T13:00:00-06:00" });
    expect(response.status).toBe(422);
    expect(response.body.error.message).toMatch(/^Room D has no rate card in force/);
  });

  it("moves a tape recorder to another room and audits the move", async () => {
    const list = (await owner.get("/api/equipment")).body;
    const recorder = list.find((e: { name: string }) => e.name === "16-track 1/2-inch tape recorder");
    expect(recorder).toMatchObject({ homeRoomName: "Room A", trackCount: 16, tapeWidthMils: 500, speedsIps: [15, 30] });
    const roomC = (await owner.get("/api/rooms")).body.find((r: { name: string }) => r.name === "Room C");
    const moved = await owner.patch(`/api/equipment/${recorder.id}`).send({ homeRoomId: roomC.id });
    expect(moved.body.homeRoomName).toBe("Room C");
    const [audit] = await t.db.select().from(auditEvents).where(eq(auditEvents.action, "equipment.moved"));
    expect(audit!.entityId).toBe(String(recorder.id));
  });

  it("refuses a tape width that is not a standard one", async () => {
    const response = await owner.post("/api/equipment").send({ name: "Odd recorder", kind: "tape_recorder", tapeWidthMils: 300 });
    expect(response.status).toBe(400);
    expect(response.body.error.details[0].field).toBe("tapeWidthMils");
  });

  it("sets a per-engineer rate that wins over the grade's rate in later quotes", async () => {
    const engineers = (await owner.get("/api/engineers")).body;
    const sam = engineers.find((e: { name: string }) => e.name === "Sam Reyes");
    expect(engineers.find((e: { name: string }) => e.name === "Jo Kettering").grade).toBe("assistant");
    await owner.post("/api/engineer-rates").send({ grade: "engineer", staffUserId: sam.userId, hourlyRateCents: 5000, effectiveFrom: "2026-06-01T00:00:00Z" });
    const roomB = (await owner.get("/api/rooms")).body.find((r: { name: string }) => r.name === "Room B");
    const quote = await owner.post("/api/quotes").send({ roomId: roomB.id, startsAt: "2027-03-02T10:00:00-06:00", endsAt: "2027-03-02T13:00:00-06:00", engineerIds: [sam.userId] });
    expect(quote.body.quote.lines.find((l: { kind: string }) => l.kind === "engineer").amountCents).toBe(15000);
  });
});
