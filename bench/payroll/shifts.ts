// The synthetic fortnight both cases share: staff with two pay codes (some with a raise part-way
// through), days of session blocks clocked one by one, meal and short breaks, night sessions past
// midnight, some seven-day weeks. The same seed gives the same data in the engine run and in the
// database, so their totals can be compared exactly.
import { addCalendarDays, workdayStart, type PayPeriod, type PayRate, type StudioCalendar, type TimeEntry } from "@takeup/domain";
import { createRandom, type Random } from "../bookings/random.ts";

const second = 1000;
const minute = 60 * second;

export type BenchStaff = { id: string; name: string; primaryCode: "engineer" | "assistant" };
export type BenchEntry = {
  staffId: string;
  rateCode: string;
  kind: "session" | "shop";
  source: "clock" | "manual";
  startMs: number;
  endMs: number;
  breaks: { startMs: number; endMs: number }[];
};
export type BenchFortnight = { staff: BenchStaff[]; payRates: PayRate[]; entries: BenchEntry[] };

const pick = <T>(random: Random, items: readonly T[]): T => items[random.int(items.length)]!;

function shuffled<T>(random: Random, items: readonly T[]): T[] {
  const out = [...items];
  for (let i = out.length - 1; i > 0; i--) {
    const j = random.int(i + 1);
    [out[i], out[j]] = [out[j]!, out[i]!];
  }
  return out;
}

/** Which of a week's seven days someone works: four to seven of them, seven now and then. */
function workedDaysOfWeek(random: Random): number[] {
  const count = pick(random, [4, 5, 5, 5, 6, 6, 7]);
  return shuffled(random, [0, 1, 2, 3, 4, 5, 6]).slice(0, count).sort((a, b) => a - b);
}

/** Local start of a working day, in minutes after the workday begins: mostly mornings, some nights. */
function dayStartMinute(random: Random): number {
  const r = random.next();
  if (r < 0.65) return 8 * 60 + random.int(180);
  if (r < 0.9) return 12 * 60 + random.int(240);
  return 18 * 60 + random.int(240);
}

/** How long a working day lasts: ordinary, long (past 12 h for some), or short. */
function daySpanMinutes(random: Random): number {
  const r = random.next();
  if (r < 0.7) return 360 + random.int(240);
  if (r < 0.85) return 600 + random.int(240);
  return 180 + random.int(180);
}

/**
 * Cuts a day into `count` clocked blocks with small gaps between them, inside `within`: a long
 * night session pushes the next morning back instead of overlapping it, and the last day's work
 * ends with the period, so every entry belongs to it.
 */
function dayEntries(random: Random, person: BenchStaff, dayStartMs: number, within: { fromMs: number; toMs: number }, count: number): BenchEntry[] {
  const plannedStart = Math.max(dayStartMs + dayStartMinute(random) * minute + random.int(60) * second, within.fromMs);
  const span = Math.min(daySpanMinutes(random) * minute, within.toMs - plannedStart);
  if (span < count * 2 * minute) throw new Error(`no room for ${count} entries of ${person.name} on the day from ${new Date(dayStartMs).toISOString()}`);
  const blockWeights = Array.from({ length: count }, () => 1 + random.next());
  const gapWeights = Array.from({ length: count - 1 }, () => random.next() * 0.25);
  const scale = span / [...blockWeights, ...gapWeights].reduce((s, w) => s + w, 0);
  let cursor = plannedStart;
  const entries: BenchEntry[] = [];
  for (let i = 0; i < count; i++) {
    // Whole seconds, so rounding to the grid and to the minute both have work to do.
    const length = Math.max(minute, Math.floor((blockWeights[i]! * scale) / second) * second);
    const primary = random.next() < 0.8;
    entries.push({
      staffId: person.id,
      rateCode: primary ? person.primaryCode : "shop",
      kind: primary && random.next() < 0.7 ? "session" : "shop",
      source: random.next() < 0.97 ? "clock" : "manual",
      startMs: cursor,
      endMs: cursor + length,
      breaks: [],
    });
    cursor += length + Math.floor(((gapWeights[i] ?? 0) * scale) / second) * second;
  }
  addBreaks(random, entries);
  return entries;
}

