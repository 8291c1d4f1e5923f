import { and, asc, eq, gt, gte, inArray, isNull, lt, ne, or, sql, type SQL } from "drizzle-orm";
import {
  bookingEngineers,
  bookingEquipment,
  bookings,
  clientAccounts,
  equipment,
  rooms,
  staffProfiles,
  type Tx,
} from "@takeup/db";
import type { MySqlColumn } from "drizzle-orm/mysql-core";
import { formatStudioRange, maxBookingMinutes, type ConflictDto } from "@takeup/domain";

const minute = 60_000;

/**
 * A booking holds its room, engineers and kit unless it is cancelled, waiting as a second
 * hold, or a hold that has lapsed (the sweeper marks those cancelled; until then they free
 * the slot already, so nobody has to click anything).
 */
export function occupying(now: Date): SQL {
  return and(
    ne(bookings.status, "cancelled"),
    isNull(bookings.queuedBehindId),
    or(ne(bookings.status, "hold"), gt(bookings.holdExpiresAt, now)),
  )!;
}

/**
 * Overlap with [from, to) bounded below by the longest allowed booking, so the index on
 * (resource, starts_at) serves the query instead of scanning every earlier row.
 */
function overlapping(startsAt: MySqlColumn, endsAt: MySqlColumn, from: Date, to: Date): SQL {
  return and(gte(startsAt, new Date(from.getTime() - maxBookingMinutes * minute)), lt(startsAt, to), gt(endsAt, from))!;
}

export type Resources = { roomId: number; engineerIds: string[]; equipmentIds: number[] };
type Window = { startsAt: Date; endsAt: Date };

/**
 * Serialises bookings per resource: locks the room, the equipment and the engineers' rows in
 * one global order (room, then kit by id, then staff by id) so concurrent requests queue
 * instead of deadlocking. Call before findConflicts, inside a READ COMMITTED transaction.
 */
export async function lockResources(tx: Tx, resources: Resources) {
  // A write before the read: on one server the UPDATE takes the row lock as FOR UPDATE would; on a
  // Galera cluster, where a lock taken on one node does not stop a writer on another, two bookings
  // that bumped the same row cannot both commit (the loser gets 1213 and is retried, decision 017).
  // Raw SQL so the rows' updated_at keeps meaning "edited by someone".
  await tx.execute(sql`UPDATE ${rooms} SET lock_version = lock_version + 1 WHERE id = ${resources.roomId}`);
  if (resources.equipmentIds.length) await tx.execute(sql`UPDATE ${equipment} SET lock_version = lock_version + 1 WHERE id IN (${sql.join([...resources.equipmentIds].sort((a, b) => a - b), sql`, `)}) ORDER BY id`);
  if (resources.engineerIds.length) await tx.execute(sql`UPDATE ${staffProfiles} SET lock_version = lock_version + 1 WHERE user_id IN (${sql.join([...resources.engineerIds].sort(), sql`, `)}) ORDER BY user_id`);
  const [room] = await tx.select().from(rooms).where(eq(rooms.id, resources.roomId)).for("update");
  const kit = resources.equipmentIds.length
    ? await tx.select().from(equipment).where(inArray(equipment.id, resources.equipmentIds)).orderBy(asc(equipment.id)).for("update")
    : [];
  const staff = resources.engineerIds.length
    ? await tx.select().from(staffProfiles).where(inArray(staffProfiles.userId, resources.engineerIds)).orderBy(asc(staffProfiles.userId)).for("update")
    : [];
  return { room, kit, staff };
}

/** Everything already holding any of the resources during the window (turnover buffer included for the room and its kit). */
export async function findConflicts(
  tx: Tx,
  resources: Resources & Window & { turnoverMinutes: number; excludeBookingId?: number; timeZone: string; now: Date },
): Promise<ConflictDto[]> {
  const buffer = resources.turnoverMinutes * minute;
  const padded = { from: new Date(resources.startsAt.getTime() - buffer), to: new Date(resources.endsAt.getTime() + buffer) };
  const notSelf = resources.excludeBookingId ? ne(bookings.id, resources.excludeBookingId) : undefined;
  const columns = {
    bookingId: bookings.id,
    status: bookings.status,
    startsAt: bookings.startsAt,
    endsAt: bookings.endsAt,
    clientName: clientAccounts.name,
  };
  const roomRows = await tx
    .select({ ...columns, name: rooms.name })
    .from(bookings)
    .innerJoin(rooms, eq(rooms.id, bookings.roomId))
    .innerJoin(clientAccounts, eq(clientAccounts.id, bookings.clientAccountId))
    .where(and(eq(bookings.roomId, resources.roomId), overlapping(bookings.startsAt, bookings.endsAt, padded.from, padded.to), occupying(resources.now), notSelf));
  const engineerRows = resources.engineerIds.length
    ? await tx
        .select({ ...columns, name: staffProfiles.displayName })
        .from(bookingEngineers)
        .innerJoin(bookings, eq(bookings.id, bookingEngineers.bookingId))
        .innerJoin(staffProfiles, eq(staffProfiles.userId, bookingEngineers.staffUserId))
        .innerJoin(clientAccounts, eq(clientAccounts.id, bookings.clientAccountId))
        .where(
          and(
            inArray(bookingEngineers.staffUserId, resources.engineerIds),
            overlapping(bookingEngineers.startsAt, bookingEngineers.endsAt, resources.startsAt, resources.endsAt),
            occupying(resources.now),
            notSelf,
          ),
        )
    : [];
  const equipmentRows = resources.equipmentIds.length
    ? await tx
        .select({ ...columns, name: equipment.name })
        .from(bookingEquipment)
        .innerJoin(bookings, eq(bookings.id, bookingEquipment.bookingId))
        .innerJoin(equipment, eq(equipment.id, bookingEquipment.equipmentId))
        .innerJoin(clientAccounts, eq(clientAccounts.id, bookings.clientAccountId))
        .where(
          and(
            inArray(bookingEquipment.equipmentId, resources.equipmentIds),
            overlapping(bookingEquipment.startsAt, bookingEquipment.endsAt, padded.from, padded.to),
            occupying(resources.now),
            notSelf,
          ),
        )
    : [];
  const toDto = (resource: ConflictDto["resource"]) => (r: (typeof roomRows)[number]): ConflictDto => ({
    resource,
    name: r.name,
    bookingId: r.bookingId,
    status: r.status,
    startsAt: r.startsAt.toISOString(),
    endsAt: r.endsAt.toISOString(),
    clientName: r.clientName,
  });
  return [...roomRows.map(toDto("room")), ...engineerRows.map(toDto("engineer")), ...equipmentRows.map(toDto("equipment"))];
}

/** "Room A is already booked Mon 7 Dec 10:00–13:00 by Copper Vale (hold)". */
export function describeConflicts(conflicts: ConflictDto[], timeZone: string, showClientNames: boolean): string {
  const parts = conflicts.map((c) => {
    const when = formatStudioRange(new Date(c.startsAt), new Date(c.endsAt), timeZone);
    const who = showClientNames && c.clientName ? ` by ${c.clientName}` : "";
    return `${c.name} is already booked ${when}${who} (${c.status === "hold" ? "hold" : c.status.replace("_", " ")})`;
  });
  return `${parts.join("; ")}.`;
}
