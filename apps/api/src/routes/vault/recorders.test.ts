import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { auditEvents } from "@takeup/db";
import { createTestApp, type TestApp } from "../../test/harness.ts";
import { demo } from "../../test/demo.ts";

type Agent = Awaited<ReturnType<TestApp["signIn"]>>;
let t: TestApp;
let owner: Agent;
let engineer: Agent;
beforeAll(async () => {
  t = await createTestApp();
  [owner, engineer] = await Promise.all([t.signIn(demo.owner), t.signIn(demo.engineer)]);
});
afterAll(() => t.close());

type Recorder = { id: number; name: string; care: { kind: string; hoursSince: number; intervalHours: number | null; due: boolean; lastOn: string | null }[]; alignmentWarnings: { title: string | null }[] };
const named = (list: Recorder[], name: string) => list.find((r) => r.name === name)!;
const standing = (r: Recorder, kind: string) => r.care.find((c) => c.kind === kind)!;

describe("recorder care (intervals are common practice and the owner's settings)", () => {
  it("counts the 24-track's running hours from its wrapped sessions and flags it due for alignment", async () => {
    const response = await owner.get("/api/recorders");
    expect(response.status).toBe(200);
    const big = named(response.body, "24-track 2-inch tape recorder");
    // Eleven wrapped ten-hour days since the demo's last alignment.
    expect(standing(big, "alignment")).toMatchObject({ hoursSince: 110, intervalHours: 100, due: true });
    expect(big.alignmentWarnings.map((w) => w.title)).toContain("Tracking live (lockout, 3 days)");
    const small = named(response.body, "16-track 1/2-inch tape recorder");
    expect(standing(small, "alignment")).toMatchObject({ hoursSince: 8, due: false });
    expect(standing(small, "cleaning")).toMatchObject({ hoursSince: 8, intervalHours: 10, due: false });
    expect(response.body.map((r: Recorder) => r.name)).not.toContain("32-channel mixing console");
  });

  it("clears the alignment flag once an engineer logs an alignment, and audits it", async () => {
    const big = named((await owner.get("/api/recorders")).body, "24-track 2-inch tape recorder");
    // Twelve hours ago in UTC is never a future day in the studio's zone (UTC−6 / −5).
    const today = new Date(Date.now() - 12 * 3_600_000).toISOString().slice(0, 10);
    const logged = await engineer.post(`/api/recorders/${big.id}/care-events`).send({ kind: "alignment", doneOn: today, doneBy: "Priya Oduya", notes: "Test reel at 15 in/s" });
    expect(logged.status).toBe(201);
    expect(standing(logged.body, "alignment")).toMatchObject({ lastOn: today, hoursSince: 0, due: false });
    const [audit] = await t.db.select().from(auditEvents).where(eq(auditEvents.action, "recorder.care_logged"));
    expect(audit).toBeDefined();
    const future = await engineer.post(`/api/recorders/${big.id}/care-events`).send({ kind: "cleaning", doneOn: "2099-01-01", doneBy: "Priya Oduya" });
    expect(future.status).toBe(400);
    expect(future.body.error.details[0].field).toBe("doneOn");
  });

  it("answers 404 for care logged on equipment that is not a tape recorder", async () => {
    const response = await owner.post("/api/recorders/999999/care-events").send({ kind: "repair", doneOn: "2026-01-02", doneBy: "Someone" });
    expect(response.status).toBe(404);
  });

  it("keeps the storage and care settings, changed by the owner only", async () => {
    const manager = await t.signIn(demo.manager);
    expect((await manager.get("/api/vault-settings")).body).toEqual({ storageFreeDays: 90, storageMonthlyFeeCents: 500, alignmentIntervalHours: 100, cleaningIntervalHours: 10 });
    expect((await manager.patch("/api/vault-settings").send({ storageFreeDays: 30 })).status).toBe(403);
    const changed = await owner.patch("/api/vault-settings").send({ alignmentIntervalHours: 200 });
    expect(changed.body.alignmentIntervalHours).toBe(200);
    const big = named((await owner.get("/api/recorders")).body, "24-track 2-inch tape recorder");
    expect(standing(big, "alignment").intervalHours).toBe(200);
  });
});
