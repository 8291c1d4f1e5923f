import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import ExcelJS from "exceljs";
import { DateTime } from "luxon";
import { auditEvents, staffProfiles, timeEntries } from "@takeup/db";
import { binaryBody } from "../../test/binary-body.ts";
import { createTestApp, type TestApp } from "../../test/harness.ts";
import { demo } from "../../test/demo.ts";

let t: TestApp;
let owner: Awaited<ReturnType<TestApp["signIn"]>>;
let manager: Awaited<ReturnType<TestApp["signIn"]>>;
let books: Awaited<ReturnType<TestApp["signIn"]>>;
const zone = "America/Chicago";
const hour = 3_600_000;
/** Three weeks back: a workweek the seed leaves empty. */
const monday = DateTime.now().setZone(zone).startOf("week").minus({ weeks: 3 });

beforeAll(async () => {
  t = await createTestApp();
  owner = await t.signIn(demo.owner);
  manager = await t.signIn(demo.manager);
  books = await t.signIn(demo.bookkeeper);
});
afterAll(() => t.close());

type Entry = { id: number; startedAt: string; endedAt: string | null };

async function priyaEntries(): Promise<Entry[]> {
  const from = DateTime.now().setZone(zone).minus({ days: 20 }).toISODate();
  const to = DateTime.now().setZone(zone).toISODate();
  const priyaId = (await (await t.signIn(demo.engineer)).get("/api/me")).body.id;
  return (await owner.get(`/api/time-entries?from=${from}&to=${to}&staffUserId=${priyaId}`)).body as Entry[];
}

describe("corrections proposed for someone else", () => {
  it("records the owner's correction of Priya's entry for Priya, proposed by the owner, and refuses an approval that would overlap another of her entries (409)", async () => {
    const [a, b] = (await priyaEntries()).filter((e) => e.endedAt);
    const proposed = await owner.post("/api/time-entry-edits").send({ timeEntryId: a!.id, startedAt: b!.startedAt, endedAt: new Date(new Date(b!.startedAt).getTime() + 2 * hour).toISOString(), reason: "Moved to the day she really worked" });
    expect(proposed.status).toBe(201);
    expect(proposed.body).toMatchObject({ staffName: "Priya Oduya", proposedByName: "Mara Linden" });
    const approve = await manager.post(`/api/time-entry-edits/${proposed.body.id}/approve`).send({});
    expect(approve.status).toBe(409);
    expect(approve.body.error.code).toBe("entry_overlap");
    const [unchanged] = await t.db.select().from(timeEntries).where(eq(timeEntries.id, a!.id));
    expect(unchanged!.startedAt.toISOString()).toBe(a!.startedAt);
    // Priya sees the correction among her own.
    const mine = (await (await t.signIn(demo.engineer)).get("/api/time-entry-edits?status=pending")).body as { id: number }[];
    expect(mine.map((e) => e.id)).toContain(proposed.body.id);
  });

  it("applies a manager's correction of an engineer's entry to that engineer's time when it overlaps nothing", async () => {
    // Not the entry the test before left a correction waiting on.
    const a = (await priyaEntries()).filter((e) => e.endedAt).at(-1);
    const newEnd = new Date(new Date(a!.endedAt!).getTime() - 15 * 60_000).toISOString();
    const proposed = await manager.post("/api/time-entry-edits").send({ timeEntryId: a!.id, startedAt: a!.startedAt, endedAt: newEnd, reason: "Left a quarter of an hour early" });
    expect(proposed.status).toBe(201);
    const approved = await owner.post(`/api/time-entry-edits/${proposed.body.id}/approve`).send({});
    expect(approved.status).toBe(200);
    expect(approved.body).toMatchObject({ staffName: "Priya Oduya", proposedByName: "Theo Vance", selfApproved: false });
    const [changed] = await t.db.select().from(timeEntries).where(eq(timeEntries.id, a!.id));
    expect(changed!.endedAt!.toISOString()).toBe(newEnd);
  });
});

