import { and, eq, inArray, isNotNull, max } from "drizzle-orm";
import { DateTime } from "luxon";
import { bookings, isDuplicateKeyError, reelMovements, reels, storageCharges, storageNotices, studio, type Db } from "@takeup/db";
import { chargeableMonths, feeNoticeDate, feeStartDate } from "@takeup/domain";
import { enqueueEmail } from "../../lib/outbox.ts";
import { writeAudit } from "../../lib/audit.ts";
import { loadStudio } from "../studio/studio.service.ts";
import { clientRecipients } from "../bookings/recipients.ts";
import { storageNoticeEmail } from "../../emails/storage-notice.ts";

type ReelFees = { id: number; labelId: string; clientAccountId: number; feeStart: string; releasedOn: string | null };

/** Every reel's fee start (from its project's last session or the day it was recorded) and release day. */
async function reelFeeStarts(db: Db, freeDays: number, timeZone: string): Promise<ReelFees[]> {
  const rows = await db.select({ id: reels.id, labelId: reels.labelId, clientAccountId: reels.clientAccountId, projectId: reels.projectId, recordedOn: reels.recordedOn, status: reels.status }).from(reels);
  const lastSessions = await db
    .select({ projectId: bookings.projectId, last: max(bookings.endsAt) })
    .from(bookings)
    .where(and(isNotNull(bookings.projectId), inArray(bookings.status, ["confirmed", "in_session", "wrapped"])))
    .groupBy(bookings.projectId);
  const localDay = (at: Date) => DateTime.fromJSDate(new Date(at), { zone: timeZone }).toISODate()!;
  const lastByProject = new Map(lastSessions.map((s) => [s.projectId!, s.last ? localDay(s.last) : null]));
  const releases = await db.select({ reelId: reelMovements.reelId, at: max(reelMovements.at) }).from(reelMovements).where(eq(reelMovements.kind, "release")).groupBy(reelMovements.reelId);
  const releasedOn = new Map(releases.map((r) => [r.reelId, r.at ? localDay(r.at) : null]));
  return rows.flatMap((r) => {
    const last = (r.projectId ? lastByProject.get(r.projectId) : null) ?? r.recordedOn;
    if (!last) return [];
    return [{ id: r.id, labelId: r.labelId, clientAccountId: r.clientAccountId, feeStart: feeStartDate(last, freeDays), releasedOn: r.status === "released" ? (releasedOn.get(r.id) ?? last) : null }];
  });
}

/**
 * The monthly storage-fee work (docs/tape.md, "Vault"): records each chargeable reel-month as a
 * `storage_charges` row for invoicing, and tells clients one month before a reel's fees start.
 * Safe when two runs overlap: each reel-month and each notice is claimed by a unique key in the
 * transaction that writes it (a duplicate means another run has it), and the notice e-mail is
 * queued in the claiming transaction.
 * Returns the number of charges recorded plus notices claimed by this run.
 */
export async function recordStorageCharges(db: Db, now = new Date()): Promise<number> {
  const [settings] = await db.select({ timeZone: studio.timeZone, freeDays: studio.storageFreeDays, feeCents: studio.storageMonthlyFeeCents }).from(studio).where(eq(studio.id, 1));
  if (!settings) return 0;
  const asOf = DateTime.fromJSDate(now, { zone: settings.timeZone }).toISODate()!;
  const fees = await reelFeeStarts(db, settings.freeDays, settings.timeZone);
  const charged = new Set((await db.select({ reelId: storageCharges.reelId, month: storageCharges.month }).from(storageCharges)).map((c) => `${c.reelId}|${c.month}`));
  const noticed = new Set((await db.select({ reelId: storageNotices.reelId }).from(storageNotices)).map((n) => n.reelId));

  const claim = async (work: (tx: Parameters<Parameters<Db["transaction"]>[0]>[0]) => Promise<void>) => {
    try {
      await db.transaction(work);
      return true;
    } catch (error) {
      if (isDuplicateKeyError(error)) return false;
      throw error;
    }
  };

  let done = 0;
  for (const reel of fees) {
    for (const month of chargeableMonths({ feeStart: reel.feeStart, asOf, releasedOn: reel.releasedOn })) {
      if (charged.has(`${reel.id}|${month}`)) continue;
      const won = await claim(async (tx) => {
        const [row] = await tx.insert(storageCharges).values({ clientAccountId: reel.clientAccountId, reelId: reel.id, month, amountCents: settings.feeCents, createdAt: now }).$returningId();
        await writeAudit(tx, null, "storage_charge.recorded", { type: "storage_charge", id: row!.id }, { after: { reelId: reel.id, labelId: reel.labelId, month, amountCents: settings.feeCents } });
      });
      if (won) done += 1;
    }
  }

  // One notice per client for the reels whose fees start within a month, claimed per reel; the
  // client's e-mail is queued in the same transaction (decision 017), keyed by the first reel.
  const toTell = new Map<number, ReelFees[]>();
  for (const reel of fees) {
    if (reel.releasedOn || noticed.has(reel.id) || !(feeNoticeDate(reel.feeStart) <= asOf && asOf < reel.feeStart)) continue;
    toTell.set(reel.clientAccountId, [...(toTell.get(reel.clientAccountId) ?? []), reel]);
  }
  if (toTell.size) {
    const studioDto = await loadStudio(db);
    for (const [clientAccountId, list] of toTell) {
      const recipients = await clientRecipients(db, clientAccountId);
      const won = await claim(async (tx) => {
        for (const reel of list) {
          await tx.insert(storageNotices).values({ reelId: reel.id, clientAccountId: reel.clientAccountId, feeStart: reel.feeStart, createdAt: now });
          await writeAudit(tx, null, "storage_notice.claimed", { type: "reel", id: reel.id }, { after: { feeStart: reel.feeStart } });
        }
        for (const r of recipients) {
          await enqueueEmail(tx, `storage-notice:${list[0]!.id}:${r.email.toLowerCase()}`, storageNoticeEmail({ studio: studioDto, to: r.email, name: r.name, reels: list, monthlyFeeCents: settings.feeCents }), now);
        }
      });
      if (won) done += list.length;
    }
  }
  return done;
}
