import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq, sql } from "drizzle-orm";
import { DateTime } from "luxon";
import { reelMovements, reels, storageCharges, storageNotices } from "@takeup/db";
import { createTestApp, type TestApp } from "../../test/harness.ts";
import { demo } from "../../test/demo.ts";
import { recordStorageCharges } from "./vault.jobs.ts";
import { deliverQueuedEmails } from "../../lib/outbox.ts";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

// Noon on 2 December 2026 in the studio's zone (America/Chicago, UTC−6).
const now = new Date("2026-12-02T18:00:00Z");

describe("the storage-fee job (free 90 days after the last session, then 5.00 a reel a month: the demo owner's settings)", () => {
  it("records each chargeable reel-month exactly once when two runs overlap, and nothing more on a third", async () => {
    const [first, second] = await Promise.all([recordStorageCharges(t.db, now), recordStorageCharges(t.db, now)]);
    const [counted] = await t.db.select({ rows: sql<number>`count(*)`, pairs: sql<number>`count(distinct reel_id, month)` }).from(storageCharges);
    const notices = (await t.db.select().from(storageNotices)).length;
    expect(Number(counted!.rows)).toBeGreaterThan(0);
    expect(Number(counted!.pairs)).toBe(Number(counted!.rows));
    // Between them the two runs claimed every row once: neither counted a row the other wrote.
    expect(first + second).toBe(Number(counted!.rows) + notices);
    expect(await recordStorageCharges(t.db, now)).toBe(0);
  });

  it("charges a reel recorded on 10 March 2025 without a project from 9 June 2025 to this month, 5.00 each", async () => {
    const [reel] = await t.db.select().from(reels).where(eq(reels.contentsNote, "Demo mixes, batch 1"));
    const charges = await t.db.select().from(storageCharges).where(eq(storageCharges.reelId, reel!.id));
    const months = charges.map((c) => c.month).sort();
    expect(months[0]).toBe("2025-06");
    expect(months.at(-1)).toBe("2026-12");
    expect(months).toHaveLength(19);
    expect(charges.every((c) => c.amountCents === 500 && c.clientAccountId === reel!.clientAccountId)).toBe(true);
  });

  it("charges a released reel up to the month it left and no further", async () => {
    const [released] = await t.db.select().from(reels).where(eq(reels.status, "released"));
    const [left] = await t.db.select().from(reelMovements).where(eq(reelMovements.reelId, released!.id));
    const leftMonth = DateTime.fromJSDate(left!.at, { zone: "America/Chicago" }).toFormat("yyyy-MM");
    const months = (await t.db.select().from(storageCharges).where(eq(storageCharges.reelId, released!.id))).map((c) => c.month).sort();
    // Recorded 15 October 2024: 90 free days, fees from 14 January 2025.
    expect(months[0]).toBe("2025-01");
    expect(months.at(-1)).toBe(leftMonth);
  });

  it("tells the client once, a month before a reel's fees start, even when two runs overlap", async () => {
    const manager = await t.signIn(demo.manager);
    const orchard = (await manager.get("/api/clients")).body.find((c: { name: string }) => c.name === "The Quiet Orchard");
    // Recorded 16 September: 90 free days end on 15 December, fees start on the 16th.
    const made = await manager.post("/api/reels").send({ clientAccountId: orchard.id, trackCount: 24, tapeWidthMils: 2000, speedIps: 15, recordedOn: "2026-09-16" });
    expect(made.body.feesFrom).toBe("2026-12-16");
    const before = t.mailTo(demo.otherClient).length;
    await Promise.all([recordStorageCharges(t.db, now), recordStorageCharges(t.db, now)]);
    await recordStorageCharges(t.db, now);
    await deliverQueuedEmails(t.db, t.mailer);
    const notices = t.mailTo(demo.otherClient).slice(before);
    expect(notices).toHaveLength(1);
    expect(notices[0]!.subject).toContain("Storage fees start soon");
    expect(notices[0]!.text).toContain(`${made.body.labelId}: fees from 2026-12-16.`);
    expect(await t.db.select().from(storageCharges).where(eq(storageCharges.reelId, made.body.id))).toEqual([]);
  });
});
