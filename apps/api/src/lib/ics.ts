import ical, { ICalCalendarMethod, ICalEventStatus } from "ical-generator";

export type CalendarEvent = {
  /** Stable across feeds and edits, so calendar apps update the event instead of duplicating it. */
  uid: string;
  startsAt: Date;
  endsAt: Date;
  summary: string;
  description?: string;
  location?: string;
  tentative?: boolean;
  cancelled?: boolean;
  lastModified?: Date;
};

/**
 * An iCalendar (RFC 5545) document built with ical-generator: times in UTC, text escaped and
 * lines folded by the library. `method: "publish"` for e-mailed single events.
 */
export function buildCalendar(input: { name: string; productName: string; events: CalendarEvent[]; publish?: boolean }): string {
  const calendar = ical({
    name: input.name,
    prodId: { company: input.productName, product: "Takeup", language: "EN" },
    ...(input.publish ? { method: ICalCalendarMethod.PUBLISH } : {}),
  });
  for (const event of input.events) {
    calendar.createEvent({
      id: event.uid,
      start: event.startsAt,
      end: event.endsAt,
      stamp: event.lastModified ?? new Date(),
      lastModified: event.lastModified,
      summary: event.summary,
      description: event.description,
      location: event.location,
      status: event.cancelled ? ICalEventStatus.CANCELLED : event.tentative ? ICalEventStatus.TENTATIVE : ICalEventStatus.CONFIRMED,
    });
  }
  return calendar.toString();
}
