import { and, asc, eq, inArray, type SQL } from "drizzle-orm";
import { bookings, clientAccounts, rooms, staffProfiles, timeEntries, timeEntryBreaks, timeEntryEdits, type DbOrTx } from "@takeup/db";
import type { TimeEntryDto } from "@takeup/domain";

const minute = 60_000;
/** [P] common practice: a shift over six hours usually includes a meal break; we flag, never deduct. */
const breakExpectedAfterMinutes = 6 * 60;

export async function loadEntryDtos(db: DbOrTx, where: SQL | undefined, openLimitHours: number, now = new Date()): Promise<TimeEntryDto[]> {
  const rows = await db
    .select({ entry: timeEntries, staffName: staffProfiles.displayName, roomName: rooms.name, clientName: clientAccounts.name })
    .from(timeEntries)
    .innerJoin(staffProfiles, eq(staffProfiles.userId, timeEntries.staffUserId))
    .leftJoin(bookings, eq(bookings.id, timeEntries.bookingId))
    .leftJoin(rooms, eq(rooms.id, bookings.roomId))
    .leftJoin(clientAccounts, eq(clientAccounts.id, bookings.clientAccountId))
    .where(where)
    .orderBy(asc(timeEntries.startedAt), asc(timeEntries.id))
    .limit(20_000);
  if (rows.length === 0) return [];
  const ids = rows.map((r) => r.entry.id);
  const breaks = await db.select().from(timeEntryBreaks).where(inArray(timeEntryBreaks.timeEntryId, ids)).orderBy(asc(timeEntryBreaks.startedAt));
  const pending = await db
    .select({ timeEntryId: timeEntryEdits.timeEntryId })
    .from(timeEntryEdits)
    .where(and(inArray(timeEntryEdits.timeEntryId, ids), eq(timeEntryEdits.status, "pending")));
  const pendingIds = new Set(pending.map((p) => p.timeEntryId));
  return rows.map(({ entry, staffName, roomName, clientName }) => {
    const own = breaks.filter((b) => b.timeEntryId === entry.id);
    const breakMs = own.reduce((sum, b) => sum + ((b.endedAt ?? entry.endedAt ?? now).getTime() - b.startedAt.getTime()), 0);
    const workedMinutes = entry.endedAt ? Math.round((entry.endedAt.getTime() - entry.startedAt.getTime() - breakMs) / minute) : null;
    const flags: TimeEntryDto["flags"] = [];
    if (!entry.endedAt && now.getTime() - entry.startedAt.getTime() > openLimitHours * 3600_000) flags.push("open_too_long");
    if (workedMinutes !== null && workedMinutes > breakExpectedAfterMinutes && own.length === 0) flags.push("missing_break");
    if (pendingIds.has(entry.id)) flags.push("pending_edit");
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
