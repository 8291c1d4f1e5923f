import { asc, eq, inArray, type SQL } from "drizzle-orm";
import { bookingEngineers, bookingEquipment, bookings, clientAccounts, equipment, projects, rooms, staffProfiles, type DbOrTx } from "@takeup/db";
import { allowedActions, type BookingDto } from "@takeup/domain";

const iso = (d: Date | null) => (d ? d.toISOString() : null);

/** Loads bookings matching `where` as DTOs: one query for the rows, one each for engineers and kit. */
export async function loadBookingDtos(db: DbOrTx, where: SQL | undefined, limit = 2000): Promise<BookingDto[]> {
  const now = new Date();
  const rows = await db
    .select({ booking: bookings, room: rooms, clientName: clientAccounts.name, projectName: projects.name })
    .from(bookings)
    .innerJoin(rooms, eq(rooms.id, bookings.roomId))
    .innerJoin(clientAccounts, eq(clientAccounts.id, bookings.clientAccountId))
    .leftJoin(projects, eq(projects.id, bookings.projectId))
    .where(where)
    .orderBy(asc(bookings.startsAt), asc(bookings.id))
    .limit(limit);
  if (rows.length === 0) return [];
  const ids = rows.map((r) => r.booking.id);
  const engineers = await db
    .select({ bookingId: bookingEngineers.bookingId, userId: staffProfiles.userId, name: staffProfiles.displayName, grade: staffProfiles.engineerGrade })
    .from(bookingEngineers)
    .innerJoin(staffProfiles, eq(staffProfiles.userId, bookingEngineers.staffUserId))
    .where(inArray(bookingEngineers.bookingId, ids))
    .orderBy(asc(staffProfiles.displayName));
  const kit = await db
    .select({ bookingId: bookingEquipment.bookingId, id: equipment.id, name: equipment.name })
    .from(bookingEquipment)
    .innerJoin(equipment, eq(equipment.id, bookingEquipment.equipmentId))
    .where(inArray(bookingEquipment.bookingId, ids))
    .orderBy(asc(equipment.name));
  return rows.map(({ booking: b, room, clientName, projectName }) => ({
    id: b.id,
    room: { id: room.id, name: room.name, colour: room.colour },
    client: { id: b.clientAccountId, name: clientName },
    project: b.projectId && projectName ? { id: b.projectId, name: projectName } : null,
    startsAt: b.startsAt.toISOString(),
    endsAt: b.endsAt.toISOString(),
    status: b.status,
    lockout: b.lockout,
    holdExpiresAt: iso(b.holdExpiresAt),
    queuedBehindId: b.queuedBehindId,
    engineers: engineers.filter((e) => e.bookingId === b.id).map((e) => ({ userId: e.userId, name: e.name, grade: e.grade ?? "engineer" })),
    equipment: kit.filter((k) => k.bookingId === b.id).map((k) => ({ id: k.id, name: k.name })),
    title: b.title,
    notes: b.notes,
    rateCardVersionId: b.rateCardVersionId,
    quote: b.quote,
    quoteTotalCents: b.quoteTotalCents,
    depositRequiredCents: b.depositRequiredCents,
    depositReceivedAt: iso(b.depositReceivedAt),
    requestedByClient: b.requestedByClient,
    cancelledAt: iso(b.cancelledAt),
    cancellationReason: b.cancellationReason,
    cancellationFeeCents: b.cancellationFeeCents,
    allowedActions: allowedActions(b.status, { queuedBehindId: b.queuedBehindId, startsAt: b.startsAt, endsAt: b.endsAt, now }),
    createdAt: b.createdAt.toISOString(),
  }));
}

export async function loadBookingDto(db: DbOrTx, id: number): Promise<BookingDto | null> {
  const [dto] = await loadBookingDtos(db, eq(bookings.id, id), 1);
  return dto ?? null;
}
