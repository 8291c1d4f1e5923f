import { and, eq, gt, gte, inArray, lt, type SQL } from "drizzle-orm";
import { bookingEngineers, bookings, clientAccounts, projects, rateCardVersions, type Db, type Tx } from "@takeup/db";
import {
  bookingDateProblem,
  holdToQueueBehind,
  lockoutSpan,
  mayQueueBehindHold,
  maxBookingMinutes,
  validateBooking,
  type BookingDto,
  type BookingsQuery,
  type ConflictDto,
  type CreateBookingCommand,
  type QuoteInput,
  type QuoteResultDto,
  type StudioDto,
  type UpdateBookingInput,
} from "@takeup/domain";
import { HttpError, notFound } from "../../lib/http-error.ts";
import { writeAudit } from "../../lib/audit.ts";
import type { Actor } from "../../lib/actor.ts";
import { assertClientScope } from "../../lib/client-scope.ts";
import { loadStudio } from "../studio/studio.service.ts";
import { loadBookingDto, loadBookingDtos } from "./booking-dto.ts";
import { currentLinks, lockBooking, writeResourceLinks } from "./booking-writes.ts";
import { describeConflicts, findConflicts, lockResources } from "./occupancy.ts";
import { priceBooking } from "./price-booking.ts";

const minute = 60_000;
const unique = <T>(values: T[] | undefined) => [...new Set(values ?? [])];
const isStaff = (actor: Actor) => actor.role !== "client";

/** Booking writes run READ COMMITTED: after the resource locks, every read sees the latest commits. */
export const bookingTx = <T>(db: Db, work: (tx: Tx) => Promise<T>) => db.transaction(work, { isolationLevel: "read committed" });

/** Refuses (400) a booking instant outside the date window (docs/date-window.md), naming the field. */
function inDateWindow(instants: { field: "startsAt" | "endsAt"; at: Date }[]) {
  const problems = instants.flatMap(({ field, at }) => bookingDateProblem(field, at) ?? []);
  if (problems.length > 0) throw new HttpError(400, "invalid_input", problems[0]!.message, problems);
}

type WindowOptions = {
  /** The times to hold to the date window: only moved ones, so an old booking's notes stay editable. */
  changed?: ("startsAt" | "endsAt")[];
  /** A lockout's span is widened to whole studio days in the studio's zone (docs/pricing.md). */
  lockout?: { timeZone: string } | false;
};

/**
 * Refuses a span the domain's `validateBooking` finds wrong: its order and length are bad input
 * (400 invalid_input), anything else it finds (a time off the minute grid) is what pricing would
 * refuse anyway (400 invalid_booking).
 */
function assertSpan(span: { startsAt: Date; endsAt: Date }) {
  const check = validateBooking({ ...span, engineers: [] });
  if (check.ok) return;
  const [first] = check.problems;
  const code = first!.code === "after_start" || first!.code === "max_length" ? "invalid_input" : "invalid_booking";
  throw new HttpError(400, code, first!.message, check.problems.map((p) => ({ field: p.field, rule: p.code, message: p.message })));
}

/** The booked span, checked for date window, order and length (a lockout's once widened to whole days). */
function window(startsAt: string, endsAt: string, { changed = ["startsAt", "endsAt"], lockout = false }: WindowOptions = {}) {
  const asked = { startsAt: new Date(startsAt), endsAt: new Date(endsAt) };
  inDateWindow(changed.map((field) => ({ field, at: asked[field] })));
  assertSpan(asked);
  if (!lockout) return asked;
  const widened = lockoutSpan(asked.startsAt, asked.endsAt, lockout.timeZone);
  assertSpan(widened);
  return widened;
}

async function requireRoom(tx: Tx, resources: { roomId: number; engineerIds: string[]; equipmentIds: number[] }) {
  const locked = await lockResources(tx, resources);
  if (!locked.room) throw new HttpError(422, "unknown_room", "That room does not exist", [{ field: "roomId", rule: "exists", message: "Choose a room" }]);
  if (!locked.room.active) throw new HttpError(409, "room_inactive", `${locked.room.name} is not taking bookings`);
  if (locked.kit.length !== resources.equipmentIds.length || locked.kit.some((k) => !k.active)) {
    throw new HttpError(422, "unknown_equipment", "Choose active equipment", [{ field: "equipmentIds", rule: "exists", message: "Choose active equipment" }]);
  }
  return locked.room;
}

const conflictError = (conflicts: ConflictDto[], studio: StudioDto, actor: Actor) =>
  new HttpError(409, "booking_conflict", describeConflicts(conflicts, studio.timeZone, isStaff(actor)));

