import { and, eq, gt, isNull, lte } from "drizzle-orm";
import { bookings, type Db } from "@takeup/db";
import type { Mailer } from "./mailer.ts";
import { logger } from "./logger.ts";
import { SignInThrottle } from "./sign-in-throttle.ts";
import { loadStudio } from "../routes/studio/studio.service.ts";
import { expireLapsedHolds } from "../routes/bookings/holds.ts";
import { loadBookingDtos } from "../routes/bookings/booking-dto.ts";
import { clientRecipients, staffRecipients } from "../routes/bookings/recipients.ts";
import { bookingReminderEmail, holdExpiringEmail } from "../emails/booking-emails.ts";

const hour = 3_600_000;

/** Holds lapsing within 12 hours get one notice to the client and the studio managers. */
export async function sendHoldNotices(db: Db, mailer: Mailer, now = new Date()) {
  const studio = await loadStudio(db);
  const due = await loadBookingDtos(db, and(eq(bookings.status, "hold"), isNull(bookings.queuedBehindId), isNull(bookings.holdNoticeSentAt), gt(bookings.holdExpiresAt, now), lte(bookings.holdExpiresAt, new Date(now.getTime() + 12 * hour))), 200);
  for (const booking of due) {
    const to = [...(await clientRecipients(db, booking.client.id)), ...(await staffRecipients(db, { roles: ["manager"] }))];
    for (const r of to) await mailer.send(holdExpiringEmail({ studio, booking, to: r.email, name: r.name }));
    await db.update(bookings).set({ holdNoticeSentAt: now }).where(eq(bookings.id, booking.id));
  }
  return due.length;
}

/** Confirmed sessions starting within the next 24 hours get one reminder to the client and the engineers. */
export async function sendReminders(db: Db, mailer: Mailer, now = new Date()) {
  const studio = await loadStudio(db);
  const due = await loadBookingDtos(db, and(eq(bookings.status, "confirmed"), isNull(bookings.reminderSentAt), gt(bookings.startsAt, now), lte(bookings.startsAt, new Date(now.getTime() + 24 * hour))), 200);
  for (const booking of due) {
    const to = [...(await clientRecipients(db, booking.client.id)), ...(await staffRecipients(db, { userIds: booking.engineers.map((e) => e.userId) }))];
    for (const r of to) await mailer.send(bookingReminderEmail({ studio, booking, to: r.email, name: r.name }));
    await db.update(bookings).set({ reminderSentAt: now }).where(eq(bookings.id, booking.id));
  }
  return due.length;
}

/** The API's background work: lapse holds, send notices and reminders, drop spent throttle counters, once a minute. */
export function startScheduler(db: Db, mailer: Mailer, everyMs = 60_000) {
  let running = false;
  const tick = async () => {
    if (running) return;
    running = true;
    try {
      const studio = await loadStudio(db);
      await expireLapsedHolds(db, studio);
      await sendHoldNotices(db, mailer);
      await sendReminders(db, mailer);
      await new SignInThrottle(db).purgeExpired();
    } catch (error) {
      logger.error("scheduled work failed", { reason: error instanceof Error ? error.message : String(error) });
    } finally {
      running = false;
    }
  };
  const timer = setInterval(() => void tick(), everyMs);
  void tick();
  return () => clearInterval(timer);
}