describe("nobody approves a change to their own time", () => {
  it("refuses the manager's approval of their own 10-hour correction (403), and an owner approves it", async () => {
    const proposed = await manager.post("/api/time-entry-edits").send({ startedAt: monday.plus({ hours: 8 }).toISO(), endedAt: monday.plus({ hours: 18 }).toISO(), reason: "trust me" });
    expect(proposed.status).toBe(201);
    const own = await manager.post(`/api/time-entry-edits/${proposed.body.id}/approve`).send({});
    expect(own.status).toBe(403);
    expect(own.body.error).toMatchObject({ code: "own_time", message: expect.stringContaining("your own time") });
    const approved = await owner.post(`/api/time-entry-edits/${proposed.body.id}/approve`).send({ note: "Checked the door log" });
    expect(approved.status).toBe(200);
    expect(approved.body).toMatchObject({ status: "approved", decidedByName: "Mara Linden", selfApproved: false });
  });

  it("refuses a manager's approval of the owner's own correction: another owner decides, or the sole owner self-approves", async () => {
    const proposed = await owner.post("/api/time-entry-edits").send({ startedAt: monday.plus({ days: 1, hours: 9 }).toISO(), endedAt: monday.plus({ days: 1, hours: 12 }).toISO(), reason: "Opened the studio for the piano tuner" });
    const byManager = await manager.post(`/api/time-entry-edits/${proposed.body.id}/approve`).send({});
    expect(byManager.status).toBe(403);
    expect(byManager.body.error.code).toBe("owner_time");
    const listed = (await owner.get("/api/time-entry-edits?status=pending")).body as { id: number; approvalRule: string }[];
    expect(listed.find((e) => e.id === proposed.body.id)!.approvalRule).toBe("self_approval");
  });

  it("records the sole owner's approval of their own correction as self-approved: audited, flagged in the period review and in the export", async () => {
    const proposed = await owner.post("/api/time-entry-edits").send({ startedAt: monday.plus({ days: 2, hours: 9 }).toISO(), endedAt: monday.plus({ days: 2, hours: 13 }).toISO(), reason: "Delivery morning" });
    const approved = await owner.post(`/api/time-entry-edits/${proposed.body.id}/approve`).send({});
    expect(approved.status).toBe(200);
    expect(approved.body).toMatchObject({ status: "approved", selfApproved: true, decidedByName: "Mara Linden" });
    const [audit] = await t.db.select().from(auditEvents).where(and(eq(auditEvents.action, "time_edit.approved"), eq(auditEvents.entityId, String(proposed.body.id))));
    expect(audit!.after).toMatchObject({ selfApproved: true });
    const periods = (await books.get("/api/pay-periods")).body as { id: number; startDate: string }[];
    const period = periods.find((p) => p.startDate === monday.toISODate())!;
    const review = (await books.get(`/api/pay-periods/${period.id}`)).body;
    expect(review.flags).toContainEqual(expect.objectContaining({ kind: "self_approved", staffName: "Mara Linden", message: expect.stringContaining("their own time") }));
    const file = await books.get(`/api/pay-periods/${period.id}/export?format=xlsx`).buffer(true).parse(binaryBody);
    const workbook = new ExcelJS.Workbook();
    await workbook.xlsx.load(file.body as ArrayBuffer);
    const sheet = workbook.getWorksheet("Entries")!;
    const header = (sheet.getRow(1).values as unknown[]).indexOf("Self-approved");
    expect(header).toBeGreaterThan(0);
    const rows = (sheet.getSheetValues() as unknown[][]).filter((r) => r && r[3] === "Mara Linden");
    expect(rows.some((r) => r[header] === "yes")).toBe(true);
  });

  it("sends the owner's own correction to another owner when there is one; the owner can no longer approve it", async () => {
    // A second owner for this test only: Sam is promoted in the database.
    const [sam] = await t.db.select().from(staffProfiles).where(eq(staffProfiles.displayName, "Sam Reyes"));
    await t.db.update(staffProfiles).set({ role: "owner" }).where(eq(staffProfiles.userId, sam!.userId));
    try {
      const proposed = await owner.post("/api/time-entry-edits").send({ startedAt: monday.plus({ days: 3, hours: 9 }).toISO(), endedAt: monday.plus({ days: 3, hours: 11 }).toISO(), reason: "Tax meeting" });
      const listed = (await owner.get("/api/time-entry-edits?status=pending")).body as { id: number; approvalRule: string }[];
      expect(listed.find((e) => e.id === proposed.body.id)!.approvalRule).toBe("another_owner");
      const self = await owner.post(`/api/time-entry-edits/${proposed.body.id}/approve`).send({});
      expect(self.status).toBe(403);
      expect(self.body.error).toMatchObject({ code: "own_time", message: expect.stringContaining("another owner") });
      const other = await (await t.signIn("sam@wrenfield.test")).post(`/api/time-entry-edits/${proposed.body.id}/approve`).send({});
      expect(other.status).toBe(200);
      expect(other.body.selfApproved).toBe(false);
    } finally {
      await t.db.update(staffProfiles).set({ role: "engineer" }).where(eq(staffProfiles.userId, sam!.userId));
    }
  });
});
