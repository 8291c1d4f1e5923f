import { formatMoney } from "../shared/currency.ts";
import type { CalendarPiece, StudioDay } from "./studio-calendar.ts";
import type { LocalTimeWindow } from "./types.ts";
import { localAt } from "../shared/wall-clock.ts";
import { formatDuration } from "../shared/format-units.ts";

export function formatRate(centsPerHour: number, currency: string): string {
  return `${formatMoney(centsPerHour, currency)}/h`;
}

function clock(minute: number): string {
  return `${String(Math.floor(minute / 60)).padStart(2, "0")}:${String(minute % 60).padStart(2, "0")}`;
}

/** 22:00–08:00. */
export function formatWindow(window: LocalTimeWindow): string {
  return `${clock(window.startMinute)}–${clock(window.endMinute)}`;
}

/** "Mon 7 Dec", read in the studio's zone. */
export function dayLabel(day: StudioDay, timeZone: string): string {
  return localAt(day.dayStartMs, timeZone).toFormat("ccc d LLL");
}

/** Wall-clock time of an instant within a day; the day's end reads 24:00 so a span reads 22:00–24:00. */
function clockWithin(ms: number, day: StudioDay, timeZone: string): string {
  return ms === day.dayEndMs ? "24:00" : localAt(ms, timeZone).toFormat("HH:mm");
}

/** Joins touching pieces that pass `keep` and describes them: "Sat 12 Dec 22:00–24:00". */
export function describeSpans(days: readonly StudioDay[], keep: (piece: CalendarPiece) => boolean, timeZone: string): string {
  const parts: string[] = [];
  for (const day of days) {
    const spans: { startMs: number; endMs: number }[] = [];
    for (const piece of day.pieces.filter(keep)) {
      const last = spans.at(-1);
      if (last && last.endMs === piece.startMs) last.endMs = piece.endMs;
      else spans.push({ startMs: piece.startMs, endMs: piece.endMs });
    }
    const text = spans.map((span) => `${clockWithin(span.startMs, day, timeZone)}–${clockWithin(span.endMs, day, timeZone)}`);
    if (text.length > 0) parts.push(`${dayLabel(day, timeZone)} ${text.join(", ")}`);
  }
  return parts.join("; ");
}

/**
 * When the clocks change during the booked part of a day, the wall-clock span and the billed
 * minutes disagree; saying so heads off "04:00 minus 00:00 is 4 hours, not 3".
 */
export function clockChangeNote(day: StudioDay, timeZone: string): string {
  const first = day.pieces[0];
  const last = day.pieces.at(-1);
  if (!first || !last) return "";
  const startOffset = localAt(first.startMs, timeZone).offset;
  const endOffset = localAt(last.endMs === day.dayEndMs ? last.endMs - 60_000 : last.endMs, timeZone).offset;
  if (startOffset === endOffset) return "";
  const direction = endOffset > startOffset ? "forward" : "back";
  return ` The clocks went ${direction} during this day, so ${clockWithin(first.startMs, day, timeZone)}–${clockWithin(last.endMs, day, timeZone)} is ${formatDuration(day.minutes)}.`;
}
