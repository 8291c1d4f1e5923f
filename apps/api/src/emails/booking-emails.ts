import { formatMoney, formatStudioInstant, formatStudioRange, type BookingDto, type StudioDto } from "@takeup/domain";
import { composeEmail } from "./layout.ts";
import { buildCalendar } from "../lib/ics.ts";
import type { OutgoingEmail } from "../lib/mailer.ts";

export const bookingUid = (bookingId: number, appUrl: string) => `booking-${bookingId}@${new URL(appUrl).hostname}`;

const when = (b: BookingDto, studio: StudioDto) => formatStudioRange(new Date(b.startsAt), new Date(b.endsAt), studio.timeZone);

export function bookingConfirmedEmail(p: { studio: StudioDto; booking: BookingDto; to: string; appUrl: string }): OutgoingEmail {
  const b = p.booking;
  const ics = buildCalendar({
    name: `${p.studio.name} — ${b.room.name}`,
    productName: p.studio.name,
    publish: true,
    events: [{ uid: bookingUid(b.id, p.appUrl), startsAt: new Date(b.startsAt), endsAt: new Date(b.endsAt), summary: `${b.room.name} at ${p.studio.name}`, location: `${p.studio.name}, ${b.room.name}`, description: b.title ?? undefined }],
  });
  const email = composeEmail({
    template: "booking_confirmed",
    to: p.to,
    studioName: p.studio.name,
    subject: `Booking confirmed: ${b.room.name}, ${when(b, p.studio)}`,
    greeting: `Hello ${b.client.name},`,
    paragraphs: [
      `Your session in ${b.room.name} is confirmed for ${when(b, p.studio)} (${p.studio.timeZone}).`,
      `Quoted price: ${formatMoney(b.quoteTotalCents, p.studio.currency)}; deposit ${formatMoney(b.depositRequiredCents, p.studio.currency)}${b.depositReceivedAt ? " (received, thank you)" : ""}.`,
      b.engineers.length ? `Engineer${b.engineers.length > 1 ? "s" : ""}: ${b.engineers.map((e) => e.name).join(", ")}.` : "No house engineer is booked for this session.",
      "The attached calendar file adds the session to your calendar.",
    ],
  });
  return { ...email, attachments: [{ filename: "session.ics", content: ics, contentType: "text/calendar; charset=utf-8; method=PUBLISH" }] };
}

export const bookingReminderEmail = (p: { studio: StudioDto; booking: BookingDto; to: string; name: string }) =>
  composeEmail({
    template: "booking_reminder",
    to: p.to,
    studioName: p.studio.name,
    subject: `Tomorrow: ${p.booking.room.name}, ${when(p.booking, p.studio)}`,
    greeting: `Hello ${p.name},`,
    paragraphs: [`A reminder: ${p.booking.client.name} is booked in ${p.booking.room.name} ${when(p.booking, p.studio)}.`],
  });

export const holdExpiringEmail = (p: { studio: StudioDto; booking: BookingDto; to: string; name: string }) =>
  composeEmail({
    template: "hold_expiring",
    to: p.to,
    studioName: p.studio.name,
    subject: `Hold lapsing soon: ${p.booking.room.name}, ${when(p.booking, p.studio)}`,
    greeting: `Hello ${p.name},`,
    paragraphs: [
      `The hold for ${p.booking.client.name} in ${p.booking.room.name} ${when(p.booking, p.studio)} lapses on ${formatStudioInstant(new Date(p.booking.holdExpiresAt!), p.studio.timeZone)}.`,
      "Confirm it with a deposit before then to keep the slot; otherwise it is freed for the next hold or booking.",
    ],
  });
