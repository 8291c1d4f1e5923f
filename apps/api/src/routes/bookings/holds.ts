import { and, asc, eq, inArray, isNull, lte } from "drizzle-orm";
import { bookings, type Db, type Tx } from "@takeup/db";
import type { StudioDto } from "@takeup/domain";
import { writeAudit } from "../../lib/audit.ts";
import { currentLinks } from "./booking-writes.ts";
import { findConflicts, lockResources } from "./occupancy.ts";

/**
 * After a first hold ends (released, lapsed, cancelled), the earliest second hold behind it
 * moves up if its slot is free, with a fresh hold period; the rest queue behind it. A second
 * hold whose slot was taken meanwhile is cancelled with the reason.
 */
export async function promoteNextHold(tx: Tx, firstHoldId: number, studio: StudioDto, now: Date): Promise<number | null> {
  const queued = await tx.select().from(bookings).where(and(eq(bookings.queuedBehindId, firstHoldId), eq(bookings.status, "hold"))).orderBy(asc(bookings.id)).for("update");
  for (const [index, candidate] of queued.entries()) {
    const links = await currentLinks(tx, candidate.id);
    const locked = await lockResources(tx, { roomId: candidate.roomId, ...links });
    const conflicts = await findConflicts(tx, {
      roomId: candidate.roomId,
      ...links,
      startsAt: candidate.startsAt,
      endsAt: candidate.endsAt,
      turnoverMinutes: locked.room?.turnoverMinutes ?? 0,
      excludeBookingId: candidate.id,
      timeZone: studio.timeZone,
      now,
    });
    if (conflicts.length > 0) {
      await tx.update(bookings).set({ status: "cancelled", queuedBehindId: null, cancelledAt: now, cancellationReason: "Could not move up: the slot was taken" }).where(eq(bookings.id, candidate.id));
      await writeAudit(tx, null, "booking.second_hold_dropped", { type: "booking", id: candidate.id }, { before: { status: "hold" }, after: { status: "cancelled" } });
      continue;
    }
    await tx
      .update(bookings)
      .set({ queuedBehindId: null, holdExpiresAt: new Date(now.getTime() + studio.holdHours * 3600_000) })
      .where(eq(bookings.id, candidate.id));
    const rest = queued.slice(index + 1).map((b) => b.id);
    if (rest.length) await tx.update(bookings).set({ queuedBehindId: candidate.id }).where(inArray(bookings.id, rest));
    await writeAudit(tx, null, "booking.hold_moved_up", { type: "booking", id: candidate.id }, { before: { queuedBehindId: firstHoldId }, after: { queuedBehindId: null } });
    return candidate.id;
  }
  return null;
}

/** Second holds behind a first hold that was confirmed lose their slot. */
export async function dropQueuedHolds(tx: Tx, firstHoldId: number, now: Date) {
  const queued = await tx.select({ id: bookings.id }).from(bookings).where(and(eq(bookings.queuedBehindId, firstHoldId), eq(bookings.status, "hold")));
  if (!queued.length) return;
  await tx
    .update(bookings)
    .set({ status: "cancelled", queuedBehindId: null, cancelledAt: now, cancellationReason: "The first hold was confirmed" })
    .where(inArray(bookings.id, queued.map((q) => q.id)));
  for (const q of queued) await writeAudit(tx, null, "booking.second_hold_dropped", { type: "booking", id: q.id }, { before: { status: "hold" }, after: { status: "cancelled" } });
}

/** Marks lapsed first holds cancelled and moves their second holds up; run by the scheduler. */
export async function expireLapsedHolds(db: Db, studio: StudioDto, now = new Date()): Promise<number> {
  const lapsed = await db
    .select({ id: bookings.id })
    .from(bookings)
    .where(and(eq(bookings.status, "hold"), isNull(bookings.queuedBehindId), lte(bookings.holdExpiresAt, now)))
    .limit(500);
  let count = 0;
  for (const { id } of lapsed) {
    // Counted after the commit: a transaction may run more than once (decision 010).
    const lapsedNow = await db.transaction(
      async (tx) => {
        const [hold] = await tx.select().from(bookings).where(eq(bookings.id, id)).for("update");
        if (!hold || hold.status !== "hold" || hold.queuedBehindId || !hold.holdExpiresAt || hold.holdExpiresAt > now) return false;
        await tx.update(bookings).set({ status: "cancelled", cancelledAt: now, cancellationReason: "The hold lapsed" }).where(eq(bookings.id, id));
        await writeAudit(tx, null, "booking.hold_lapsed", { type: "booking", id }, { before: { status: "hold" }, after: { status: "cancelled" } });
        await promoteNextHold(tx, id, studio, now);
        return true;
      },
      { isolationLevel: "read committed" },
    );
    if (lapsedNow) count++;
  }
  return count;
}
