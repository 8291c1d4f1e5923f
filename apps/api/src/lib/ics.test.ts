import { describe, expect, it } from "vitest";
import ICAL from "ical.js";
import { buildCalendar } from "./ics.ts";

const event = {
  uid: "booking-42@takeup.test",
  startsAt: new Date("2026-12-07T16:00:00Z"),
  endsAt: new Date("2026-12-07T19:00:00Z"),
  summary: "Room A, live; mix",
  description: "Tracking with Lantern Static\nBring the 2-inch reels",
  location: "Wrenfield Sound — Room A",
};

function parse(text: string) {
  const calendar = new ICAL.Component(ICAL.parse(text));
  return { calendar, events: calendar.getAllSubcomponents("vevent") };
}

describe("iCalendar documents (RFC 5545, parsed back with ical.js)", () => {
  const text = buildCalendar({ name: "Room A", productName: "Wrenfield Sound", events: [event] });

  it("carries PRODID and VERSION, and each event a UID and a UTC DTSTAMP (RFC 5545 §3.6.1, §3.7.3, §3.7.4) [S]", () => {
    const { calendar, events } = parse(text);
    expect(calendar.getFirstPropertyValue("version")).toBe("2.0");
    expect(String(calendar.getFirstPropertyValue("prodid"))).toContain("Takeup");
    expect(events).toHaveLength(1);
    expect(events[0]!.getFirstPropertyValue("uid")).toBe("booking-42@takeup.test");
    expect(text).toMatch(/DTSTAMP:\d{8}T\d{6}Z/);
  });

  it("gives start and end as UTC times, and never DTEND with DURATION (RFC 5545 §3.6.1) [S]", () => {
    const vevent = new ICAL.Event(parse(text).events[0]!);
    expect(vevent.startDate.toJSDate().toISOString()).toBe("2026-12-07T16:00:00.000Z");
    expect(vevent.endDate.toJSDate().toISOString()).toBe("2026-12-07T19:00:00.000Z");
    expect(text).not.toMatch(/^DURATION/m);
  });

  it("escapes commas and semicolons in TEXT, not colons (RFC 5545 §3.3.11) [D]", () => {
    expect(text).toContain("SUMMARY:Room A\\, live\\; mix");
    expect(new ICAL.Event(parse(text).events[0]!).summary).toBe("Room A, live; mix");
    expect(new ICAL.Event(parse(text).events[0]!).description).toBe("Tracking with Lantern Static\nBring the 2-inch reels");
  });

  it("folds long lines at 75 octets with CRLF and a space, never inside a UTF-8 character (RFC 5545 §3.1) [S]", () => {
    const long = buildCalendar({
      name: "Room A",
      productName: "Wrenfield Sound",
      events: [{ ...event, description: "Überspielung — ".repeat(20) }],
    });
    for (const line of long.split("\r\n")) expect(Buffer.byteLength(line, "utf8")).toBeLessThanOrEqual(75);
    expect(long).toContain("\r\n ");
    expect(new ICAL.Event(parse(long).events[0]!).description).toBe("Überspielung — ".repeat(20));
  });

  it("keeps the same UID when the event is rebuilt, so calendar apps update it", () => {
    const again = buildCalendar({ name: "Room A", productName: "Wrenfield Sound", events: [{ ...event, summary: "Moved" }] });
    expect(parse(again).events[0]!.getFirstPropertyValue("uid")).toBe("booking-42@takeup.test");
  });

  it("marks holds tentative and cancelled bookings cancelled (RFC 5545 §3.8.1.11) [S]", () => {
    const both = buildCalendar({
      name: "Room A",
      productName: "Wrenfield Sound",
      events: [{ ...event, tentative: true }, { ...event, uid: "b-2@takeup.test", cancelled: true }],
    });
    const statuses = parse(both).events.map((e) => e.getFirstPropertyValue("status"));
    expect(statuses).toEqual(["TENTATIVE", "CANCELLED"]);
  });
});