/** POST /api/quotes: the price and what is in the way, storing nothing. */
export async function previewQuote(db: Db, actor: Actor, input: QuoteInput): Promise<QuoteResultDto> {
  const studio = await loadStudio(db);
  const w = window(input.startsAt, input.endsAt, { lockout: input.lockout ? studio : false });
  const resources = { roomId: input.roomId, engineerIds: unique(input.engineerIds), equipmentIds: unique(input.equipmentIds) };
  return bookingTx(db, async (tx) => {
    const room = await requireRoom(tx, resources);
    const priced = await priceBooking(tx, { room, ...w, engineerIds: resources.engineerIds, studio, lockout: input.lockout ?? false });
    const conflicts = await findConflicts(tx, { ...resources, ...w, turnoverMinutes: room.turnoverMinutes, timeZone: studio.timeZone, now: new Date() });
    return {
      roomId: room.id,
      rateCardVersionId: priced.version.id,
      quote: priced.quote,
      depositRequiredCents: priced.depositRequiredCents,
      conflicts: conflicts.map((c) => (isStaff(actor) ? c : { ...c, clientName: null })),
      canQueueBehindHold: mayQueueBehindHold(conflicts),
    };
  });
}

/** Creates a hold or a confirmed booking; exactly one of any set of overlapping requests wins. */
export async function createBooking(
  db: Db,
  actor: Actor,
  input: CreateBookingCommand & { requestedByClient?: boolean },
): Promise<BookingDto> {
  const studio = await loadStudio(db);
  const w = window(input.startsAt, input.endsAt, { lockout: input.lockout ? studio : false });
  const resources = { roomId: input.roomId, engineerIds: unique(input.engineerIds), equipmentIds: unique(input.equipmentIds) };
  const id = await bookingTx(db, async (tx) => {
    const room = await requireRoom(tx, resources);
    const [account] = await tx.select().from(clientAccounts).where(eq(clientAccounts.id, input.clientAccountId));
    if (!account) throw new HttpError(422, "unknown_client", "That client account does not exist", [{ field: "clientAccountId", rule: "exists", message: "Choose a client" }]);
    if (input.projectId) {
      const [project] = await tx.select().from(projects).where(and(eq(projects.id, input.projectId), eq(projects.clientAccountId, account.id)));
      if (!project) throw new HttpError(422, "unknown_project", "That project is not this client's", [{ field: "projectId", rule: "exists", message: "Choose one of the client's projects" }]);
    }
    const now = new Date();
    const priced = await priceBooking(tx, { room, ...w, engineerIds: resources.engineerIds, studio, lockout: input.lockout ?? false });
    const conflicts = await findConflicts(tx, { ...resources, ...w, turnoverMinutes: room.turnoverMinutes, timeZone: studio.timeZone, now });
    let queuedBehindId: number | null = null;
    if (conflicts.length > 0) {
      const firstHold = input.queueBehindHold && input.status === "hold" ? holdToQueueBehind(conflicts) : null;
      if (firstHold === null) throw conflictError(conflicts, studio, actor);
      queuedBehindId = firstHold;
    }
    const [created] = await tx
      .insert(bookings)
      .values({
        roomId: room.id,
        clientAccountId: account.id,
        projectId: input.projectId ?? null,
        ...w,
        status: input.status,
        lockout: input.lockout ?? false,
        holdExpiresAt: input.status === "hold" && !queuedBehindId ? new Date(now.getTime() + studio.holdHours * 3600_000) : null,
        queuedBehindId,
        rateCardVersionId: priced.version.id,
        quote: priced.quote,
        quoteTotalCents: priced.quote.totalCents,
        depositRequiredCents: priced.depositRequiredCents,
        title: input.title?.trim() || null,
        notes: input.notes?.trim() || null,
        requestedByClient: input.requestedByClient ?? false,
        createdByUserId: actor.userId,
      })
      .$returningId();
    await writeResourceLinks(tx, created!.id, w, resources.engineerIds, resources.equipmentIds);
    const after = await loadBookingDto(tx, created!.id);
    await writeAudit(tx, actor, input.requestedByClient ? "booking.requested" : `booking.created_${input.status}`, { type: "booking", id: created!.id }, { after });
    return created!.id;
  });
  return (await loadBookingDto(db, id))!;
}