/** A meal break in the block holding the middle of the day, and a short break in a few others. */
function addBreaks(random: Random, entries: BenchEntry[]) {
  const middle = (entries[0]!.startMs + entries.at(-1)!.endMs) / 2;
  const meal = entries.find((e) => e.endMs > middle) ?? entries.at(-1)!;
  const fits = (e: BenchEntry, length: number) => e.endMs - e.startMs >= length + 20 * minute;
  const place = (e: BenchEntry, length: number) => {
    const room = e.endMs - e.startMs - length - 20 * minute;
    const startMs = e.startMs + 10 * minute + Math.round((random.next() * room) / second) * second;
    e.breaks.push({ startMs, endMs: startMs + length });
  };
  const mealLength = (20 + random.int(26)) * minute;
  if (fits(meal, mealLength)) place(meal, mealLength);
  for (const e of entries) {
    if (e !== meal && random.next() < 0.1 && fits(e, 10 * minute)) place(e, (5 + random.int(6)) * minute);
  }
}

/**
 * `entries / perPerson` people, each with about `perPerson` entries over the fortnight.
 * Pay rates are in cents per hour; a quarter of the staff get a raise on the period's tenth day.
 */
export function generateFortnight(period: PayPeriod, calendar: StudioCalendar, options: { entries: number; perPerson: number; seed?: number }): BenchFortnight {
  const staffCount = options.entries / options.perPerson;
  if (!Number.isInteger(staffCount) || staffCount < 1) throw new Error(`${options.entries} entries do not divide into people of ${options.perPerson}`);
  const days = Array.from({ length: 14 }, (_, i) => addCalendarDays(period.startDate, i));
  const dayStarts = days.map((d) => workdayStart(d, calendar).getTime());
  const raiseDay = days[9]!;
  const staff: BenchStaff[] = [];
  const payRates: PayRate[] = [];
  const entries: BenchEntry[] = [];
  for (let p = 0; p < staffCount; p++) {
    const random = createRandom((options.seed ?? 20300225) + p);
    const person: BenchStaff = { id: `payroll-bench-${String(p + 1).padStart(5, "0")}`, name: `Bench staff ${p + 1}`, primaryCode: p % 3 === 0 ? "assistant" : "engineer" };
    staff.push(person);
    const base = 2000 + random.int(33) * 100;
    payRates.push({ staffId: person.id, rateCode: person.primaryCode, centsPerHour: base, effectiveFrom: "2026-01-01" });
    if (random.next() < 0.25) payRates.push({ staffId: person.id, rateCode: person.primaryCode, centsPerHour: base + 150 + random.int(11) * 25, effectiveFrom: raiseDay });
    payRates.push({ staffId: person.id, rateCode: "shop", centsPerHour: 1800 + random.int(7) * 100, effectiveFrom: "2026-01-01" });

    const worked = [...workedDaysOfWeek(random), ...workedDaysOfWeek(random).map((d) => d + 7)];
    const perDay = Math.floor(options.perPerson / worked.length);
    const extra = new Set(shuffled(random, worked).slice(0, options.perPerson % worked.length));
    let lastEndMs = 0;
    for (const day of worked) {
      const count = perDay + (extra.has(day) ? 1 : 0);
      if (count === 0) continue;
      const ofDay = dayEntries(random, person, dayStarts[day]!, { fromMs: lastEndMs + 30 * minute, toMs: period.end.getTime() }, count);
      lastEndMs = ofDay.at(-1)!.endMs;
      entries.push(...ofDay);
    }
  }
  entries.sort((a, b) => a.startMs - b.startMs);
  return { staff, payRates, entries };
}

/** The engine's input, built the way computePeriod builds it from the stored entries. */
export function engineEntries(entries: readonly BenchEntry[]): TimeEntry[] {
  return entries.map((e, i) => ({
    id: String(i + 1),
    staffId: e.staffId,
    start: new Date(e.startMs),
    end: new Date(e.endMs),
    unpaidBreaks: e.breaks.map((b) => ({ start: new Date(b.startMs), end: new Date(b.endMs) })),
    rateCode: e.rateCode,
  }));
}
