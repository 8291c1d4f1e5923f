import type { DateTime } from "luxon";
import type { LocalTimeWindow } from "./types.ts";
import { isoDate, localAt, minuteOfDay, minuteMs, nextDayStart, offsetChanges, offsetsDuring, wallClockInstants } from "../shared/wall-clock.ts";

/** A stretch of booked time during which nothing that matters to the price changes. */
export interface CalendarPiece {
  startMs: number;
  endMs: number;
  minutes: number;
  afterHours: boolean;
  weekend: boolean;
}

/** The booked part of one studio-calendar day (a local date in the studio's zone). */
export interface StudioDay {
  /** ISO date, e.g. "2026-12-07". */
  date: string;
  /** Where this local day starts and ends, as instants (23 or 25 hours apart on change days). */
  dayStartMs: number;
  dayEndMs: number;
  minutes: number;
  pieces: CalendarPiece[];
}

export function isInWindow(minute: number, window: LocalTimeWindow): boolean {
  const { startMinute, endMinute } = window;
  if (startMinute === endMinute) return false;
  return startMinute < endMinute ? minute >= startMinute && minute < endMinute : minute >= startMinute || minute < endMinute;
}

/** Every instant during one local day at which the price could change: midnight, the window's edges, offset changes. */
function cutsForDay(dayStart: DateTime, dayEnd: DateTime, window: LocalTimeWindow, timeZone: string): number[] {
  const changes = offsetChanges(dayStart.toMillis(), dayEnd.toMillis(), timeZone);
  const offsets = offsetsDuring(dayStart, dayEnd, timeZone, changes);
  const edges = [window.startMinute, window.endMinute].filter((minute) => minute > 0 && minute < 1440);
  return [dayStart.toMillis(), ...changes, ...edges.flatMap((minute) => wallClockInstants(dayStart, minute, offsets, timeZone))];
}

function pieceAt(startMs: number, endMs: number, window: LocalTimeWindow, timeZone: string): CalendarPiece {
  // No cut falls inside a piece, so its first minute speaks for all of it.
  const local = localAt(startMs, timeZone);
  return {
    startMs,
    endMs,
    minutes: Math.round((endMs - startMs) / minuteMs),
    afterHours: isInWindow(minuteOfDay(local), window),
    weekend: local.weekday >= 6,
  };
}

/**
 * Splits [startMs, endMs) into studio days and, within each, into pieces that are wholly in
 * or out of the after-hours window and the weekend. Minutes are elapsed minutes, so a
 * spring-forward night really is an hour shorter.
 */
export function studioDays(startMs: number, endMs: number, window: LocalTimeWindow, timeZone: string): StudioDay[] {
  const days: StudioDay[] = [];
  let dayStart = localAt(startMs, timeZone).startOf("day");
  while (dayStart.toMillis() < endMs) {
    const dayEnd = nextDayStart(dayStart);
    const from = Math.max(startMs, dayStart.toMillis());
    const to = Math.min(endMs, dayEnd.toMillis());
    const cuts = [...new Set([from, to, ...cutsForDay(dayStart, dayEnd, window, timeZone)])]
      .filter((ms) => ms >= from && ms <= to)
      .sort((a, b) => a - b);
    const pieces = cuts.slice(1).map((cutEnd, index) => pieceAt(cuts[index] ?? from, cutEnd, window, timeZone));
    days.push({
      date: isoDate(dayStart),
      dayStartMs: dayStart.toMillis(),
      dayEndMs: dayEnd.toMillis(),
      minutes: pieces.reduce((sum, piece) => sum + piece.minutes, 0),
      pieces,
    });
    dayStart = dayEnd;
  }
  return days;
}
