import { and, asc, desc, eq, gt, gte, inArray, isNull, lt, lte, or } from "drizzle-orm";
import { bookingEngineers, bookings, clientAccounts, rooms, staffProfiles, timeEntries, timeEntryBreaks, type Db, type Tx } from "@takeup/db";
import { clockedMinutesByWorkday, dateWindow, nearBookedTime, workdayStart, workweekContaining, addCalendarDays, type TimeClockDto, type TimeEntryDto } from "@takeup/domain";
import { conflict, HttpError, notFound } from "../../lib/http-error.ts";
import { writeAudit } from "../../lib/audit.ts";
import type { Actor } from "../../lib/actor.ts";
import { loadPayroll } from "../payroll/payroll-settings.ts";
import { assertPeriodsOpen } from "../payroll/period-guard.ts";
import { loadEntryDtos } from "./entry-dto.ts";

const hour = 3_600_000;

async function lockPerson(tx: Tx, userId: string) {
  const [person] = await tx.select().from(staffProfiles).where(eq(staffProfiles.userId, userId)).for("update");
  if (!person) throw notFound("That member of staff");
  return person;
}

async function openEntryOf(tx: Tx | Db, userId: string) {
  const [open] = await tx.select().from(timeEntries).where(and(eq(timeEntries.staffUserId, userId), isNull(timeEntries.endedAt))).orderBy(desc(timeEntries.startedAt)).limit(1);
  return open ?? null;
}

async function entryDto(db: Db | Tx, id: number): Promise<TimeEntryDto> {
  const payroll = await loadPayroll(db);
  const [dto] = await loadEntryDtos(db, eq(timeEntries.id, id), payroll.dto.openEntryLimitHours);
  return dto!;
}

/** Sessions this person is booked on that run now or start within the hour. */
async function sessionsNow(db: Db, userId: string, now: Date) {
  return db
    .select({ id: bookings.id, roomName: rooms.name, clientName: clientAccounts.name, startsAt: bookings.startsAt, endsAt: bookings.endsAt, title: bookings.title })
    .from(bookingEngineers)
    .innerJoin(bookings, eq(bookings.id, bookingEngineers.bookingId))
    .innerJoin(rooms, eq(rooms.id, bookings.roomId))
    .innerJoin(clientAccounts, eq(clientAccounts.id, bookings.clientAccountId))
    .where(
      and(
        eq(bookingEngineers.staffUserId, userId),
        gte(bookingEngineers.startsAt, new Date(now.getTime() - 15 * 24 * hour)),
        lte(bookingEngineers.startsAt, new Date(now.getTime() + hour)),
        gt(bookingEngineers.endsAt, now),
        inArray(bookings.status, ["confirmed", "in_session"]),
      ),
    )
    .orderBy(asc(bookings.startsAt));
}

export async function clockState(db: Db, actor: Actor, now = new Date()): Promise<TimeClockDto> {
  const payroll = await loadPayroll(db);
  const week = workweekContaining(now, payroll.settings);
  const entries = await loadEntryDtos(
    db,
    and(eq(timeEntries.staffUserId, actor.userId), gte(timeEntries.startedAt, new Date(week.start.getTime() - 24 * hour)), lt(timeEntries.startedAt, week.end)),
    payroll.dto.openEntryLimitHours,
    now,
  );
  // An entry left open from before this week still counts as the one to clock out of.
  const stillOpen = await openEntryOf(db, actor.userId);
  const open = stillOpen ? (entries.find((e) => e.id === stillOpen.id) ?? (await entryDto(db, stillOpen.id))) : null;
  const days = Array.from({ length: 7 }, (_, i) => ({ date: addCalendarDays(week.workweekStart, i), workedMinutes: 0 }));
  for (const entry of entries) {
    const end = entry.endedAt ? new Date(entry.endedAt) : now;
    const start = new Date(entry.startedAt);
    if (end <= start) continue;
    const unpaidBreaks = entry.breaks.map((b) => ({ start: new Date(b.startedAt), end: b.endedAt ? new Date(b.endedAt) : now }));
    const byDay = clockedMinutesByWorkday({ id: String(entry.id), staffId: actor.userId, rateCode: entry.payRateCode, start, end, unpaidBreaks }, payroll.settings);
    // Days outside this workweek (a shift begun on the last day of the one before) drop out here.
    for (const day of days) day.workedMinutes += Math.round(byDay.get(day.date) ?? 0);
  }
  const rows = await sessionsNow(db, actor.userId, now);
  return {
    openEntry: open,
    onBreak: Boolean(open?.breaks.some((b) => b.endedAt === null)),
    sessionsNow: rows.map((r) => ({ ...r, startsAt: r.startsAt.toISOString(), endsAt: r.endsAt.toISOString() })),
    week: { workweekStart: week.workweekStart, workedMinutes: days.reduce((s, d) => s + d.workedMinutes, 0), days },
  };
}

