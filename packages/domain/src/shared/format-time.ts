import { DateTime } from "luxon";

/** "Mon 7 Dec 10:00–13:00" in the studio's time zone (the end's date is shown when it differs). */
export function formatStudioRange(startsAt: Date, endsAt: Date, timeZone: string): string {
  const start = DateTime.fromJSDate(startsAt, { zone: timeZone });
  const end = DateTime.fromJSDate(endsAt, { zone: timeZone });
  const sameDay = start.toISODate() === end.toISODate();
  return `${start.toFormat("ccc d LLL HH:mm")}–${end.toFormat(sameDay ? "HH:mm" : "ccc d LLL HH:mm")}`;
}

/** "Thu 10 Dec 2026, 14:00" in the studio's time zone. */
export function formatStudioInstant(at: Date, timeZone: string): string {
  return DateTime.fromJSDate(at, { zone: timeZone }).toFormat("ccc d LLL yyyy, HH:mm");
}