/** Reschedules or re-staffs a booking on the rate-card version it was quoted on. */
export async function updateBooking(db: Db, actor: Actor, id: number, input: UpdateBookingInput): Promise<BookingDto> {
  const studio = await loadStudio(db);
  await bookingTx(db, async (tx) => {
    const existing = await lockBooking(tx, id);
    if (!existing) throw notFound("That booking");
    if (existing.status === "cancelled" || existing.status === "wrapped") {
      throw new HttpError(409, "booking_closed", `A ${existing.status} booking cannot be changed`);
    }
    const links = await currentLinks(tx, id);
    // Only moved times must fit the window: editing the notes of an old booking stays possible.
    const moved = (["startsAt", "endsAt"] as const).filter((field) => input[field] !== undefined);
    const w = window(input.startsAt ?? existing.startsAt.toISOString(), input.endsAt ?? existing.endsAt.toISOString(), {
      changed: [...moved],
      lockout: existing.lockout ? studio : false,
    });
    const resources = { roomId: existing.roomId, engineerIds: input.engineerIds ? unique(input.engineerIds) : links.engineerIds, equipmentIds: input.equipmentIds ? unique(input.equipmentIds) : links.equipmentIds };
    const room = await requireRoom(tx, resources);
    const before = await loadBookingDto(tx, id);
    if (!existing.queuedBehindId) {
      const conflicts = await findConflicts(tx, { ...resources, ...w, turnoverMinutes: room.turnoverMinutes, excludeBookingId: id, timeZone: studio.timeZone, now: new Date() });
      if (conflicts.length > 0) throw conflictError(conflicts, studio, actor);
    }
    const [version] = await tx.select().from(rateCardVersions).where(eq(rateCardVersions.id, existing.rateCardVersionId));
    const priced = await priceBooking(tx, { room, ...w, engineerIds: resources.engineerIds, studio, version: version!, lockout: existing.lockout });
    if (input.projectId) {
      const [project] = await tx.select().from(projects).where(and(eq(projects.id, input.projectId), eq(projects.clientAccountId, existing.clientAccountId)));
      if (!project) throw new HttpError(422, "unknown_project", "That project is not this client's", [{ field: "projectId", rule: "exists", message: "Choose one of the client's projects" }]);
    }
    await tx
      .update(bookings)
      .set({
        ...w,
        quote: priced.quote,
        quoteTotalCents: priced.quote.totalCents,
        depositRequiredCents: priced.depositRequiredCents,
        ...(input.projectId !== undefined ? { projectId: input.projectId } : {}),
        ...(input.title !== undefined ? { title: input.title.trim() || null } : {}),
        ...(input.notes !== undefined ? { notes: input.notes.trim() || null } : {}),
      })
      .where(eq(bookings.id, id));
    await writeResourceLinks(tx, id, w, resources.engineerIds, resources.equipmentIds);
    await writeAudit(tx, actor, "booking.updated", { type: "booking", id }, { before, after: await loadBookingDto(tx, id) });
  });
  return (await loadBookingDto(db, id))!;
}

/** GET /api/bookings: staff see all; an engineer only the bookings they are on; a client only its own. */
export async function listBookings(db: Db, actor: Actor, query: BookingsQuery): Promise<BookingDto[]> {
  const from = new Date(query.from);
  const to = new Date(query.to);
  if (to <= from) throw new HttpError(400, "invalid_input", "`to` must be after `from`", [{ field: "to", rule: "after_from", message: "After from" }]);
  if (to.getTime() - from.getTime() > 62 * 1440 * minute) {
    throw new HttpError(400, "invalid_input", "Ask for at most 62 days at a time", [{ field: "to", rule: "max_span", message: "At most 62 days after from" }]);
  }
  const filters: (SQL | undefined)[] = [
    gte(bookings.startsAt, new Date(from.getTime() - maxBookingMinutes * minute)),
    lt(bookings.startsAt, to),
    gt(bookings.endsAt, from),
    query.roomId ? eq(bookings.roomId, query.roomId) : undefined,
    query.status ? eq(bookings.status, query.status) : undefined,
  ];
  const engineerId = actor.role === "engineer" ? actor.userId : query.engineerId;
  if (engineerId) {
    const mine = await db
      .select({ id: bookingEngineers.bookingId })
      .from(bookingEngineers)
      .where(and(eq(bookingEngineers.staffUserId, engineerId), gte(bookingEngineers.startsAt, new Date(from.getTime() - maxBookingMinutes * minute)), lt(bookingEngineers.startsAt, to)));
    if (mine.length === 0) return [];
    filters.push(inArray(bookings.id, mine.map((m) => m.id)));
  }
  const clientAccountId = actor.role === "client" ? actor.clientAccountId! : query.clientAccountId;
  if (clientAccountId) filters.push(eq(bookings.clientAccountId, clientAccountId));
  const list = await loadBookingDtos(db, and(...filters));
  return actor.role === "client" ? list.map(forClient) : list;
}

/** The studio's internal notes are not the client's to read. */
const forClient = (b: BookingDto): BookingDto => ({ ...b, notes: null });

export async function getBooking(db: Db, actor: Actor, id: number): Promise<BookingDto> {
  const dto = await loadBookingDto(db, id);
  if (!dto) throw notFound("That booking");
  if (actor.role === "client") {
    assertClientScope(actor, dto.client.id, "That booking");
    return forClient(dto);
  }
  if (actor.role === "engineer" && !dto.engineers.some((e) => e.userId === actor.userId)) throw notFound("That booking");
  return dto;
}