export async function clockIn(db: Db, actor: Actor, bookingId: number | undefined, now = new Date()): Promise<TimeEntryDto> {
  const payroll = await loadPayroll(db);
  const id = await db.transaction(async (tx) => {
    const person = await lockPerson(tx, actor.userId);
    const open = await openEntryOf(tx, actor.userId);
    if (open) throw conflict("already_clocked_in", `You have been clocked in since ${open.startedAt.toISOString()}; clock out first`);
    const [overlap] = await tx
      .select({ id: timeEntries.id })
      .from(timeEntries)
      .where(and(eq(timeEntries.staffUserId, actor.userId), lte(timeEntries.startedAt, now), or(isNull(timeEntries.endedAt), gt(timeEntries.endedAt, now))))
      .limit(1);
    if (overlap) throw conflict("entry_overlap", "Another time entry already covers this moment");
    if (bookingId) {
      const [on] = await tx.select().from(bookingEngineers).where(and(eq(bookingEngineers.bookingId, bookingId), eq(bookingEngineers.staffUserId, actor.userId)));
      if (!on) throw new HttpError(422, "not_on_booking", "You are not booked on that session", [{ field: "bookingId", rule: "assigned", message: "Pick one of your sessions" }]);
      const [booking] = await tx.select().from(bookings).where(eq(bookings.id, bookingId));
      if (!booking || booking.status === "cancelled") throw new HttpError(422, "booking_cancelled", "That session was cancelled");
      // Only a session that is booked for real and happening about now: not a hold, not one next year.
      if (booking.status !== "confirmed" && booking.status !== "in_session") {
        const why = booking.status === "hold" ? "it is only a hold" : `it is ${booking.status.replace("_", " ")}`;
        throw new HttpError(422, "session_not_confirmed", `Clock in against a confirmed session; ${why}`, [{ field: "bookingId", rule: "confirmed", message: "Pick a confirmed session" }]);
      }
      if (!nearBookedTime(booking.startsAt, booking.endsAt, now, 0)) {
        throw new HttpError(422, "not_session_time", `You can clock into a session from ${dateWindow.startEarlyMinutes} minutes before it starts until it ends; this one is booked for ${booking.startsAt.toISOString()}`, [
          { field: "bookingId", rule: "near_now", message: "Pick a session running now or starting within the hour" },
        ]);
      }
    }
    await assertPeriodsOpen(tx, payroll, [now]);
    const [created] = await tx
      .insert(timeEntries)
      .values({ staffUserId: actor.userId, bookingId: bookingId ?? null, kind: bookingId ? "session" : "shop", payRateCode: person.engineerGrade ?? "engineer", startedAt: now, source: "clock", createdByUserId: actor.userId })
      .$returningId();
    await writeAudit(tx, actor, "time.clocked_in", { type: "time_entry", id: created!.id }, { after: { startedAt: now, bookingId: bookingId ?? null } });
    return created!.id;
  });
  return entryDto(db, id);
}

export async function clockOut(db: Db, actor: Actor, now = new Date()): Promise<TimeEntryDto> {
  const payroll = await loadPayroll(db);
  const id = await db.transaction(async (tx) => {
    await lockPerson(tx, actor.userId);
    const open = await openEntryOf(tx, actor.userId);
    if (!open) throw conflict("not_clocked_in", "You are not clocked in");
    await assertPeriodsOpen(tx, payroll, [open.startedAt, now]);
    await tx.update(timeEntryBreaks).set({ endedAt: now }).where(and(eq(timeEntryBreaks.timeEntryId, open.id), isNull(timeEntryBreaks.endedAt)));
    await tx.update(timeEntries).set({ endedAt: now }).where(eq(timeEntries.id, open.id));
    await writeAudit(tx, actor, "time.clocked_out", { type: "time_entry", id: open.id }, { before: { endedAt: null }, after: { endedAt: now } });
    return open.id;
  });
  return entryDto(db, id);
}

export async function toggleBreak(db: Db, actor: Actor, action: "start" | "end", now = new Date()): Promise<TimeEntryDto> {
  const id = await db.transaction(async (tx) => {
    await lockPerson(tx, actor.userId);
    const open = await openEntryOf(tx, actor.userId);
    if (!open) throw conflict("not_clocked_in", "Clock in before taking a break");
    const [onBreak] = await tx.select().from(timeEntryBreaks).where(and(eq(timeEntryBreaks.timeEntryId, open.id), isNull(timeEntryBreaks.endedAt)));
    if (action === "start") {
      if (onBreak) throw conflict("already_on_break", "You are already on a break");
      await tx.insert(timeEntryBreaks).values({ timeEntryId: open.id, startedAt: now });
    } else {
      if (!onBreak) throw conflict("not_on_break", "You are not on a break");
      await tx.update(timeEntryBreaks).set({ endedAt: now }).where(eq(timeEntryBreaks.id, onBreak.id));
    }
    await writeAudit(tx, actor, `time.break_${action === "start" ? "started" : "ended"}`, { type: "time_entry", id: open.id }, { after: { at: now } });
    return open.id;
  });
  return entryDto(db, id);
}

const maxListDays = 62;

/** Entries of a studio-local date range, for one person or (staff with the right) everyone. */
export async function listEntries(db: Db, from: string, to: string, staffUserId: string | undefined) {
  const payroll = await loadPayroll(db);
  const start = workdayStart(from, payroll.settings);
  const end = workdayStart(addCalendarDays(to, 1), payroll.settings);
  if (end <= start) throw new HttpError(400, "invalid_input", "`to` must not be before `from`", [{ field: "to", rule: "after_from", message: "On or after from" }]);
  // A bounded range instead of a silent row limit: the list is always complete.
  if (end.getTime() - start.getTime() > maxListDays * 24 * hour) {
    throw new HttpError(400, "invalid_input", `Ask for at most ${maxListDays} days at a time`, [{ field: "to", rule: "max_range", message: `At most ${maxListDays} days after from` }]);
  }
  return loadEntryDtos(db, and(gte(timeEntries.startedAt, start), lt(timeEntries.startedAt, end), staffUserId ? eq(timeEntries.staffUserId, staffUserId) : undefined), payroll.dto.openEntryLimitHours);
}
