import { eq } from "drizzle-orm";
import { bookings } from "@takeup/db";
import { cancellationFee, dateWindow, nearBookedTime, nextStatus, type BookingAction, type BookingDto, type CancellationPreviewDto } from "@takeup/domain";
import { HttpError, notFound } from "../../lib/http-error.ts";
import { writeAudit } from "../../lib/audit.ts";
import type { Actor } from "../../lib/actor.ts";
import type { Deps } from "../../deps.ts";
import { logger } from "../../lib/logger.ts";
import { loadStudio } from "../studio/studio.service.ts";
import { bookingConfirmedEmail } from "../../emails/booking-emails.ts";
import { loadBookingDto } from "./booking-dto.ts";
import { currentLinks, lockBooking } from "./booking-writes.ts";
import { bookingTx } from "./bookings.service.ts";
import { dropQueuedHolds, promoteNextHold } from "./holds.ts";
import { describeConflicts, findConflicts, lockResources } from "./occupancy.ts";
import { clientRecipients } from "./recipients.ts";

const labels: Record<BookingAction, string> = { confirm: "confirmed", start: "started", wrap: "wrapped", cancel: "cancelled", release: "released" };

export async function previewCancellation(deps: Deps, id: number): Promise<CancellationPreviewDto> {
  const [booking] = await deps.db.select().from(bookings).where(eq(bookings.id, id));
  if (!booking) throw notFound("That booking");
  const studio = await loadStudio(deps.db);
  if (booking.status === "hold") return { feeCents: 0, noticeMinutes: 0, explanation: "A hold is released without a fee." };
  const fee = cancellationFee({ quoteTotalCents: booking.quoteTotalCents, startsAt: booking.startsAt, cancelledAt: new Date(), tiers: studio.cancellationTiers });
  return { feeCents: fee.feeCents, noticeMinutes: fee.noticeMinutes, explanation: fee.explanation };
}

/** Moves a booking through hold → confirmed → in_session → wrapped, or cancels / releases it. */
export async function transitionBooking(
  deps: Deps,
  actor: Actor,
  id: number,
  action: BookingAction,
  options: { depositReceived?: boolean; reason?: string } = {},
): Promise<BookingDto> {
  const studio = await loadStudio(deps.db);
  const now = new Date();
  await bookingTx(deps.db, async (tx) => {
    const booking = await lockBooking(tx, id);
    if (!booking) throw notFound("That booking");
    if (actor.role === "engineer") {
      const { engineerIds } = await currentLinks(tx, id);
      if (!engineerIds.includes(actor.userId)) throw notFound("That booking");
    }
    const to = nextStatus(booking.status, action);
    if (!to) throw new HttpError(409, "invalid_transition", `A booking that is ${booking.status.replace("_", " ")} cannot be ${labels[action]}`);
    if (action === "start" && !nearBookedTime(booking.startsAt, booking.endsAt, now)) {
      throw new HttpError(
        409,
        "not_session_time",
        `A session can be started from ${dateWindow.startEarlyMinutes} minutes before its booked start until ${dateWindow.startLateMinutes / 60} hours after its booked end; this one is booked for ${booking.startsAt.toISOString()}`,
      );
    }
    if (action === "confirm" && booking.queuedBehindId) {
      throw new HttpError(409, "second_hold", `This is a second hold behind booking #${booking.queuedBehindId}; it can be confirmed once it moves up`);
    }
    const before = await loadBookingDto(tx, id);
    const changes: Partial<typeof bookings.$inferInsert> = { status: to };
    if (action === "confirm") {
      const links = await currentLinks(tx, id);
      const locked = await lockResources(tx, { roomId: booking.roomId, ...links });
      const conflicts = await findConflicts(tx, { roomId: booking.roomId, ...links, startsAt: booking.startsAt, endsAt: booking.endsAt, turnoverMinutes: locked.room?.turnoverMinutes ?? 0, excludeBookingId: id, timeZone: studio.timeZone, now });
      if (conflicts.length > 0) throw new HttpError(409, "booking_conflict", describeConflicts(conflicts, studio.timeZone, true));
      Object.assign(changes, { holdExpiresAt: null, ...(options.depositReceived ? { depositReceivedAt: now } : {}) });
    }
    if (action === "cancel" || action === "release") {
      const fee = action === "cancel" ? cancellationFee({ quoteTotalCents: booking.quoteTotalCents, startsAt: booking.startsAt, cancelledAt: now, tiers: studio.cancellationTiers }) : null;
      Object.assign(changes, {
        cancelledAt: now,
        cancellationReason: options.reason?.trim() || (action === "release" ? "Hold released" : "Cancelled"),
        cancellationFeeCents: fee?.feeCents ?? 0,
        queuedBehindId: null,
      });
    }
    await tx.update(bookings).set(changes).where(eq(bookings.id, id));
    if (action === "confirm") await dropQueuedHolds(tx, id, now);
    if (action === "release" && !booking.queuedBehindId) await promoteNextHold(tx, id, studio, now);
    await writeAudit(tx, actor, `booking.${labels[action]}`, { type: "booking", id }, { before, after: await loadBookingDto(tx, id) });
  });
  const after = (await loadBookingDto(deps.db, id))!;
  if (action === "confirm") await sendConfirmation(deps, after);
  return after;
}

async function sendConfirmation(deps: Deps, booking: BookingDto) {
  const studio = await loadStudio(deps.db);
  for (const recipient of await clientRecipients(deps.db, booking.client.id)) {
    try {
      await deps.mailer.send(bookingConfirmedEmail({ studio, booking, to: recipient.email, appUrl: deps.config.appUrl }));
    } catch (error) {
      // The booking stands; the failed send is in the e-mail log for the manager to retry.
      logger.warn("booking confirmation not sent", { bookingId: booking.id, reason: String(error) });
    }
  }
}
