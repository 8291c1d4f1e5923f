import type { RateLookup } from "./pay-rates.ts";
import { roundPunch, roundToMinute } from "./round-punch.ts";
import { addDays, workdayOf, workdayStart } from "./studio-calendar.ts";
import type { EntryTrace, PayrollSettings, StudioCalendar, TimeEntry, TimeInterval } from "./types.ts";

const minuteMs = 60_000;

/** A continuous stretch of work from one entry inside one workday, before categorising. */
export interface WorkPiece {
  entryId: string;
  staffId: string;
  workday: string;
  start: Date;
  end: Date;
  minutes: number;
  rateCode: string;
  centsPerHour: number;
}

interface Span {
  startMs: number;
  endMs: number;
}

function isValidDate(d: Date): boolean {
  return d instanceof Date && !Number.isNaN(d.getTime());
}

/**
 * Breaks kept where they were taken; a break recorded only as minutes is centred on the
 * entry, the likeliest place for a meal, so a shift crossing midnight loses it on the day
 * it most probably fell in.
 */
function breakSpans(entry: TimeEntry, rounded: Span, timeZone: string): Span[] {
  const breaks = entry.unpaidBreaks;
  const durationMin = (rounded.endMs - rounded.startMs) / minuteMs;
  if (breaks === undefined) return [];
  if (typeof breaks === "number") {
    if (!Number.isInteger(breaks) || breaks < 0 || breaks > durationMin) {
      throw new RangeError(`Entry ${entry.id}: a break of ${breaks} minutes does not fit`);
    }
    const startMs = rounded.startMs + Math.floor((durationMin - breaks) / 2) * minuteMs;
    return breaks === 0 ? [] : [{ startMs, endMs: startMs + breaks * minuteMs }];
  }
  const spans = breaks.map((b: TimeInterval) => {
    if (!isValidDate(b.start) || !isValidDate(b.end) || b.end < b.start) {
      throw new RangeError(`Entry ${entry.id}: a break ends before it starts`);
    }
    if (b.start < entry.start || b.end > entry.end) {
      throw new RangeError(`Entry ${entry.id}: a break lies outside the entry`);
    }
    // Clipped to the rounded punches: a break cannot unpay time the rounding already removed.
    const startMs = Math.max(roundToMinute(b.start, timeZone).getTime(), rounded.startMs);
    const endMs = Math.min(roundToMinute(b.end, timeZone).getTime(), rounded.endMs);
    return { startMs, endMs };
  });
  const merged: Span[] = [];
  for (const span of spans.filter((s) => s.endMs > s.startMs).sort((a, b) => a.startMs - b.startMs)) {
    const last = merged.at(-1);
    if (last && span.startMs <= last.endMs) last.endMs = Math.max(last.endMs, span.endMs);
    else merged.push({ ...span });
  }
  return merged;
}

function subtract(whole: Span, holes: Span[]): Span[] {
  const out: Span[] = [];
  let cursor = whole.startMs;
  for (const hole of holes) {
    if (hole.startMs > cursor) out.push({ startMs: cursor, endMs: hole.startMs });
    cursor = Math.max(cursor, hole.endMs);
  }
  if (whole.endMs > cursor) out.push({ startMs: cursor, endMs: whole.endMs });
  return out;
}

export interface SplitResult {
  trace: EntryTrace;
  pieces: WorkPiece[];
}

/** Rounds an entry's punches, removes its breaks and cuts what is left at workday boundaries. */
export function splitEntry(entry: TimeEntry, settings: PayrollSettings, rateOf: RateLookup): SplitResult {
  if (!isValidDate(entry.start) || !isValidDate(entry.end) || entry.end < entry.start) {
    throw new RangeError(`Entry ${entry.id} ends before it starts`);
  }
  const roundedStart = roundPunch(entry.start, settings.punchRounding, settings.timeZone);
  const roundedEnd = roundPunch(entry.end, settings.punchRounding, settings.timeZone);
  const rounded = { startMs: roundedStart.getTime(), endMs: roundedEnd.getTime() };
  const worked = subtract(rounded, breakSpans(entry, rounded, settings.timeZone));

  const pieces: WorkPiece[] = [];
  for (const span of worked) {
    let workday = workdayOf(new Date(span.startMs), settings);
    let cursor = span.startMs;
    while (cursor < span.endMs) {
      const nextDayMs = workdayStart(addDays(workday, 1), settings).getTime();
      const endMs = Math.min(span.endMs, nextDayMs);
      pieces.push({
        entryId: entry.id,
        staffId: entry.staffId,
        workday,
        start: new Date(cursor),
        end: new Date(endMs),
        minutes: (endMs - cursor) / minuteMs,
        rateCode: entry.rateCode,
        centsPerHour: rateOf(entry.staffId, entry.rateCode, workday),
      });
      cursor = endMs;
      workday = addDays(workday, 1);
    }
  }
  const workedMinutes = pieces.reduce((sum, p) => sum + p.minutes, 0);
  const durationMinutes = (rounded.endMs - rounded.startMs) / minuteMs;
  return {
    trace: {
      entryId: entry.id,
      staffId: entry.staffId,
      punchedStart: entry.start,
      punchedEnd: entry.end,
      roundedStart,
      roundedEnd,
      breakMinutes: durationMinutes - workedMinutes,
      workedMinutes,
    },
    pieces,
  };
}

/**
 * Clocked minutes per workday as punched (no rounding, breaks removed), for the clock's
 * "week so far": a shift past midnight counts on each day it touched, as payroll splits it.
 */
export function clockedMinutesByWorkday(entry: TimeEntry, calendar: StudioCalendar): Map<string, number> {
  const settings: PayrollSettings = { ...calendar, punchRounding: "none", overtimeRules: "federal_weekly" };
  const byDay = new Map<string, number>();
  for (const piece of splitEntry(entry, settings, () => 0).pieces) byDay.set(piece.workday, (byDay.get(piece.workday) ?? 0) + piece.minutes);
  return byDay;
}
