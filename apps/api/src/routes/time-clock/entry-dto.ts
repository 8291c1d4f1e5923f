import { and, asc, eq, inArray, type SQL } from "drizzle-orm";
import { bookings, clientAccounts, rooms, staffProfiles, timeEntries, timeEntryBreaks, timeEntryEdits, type DbOrTx } from "@takeup/db";
import type { TimeEntryDto } from "@takeup/domain";

const minute = 60_000;
/** [P] common practice: a shift over six hours usually includes a meal break; we flag, never deduct. */
const breakExpectedAfterMinutes = 6 * 60;

/** Ids per `IN (…)` list: large periods are read in batches, never in one giant statement. */
const idBatch = 5_000;

function batches<T>(items: readonly T[], size: number): T[][] {
  const out: T[][] = [];
  for (let i = 0; i < items.length; i += size) out.push(items.slice(i, i + size));
  return out;
}

/**
 * Entries with their breaks and flags. Without `limit` every matching entry is read: payroll
 * must never pay part of a period without saying so.
 */
export async function loadEntryDtos(db: DbOrTx, where: SQL | undefined, openLimitHours: number, now = new Date(), limit?: number): Promise<TimeEntryDto[]> {
  const query = db
    .select({ entry: timeEntries, staffName: staffProfiles.displayName, roomName: rooms.name, clientName: clientAccounts.name })
    .from(timeEntries)
    .innerJoin(staffProfiles, eq(staffProfiles.userId, timeEntries.staffUserId))
    .leftJoin(bookings, eq(bookings.id, timeEntries.bookingId))
    .leftJoin(rooms, eq(rooms.id, bookings.roomId))
    .leftJoin(clientAccounts, eq(clientAccounts.id, bookings.clientAccountId))
    .where(where)
    .orderBy(asc(timeEntries.startedAt), asc(timeEntries.id));
  const rows = await (limit === undefined ? query : query.limit(limit));
  if (rows.length === 0) return [];
  const breaksByEntry = new Map<number, (typeof timeEntryBreaks.$inferSelect)[]>();
  const pendingIds = new Set<number | null>();
  const selfApprovedIds = new Set<number | null>();
  for (const ids of batches(rows.map((r) => r.entry.id), idBatch)) {
    const breaks = await db.select().from(timeEntryBreaks).where(inArray(timeEntryBreaks.timeEntryId, ids)).orderBy(asc(timeEntryBreaks.startedAt));
    for (const b of breaks) {
      const list = breaksByEntry.get(b.timeEntryId);
      if (list) list.push(b);
      else breaksByEntry.set(b.timeEntryId, [b]);
    }
    const pending = await db
      .select({ timeEntryId: timeEntryEdits.timeEntryId })
      .from(timeEntryEdits)
      .where(and(inArray(timeEntryEdits.timeEntryId, ids), eq(timeEntryEdits.status, "pending")));
    for (const p of pending) pendingIds.add(p.timeEntryId);
    const selfApproved = await db
      .select({ entryId: timeEntryEdits.resultEntryId })
      .from(timeEntryEdits)
      .where(and(inArray(timeEntryEdits.resultEntryId, ids), eq(timeEntryEdits.selfApproved, true)));
    for (const p of selfApproved) selfApprovedIds.add(p.entryId);
  }
  return rows.map(({ entry, staffName, roomName, clientName }) => {
    const own = breaksByEntry.get(entry.id) ?? [];
    const breakMs = own.reduce((sum, b) => sum + ((b.endedAt ?? entry.endedAt ?? now).getTime() - b.startedAt.getTime()), 0);
    const workedMinutes = entry.endedAt ? Math.round((entry.endedAt.getTime() - entry.startedAt.getTime() - breakMs) / minute) : null;
    const flags: TimeEntryDto["flags"] = [];
    if (!entry.endedAt && now.getTime() - entry.startedAt.getTime() > openLimitHours * 3600_000) flags.push("open_too_long");
    if (workedMinutes !== null && workedMinutes > breakExpectedAfterMinutes && own.length === 0) flags.push("missing_break");
    if (pendingIds.has(entry.id)) flags.push("pending_edit");
    if (selfApprovedIds.has(entry.id)) flags.push("self_approved");
    return {
      id: entry.id,
      staffUserId: entry.staffUserId,
      staffName,
      booking: entry.bookingId && roomName && clientName ? { id: entry.bookingId, roomName, clientName } : null,
      kind: entry.kind,
      payRateCode: entry.payRateCode,
      startedAt: entry.startedAt.toISOString(),
      endedAt: entry.endedAt?.toISOString() ?? null,
      source: entry.source,
      note: entry.note,
      breaks: own.map((b) => ({ id: b.id, startedAt: b.startedAt.toISOString(), endedAt: b.endedAt?.toISOString() ?? null })),
      workedMinutes,
      flags,
    };
  });
}
