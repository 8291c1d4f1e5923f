import type { BookingDto, RoomColour } from "@takeup/domain";
import { studioParts } from "../../../lib/studio-time.ts";

export const slotMinutes = 15;
export const slotsPerDay = 1440 / slotMinutes;
/** The day starts at 08:00 on screen unless the night hours are shown. */
export const dayViewStartMinute = 8 * 60;

export type CalendarRoom = { id: number; name: string; colour: RoomColour };

export type CalendarColumn = { index: number; date: string; room: CalendarRoom };

/** A booking's part within one column: where it starts and how long it runs, in minutes of the day. */
export type Segment = {
  booking: BookingDto;
  column: number;
  startMinute: number;
  endMinute: number;
  /** Side by side when bookings overlap in one column (a hold and its second hold). */
  lane: number;
  lanes: number;
};

export function calendarColumns(days: string[], rooms: CalendarRoom[]): CalendarColumn[] {
  return days.flatMap((date, d) => rooms.map((room, r) => ({ index: d * rooms.length + r, date, room })));
}

/**
 * Cuts each booking into the columns it shows in: its room, on each studio day it touches,
 * read on the studio's wall clock (a booking past midnight continues on the next day).
 */
export function layoutSegments(bookings: BookingDto[], columns: CalendarColumn[], timeZone: string, fromMinute: number): Segment[] {
  const byColumn = new Map<number, Segment[]>();
  for (const booking of bookings) {
    const start = studioParts(booking.startsAt, timeZone);
    const end = studioParts(booking.endsAt, timeZone);
    for (const column of columns) {
      if (column.room.id !== booking.room.id) continue;
      if (start.date > column.date || end.date < column.date) continue;
      const startMinute = Math.max(start.date < column.date ? 0 : start.minuteOfDay, fromMinute);
      const endMinute = end.date > column.date ? 1440 : end.minuteOfDay;
      if (endMinute <= startMinute) continue;
      const list = byColumn.get(column.index) ?? [];
      list.push({ booking, column: column.index, startMinute, endMinute, lane: 0, lanes: 1 });
      byColumn.set(column.index, list);
    }
  }
  const segments: Segment[] = [];
  for (const list of byColumn.values()) segments.push(...assignLanes(list));
  return segments;
}

/** Overlapping bookings in a column share its width; each cluster of overlaps is laid out on its own. */
function assignLanes(list: Segment[]): Segment[] {
  const sorted = [...list].sort((a, b) => a.startMinute - b.startMinute || b.endMinute - a.endMinute);
  const out: Segment[] = [];
  let cluster: Segment[] = [];
  let clusterEnd = -1;
  const flush = () => {
    const laneEnds: number[] = [];
    for (const segment of cluster) {
      let lane = laneEnds.findIndex((end) => end <= segment.startMinute);
      if (lane === -1) lane = laneEnds.length;
      laneEnds[lane] = segment.endMinute;
      segment.lane = lane;
    }
    for (const segment of cluster) segment.lanes = laneEnds.length;
    out.push(...cluster);
    cluster = [];
  };
  for (const segment of sorted) {
    if (cluster.length > 0 && segment.startMinute >= clusterEnd) flush();
    cluster.push({ ...segment });
    clusterEnd = Math.max(clusterEnd, segment.endMinute);
  }
  if (cluster.length > 0) flush();
  return out;
}

/** Bookings hidden because they lie wholly in the night hours that are folded away. */
export function countBeforeMinute(bookings: BookingDto[], days: string[], roomIds: Set<number>, timeZone: string, minute: number): number {
  return bookings.filter((booking) => {
    if (!roomIds.has(booking.room.id)) return false;
    const start = studioParts(booking.startsAt, timeZone);
    const end = studioParts(booking.endsAt, timeZone);
    return days.some((date) => {
      if (start.date > date || end.date < date) return false;
      const segStart = start.date < date ? 0 : start.minuteOfDay;
      const segEnd = end.date > date ? 1440 : end.minuteOfDay;
      return segEnd > segStart && segEnd <= minute;
    });
  }).length;
}
