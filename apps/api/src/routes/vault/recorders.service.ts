import { and, asc, eq, inArray } from "drizzle-orm";
import { DateTime } from "luxon";
import { auditEvents, bookingEquipment, bookings, equipment, recorderCareEvents, rooms, studio, type Db, type DbOrTx } from "@takeup/db";
import { careStanding, runningHours, sessionRun, sessionsPastAlignment, type CareEventInput, type RecorderDto } from "@takeup/domain";
import type { Actor } from "../../lib/actor.ts";
import { writeAudit } from "../../lib/audit.ts";
import { HttpError, notFound } from "../../lib/http-error.ts";

async function careSettings(db: DbOrTx) {
  const [row] = await db
    .select({ timeZone: studio.timeZone, alignment: studio.alignmentIntervalHours, cleaning: studio.cleaningIntervalHours })
    .from(studio)
    .where(eq(studio.id, 1));
  if (!row) throw new HttpError(503, "studio_not_set_up", "The studio has not been set up yet (run the seed)");
  return row;
}

/**
 * The recorders' standing. Running hours come from the wrapped sessions each was booked into:
 * a session's actual start and wrap are when it was started and wrapped in Takeup (the audit log
 * keeps both); without them, its booked times.
 */
export async function listRecorders(db: DbOrTx, now = new Date(), onlyId?: number): Promise<RecorderDto[]> {
  const settings = await careSettings(db);
  const kit = await db
    .select({ id: equipment.id, name: equipment.name, roomName: rooms.name, trackCount: equipment.trackCount, tapeWidthMils: equipment.tapeWidthMils })
    .from(equipment)
    .leftJoin(rooms, eq(rooms.id, equipment.homeRoomId))
    .where(and(eq(equipment.kind, "tape_recorder"), eq(equipment.active, true), onlyId ? eq(equipment.id, onlyId) : undefined))
    .orderBy(asc(equipment.name));
  if (kit.length === 0) return [];
  const ids = kit.map((k) => k.id);
  const sessions = await db
    .select({ equipmentId: bookingEquipment.equipmentId, bookingId: bookings.id, title: bookings.title, status: bookings.status, startsAt: bookings.startsAt, endsAt: bookings.endsAt })
    .from(bookingEquipment)
    .innerJoin(bookings, eq(bookings.id, bookingEquipment.bookingId))
    .where(and(inArray(bookingEquipment.equipmentId, ids), inArray(bookings.status, ["wrapped", "confirmed"])));
  const wrappedIds = [...new Set(sessions.filter((s) => s.status === "wrapped").map((s) => String(s.bookingId)))];
  const actual = new Map<string, { start?: Date; end?: Date }>();
  if (wrappedIds.length) {
    const marks = await db
      .select({ entityId: auditEvents.entityId, action: auditEvents.action, at: auditEvents.at })
      .from(auditEvents)
      .where(and(eq(auditEvents.entityType, "booking"), inArray(auditEvents.entityId, wrappedIds), inArray(auditEvents.action, ["booking.started", "booking.wrapped"])))
      .orderBy(asc(auditEvents.at));
    for (const m of marks) {
      const entry = actual.get(m.entityId) ?? {};
      if (m.action === "booking.started") entry.start = m.at;
      else entry.end = m.at;
      actual.set(m.entityId, entry);
    }
  }
  const log = await db.select().from(recorderCareEvents).where(inArray(recorderCareEvents.equipmentId, ids)).orderBy(asc(recorderCareEvents.doneOn), asc(recorderCareEvents.id));
  // A care event counts from the start of its day in the studio's time zone.
  const startOfDay = (date: string) => DateTime.fromISO(date, { zone: settings.timeZone }).startOf("day").toJSDate();
  const intervals = { alignment: settings.alignment, cleaning: settings.cleaning };

  return kit.map((k) => {
    const mine = sessions.filter((s) => s.equipmentId === k.id);
    const runs = mine
      .filter((s) => s.status === "wrapped")
      .map((s) => sessionRun({ bookedStart: s.startsAt, bookedEnd: s.endsAt, actualStart: actual.get(String(s.bookingId))?.start, actualEnd: actual.get(String(s.bookingId))?.end }));
    const events = log.filter((e) => e.equipmentId === k.id);
    const care = careStanding({ runs, events: events.map((e) => ({ kind: e.kind, at: startOfDay(e.doneOn) })), intervals, now });
    const alignment = care.find((c) => c.kind === "alignment")!;
    const upcoming = mine.filter((s) => s.status === "confirmed" && s.endsAt > now).map((s) => ({ ...s, start: s.startsAt > now ? s.startsAt : now, end: s.endsAt }));
    const warnings = sessionsPastAlignment({ hoursSinceAlignment: alignment.hoursSince, intervalHours: settings.alignment, upcoming });
    return {
      ...k,
      runningHours: runningHours(runs, now),
      care: care.map((c) => ({ kind: c.kind, lastOn: [...events].reverse().find((e) => e.kind === c.kind)?.doneOn ?? null, hoursSince: c.hoursSince, intervalHours: c.intervalHours, due: c.due })),
      alignmentWarnings: warnings.map((w) => ({ bookingId: w.session.bookingId, title: w.session.title, startsAt: w.session.startsAt.toISOString(), hoursAtEnd: w.hoursAtEnd })),
      log: [...events].reverse().map((e) => ({ id: e.id, kind: e.kind, doneOn: e.doneOn, doneBy: e.doneBy, notes: e.notes })),
    };
  });
}

export async function logCareEvent(db: Db, actor: Actor, equipmentId: number, input: CareEventInput, now = new Date()): Promise<RecorderDto> {
  return db.transaction(async (tx) => {
    const [item] = await tx.select({ kind: equipment.kind }).from(equipment).where(eq(equipment.id, equipmentId)).for("update");
    if (!item || item.kind !== "tape_recorder") throw notFound("That recorder");
    const { timeZone } = await careSettings(tx);
    const today = DateTime.fromJSDate(now, { zone: timeZone }).toISODate()!;
    if (input.doneOn > today) throw new HttpError(400, "invalid_input", "Log care once it is done: the date cannot be in the future", [{ field: "doneOn", rule: "not_future", message: "Not in the future" }]);
    const [created] = await tx
      .insert(recorderCareEvents)
      .values({ equipmentId, kind: input.kind, doneOn: input.doneOn, doneBy: input.doneBy.trim(), notes: input.notes?.trim() || null, recordedByUserId: actor.userId })
      .$returningId();
    await writeAudit(tx, actor, "recorder.care_logged", { type: "equipment", id: equipmentId }, { after: { id: created!.id, ...input } });
    const [after] = await listRecorders(tx, now, equipmentId);
    return after!;
  });
}

/** Confirmed sessions from now on that would take a recorder past its alignment interval. */
export async function upcomingAlignmentWarnings(db: DbOrTx, now = new Date()) {
  const recorders = await listRecorders(db, now);
  return recorders.flatMap((r) => r.alignmentWarnings.map((w) => ({ recorderId: r.id, recorderName: r.name, ...w })));
}
