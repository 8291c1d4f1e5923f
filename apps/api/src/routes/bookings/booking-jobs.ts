import { and, eq, gt, isNull, lte, type SQL } from "drizzle-orm";
import { bookings, type Db } from "@takeup/db";
import type { BookingDto, StudioDto } from "@takeup/domain";
import type { OutgoingEmail } from "../../lib/mailer.ts";
import { enqueueEmail } from "../../lib/outbox.ts";
import { loadStudio } from "../studio/studio.service.ts";
import { loadBookingDtos } from "./booking-dto.ts";
import { clientRecipients, staffRecipients } from "./recipients.ts";
import { bookingReminderEmail, holdExpiringEmail } from "../../emails/booking-emails.ts";

const hour = 3_600_000;

type Recipient = { email: string; name: string };

/**
 * Queues one e-mail per recipient for each booking that still needs it. Each booking is claimed by
 * setting its "sent" column where it is still empty, in the same transaction as the queued mail
 * (keyed by booking and address): a second run, or a second API process, claims nothing and
 * queues nothing (decision 017).
 */
async function queueOncePerBooking(
  db: Db,
  due: BookingDto[],
  sent: "reminderSentAt" | "holdNoticeSentAt",
  now: Date,
  mail: (booking: BookingDto) => Promise<{ key: string; recipients: Recipient[]; message: (r: Recipient) => OutgoingEmail }>,
): Promise<number> {
  let claimed = 0;
  for (const booking of due) {
    const { key, recipients, message } = await mail(booking);
    const mine = await db.transaction(async (tx) => {
      const [result] = await tx
        .update(bookings)
        .set({ [sent]: now })
        .where(and(eq(bookings.id, booking.id), isNull(bookings[sent])));
      if (result.affectedRows !== 1) return false;
      for (const r of recipients) await enqueueEmail(tx, `${key}:${booking.id}:${r.email.toLowerCase()}`, message(r), now);
      return true;
    });
    if (mine) claimed++;
  }
  return claimed;
}

function due(db: Db, where: SQL | undefined) {
  return loadBookingDtos(db, where, 200);
}

/** Holds lapsing within 12 hours get one notice to the client and the studio managers. */
export async function queueHoldNotices(db: Db, now = new Date()): Promise<number> {
  const studio: StudioDto = await loadStudio(db);
  const lapsingSoon = await due(db, and(eq(bookings.status, "hold"), isNull(bookings.queuedBehindId), isNull(bookings.holdNoticeSentAt), gt(bookings.holdExpiresAt, now), lte(bookings.holdExpiresAt, new Date(now.getTime() + 12 * hour))));
  return queueOncePerBooking(db, lapsingSoon, "holdNoticeSentAt", now, async (booking) => ({
    key: "hold-notice",
    recipients: [...(await clientRecipients(db, booking.client.id)), ...(await staffRecipients(db, { roles: ["manager"] }))],
    message: (r) => holdExpiringEmail({ studio, booking, to: r.email, name: r.name }),
  }));
}

/** Confirmed sessions starting within the next 24 hours get one reminder to the client and the engineers. */
export async function queueReminders(db: Db, now = new Date()): Promise<number> {
  const studio = await loadStudio(db);
  const startingSoon = await due(db, and(eq(bookings.status, "confirmed"), isNull(bookings.reminderSentAt), gt(bookings.startsAt, now), lte(bookings.startsAt, new Date(now.getTime() + 24 * hour))));
  return queueOncePerBooking(db, startingSoon, "reminderSentAt", now, async (booking) => ({
    key: "session-reminder",
    recipients: [...(await clientRecipients(db, booking.client.id)), ...(await staffRecipients(db, { userIds: booking.engineers.map((e) => e.userId) }))],
    message: (r) => bookingReminderEmail({ studio, booking, to: r.email, name: r.name }),
  }));
}
