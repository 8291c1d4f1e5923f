import { createHash, randomBytes } from "node:crypto";
import { and, asc, eq, gte, inArray, isNull, lt, ne } from "drizzle-orm";
import { bookingEngineers, bookings, calendarFeedTokens, rooms, staffProfiles, type Db } from "@takeup/db";
import type { CalendarFeedDto } from "@takeup/domain";
import { HttpError, notFound } from "../../lib/http-error.ts";
import { writeAudit } from "../../lib/audit.ts";
import type { Actor } from "../../lib/actor.ts";
import { buildCalendar } from "../../lib/ics.ts";
import { loadStudio } from "../studio/studio.service.ts";
import { loadBookingDtos } from "../bookings/booking-dto.ts";
import { bookingUid } from "../../emails/booking-emails.ts";

const day = 86_400_000;
const hash = (token: string) => createHash("sha256").update(token).digest("hex");
const feedUrl = (appUrl: string, token: string) => `${appUrl}/api/feeds/${token}.ics`;

async function feedRows(db: Db, where: ReturnType<typeof and>) {
  return db
    .select({ feed: calendarFeedTokens, roomName: rooms.name, staffName: staffProfiles.displayName })
    .from(calendarFeedTokens)
    .leftJoin(rooms, eq(rooms.id, calendarFeedTokens.roomId))
    .leftJoin(staffProfiles, eq(staffProfiles.userId, calendarFeedTokens.staffUserId))
    .where(where)
    .orderBy(asc(calendarFeedTokens.id));
}

const toDto = (row: Awaited<ReturnType<typeof feedRows>>[number], url: string | null): CalendarFeedDto => ({
  id: row.feed.id,
  kind: row.feed.roomId ? "room" : "engineer",
  roomId: row.feed.roomId,
  staffUserId: row.feed.staffUserId,
  name: row.roomName ?? row.staffName ?? "",
  createdAt: row.feed.createdAt.toISOString(),
  revokedAt: row.feed.revokedAt?.toISOString() ?? null,
  url,
});

export async function listFeeds(db: Db, actor: Actor) {
  const rows = await feedRows(db, and(isNull(calendarFeedTokens.revokedAt), actor.role === "engineer" ? eq(calendarFeedTokens.staffUserId, actor.userId) : undefined));
  return rows.map((r) => toDto(r, null));
}

export async function createFeed(db: Db, appUrl: string, actor: Actor, input: { roomId?: number; staffUserId?: string }) {
  // Someone else's calendar is a row the engineer may not see: 404, as for every other "own" row.
  if (actor.role === "engineer" && input.staffUserId !== actor.userId) throw notFound("That engineer");
  if (input.roomId) {
    const [room] = await db.select().from(rooms).where(eq(rooms.id, input.roomId));
    if (!room) throw notFound("That room");
  }
  if (input.staffUserId) {
    const [staff] = await db.select().from(staffProfiles).where(and(eq(staffProfiles.userId, input.staffUserId), eq(staffProfiles.role, "engineer")));
    if (!staff) throw notFound("That engineer");
  }
  const token = randomBytes(24).toString("base64url");
  const id = await db.transaction(async (tx) => {
    const [created] = await tx
      .insert(calendarFeedTokens)
      .values({ roomId: input.roomId ?? null, staffUserId: input.staffUserId ?? null, tokenHash: hash(token), createdByUserId: actor.userId })
      .$returningId();
    await writeAudit(tx, actor, "calendar_feed.created", { type: "calendar_feed", id: created!.id }, { after: input });
    return created!.id;
  });
  const [row] = await feedRows(db, eq(calendarFeedTokens.id, id));
  return toDto(row!, feedUrl(appUrl, token));
}

export async function revokeFeed(db: Db, actor: Actor, id: number) {
  await db.transaction(async (tx) => {
    const [feed] = await tx.select().from(calendarFeedTokens).where(eq(calendarFeedTokens.id, id)).for("update");
    // A revoked feed is gone: revoking it again finds nothing (no second stamp, no second audit row).
    if (!feed || feed.revokedAt !== null || (actor.role === "engineer" && feed.staffUserId !== actor.userId)) {
      throw notFound("That calendar feed");
    }
    await tx.update(calendarFeedTokens).set({ revokedAt: new Date() }).where(eq(calendarFeedTokens.id, id));
    await writeAudit(tx, actor, "calendar_feed.revoked", { type: "calendar_feed", id }, { before: { revokedAt: null } });
  });
}

/** The iCalendar text of a feed: bookings from 30 days back to a year ahead. */
export async function renderFeed(db: Db, appUrl: string, token: string): Promise<string> {
  const [feed] = await db.select().from(calendarFeedTokens).where(and(eq(calendarFeedTokens.tokenHash, hash(token)), isNull(calendarFeedTokens.revokedAt)));
  if (!feed) throw new HttpError(404, "feed_not_found", "This calendar feed does not exist or was revoked");
  const studio = await loadStudio(db);
  const now = Date.now();
  const from = new Date(now - 30 * day);
  const to = new Date(now + 365 * day);
  const window = and(gte(bookings.startsAt, from), lt(bookings.startsAt, to), ne(bookings.status, "cancelled"), isNull(bookings.queuedBehindId));
  let where = and(window, eq(bookings.roomId, feed.roomId ?? 0));
  let name = "";
  if (feed.staffUserId) {
    const mine = await db.select({ id: bookingEngineers.bookingId }).from(bookingEngineers).where(and(eq(bookingEngineers.staffUserId, feed.staffUserId), gte(bookingEngineers.startsAt, from), lt(bookingEngineers.startsAt, to)));
    where = and(window, inArray(bookings.id, mine.length ? mine.map((m) => m.id) : [0]));
    const [staff] = await db.select().from(staffProfiles).where(eq(staffProfiles.userId, feed.staffUserId));
    name = `${studio.name} — ${staff?.displayName ?? "engineer"}`;
  } else {
    const [room] = await db.select().from(rooms).where(eq(rooms.id, feed.roomId ?? 0));
    name = `${studio.name} — ${room?.name ?? "room"}`;
  }
  const list = await loadBookingDtos(db, where, 5000);
  return buildCalendar({
    name,
    productName: studio.name,
    events: list.map((b) => ({
      uid: bookingUid(b.id, appUrl),
      startsAt: new Date(b.startsAt),
      endsAt: new Date(b.endsAt),
      summary: `${b.status === "hold" ? "Hold: " : ""}${b.client.name} — ${b.room.name}`,
      description: [b.title, b.engineers.length ? `Engineers: ${b.engineers.map((e) => e.name).join(", ")}` : null].filter(Boolean).join("\n") || undefined,
      location: `${studio.name}, ${b.room.name}`,
      tentative: b.status === "hold",
    })),
  });
}
