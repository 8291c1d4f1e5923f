/**
 * Recorder care: running hours from the sessions a recorder was booked into, and the hours run
 * since the last care event of each kind against the owner's intervals. Tape recorders need their
 * heads cleaned and demagnetised and their alignment checked every so many running hours
 * [common practice; intervals vary by studio and machine — they are the owner's settings].
 */
export const careKinds = ["alignment", "cleaning", "repair"] as const;
export type CareKind = (typeof careKinds)[number];
export const careKindLabels: Record<CareKind, string> = { alignment: "Alignment", cleaning: "Head cleaning and demagnetising", repair: "Repair" };

/** The kinds that come round at an interval (a repair does not). */
export const intervalKinds = ["alignment", "cleaning"] as const;
export type IntervalKind = (typeof intervalKinds)[number];
export type CareIntervals = Record<IntervalKind, number>;

/** The owner's starting intervals in running hours [common practice, the owner changes them]. */
export const defaultCareIntervals: CareIntervals = { alignment: 100, cleaning: 10 };

export type SessionTimes = { bookedStart: Date; bookedEnd: Date; actualStart?: Date | null; actualEnd?: Date | null };
export type Run = { start: Date; end: Date };

/** A wrapped session ran from its actual start to its actual wrap; without both, its booked times. */
export function sessionRun(s: SessionTimes): Run {
  if (s.actualStart && s.actualEnd && s.actualEnd > s.actualStart) return { start: s.actualStart, end: s.actualEnd };
  return { start: s.bookedStart, end: s.bookedEnd };
}

/** Hours of running between `from` (or ever) and `to`; a run that straddles an edge counts its part inside. */
export function runningHours(runs: Run[], to: Date, from?: Date | null): number {
  let ms = 0;
  for (const run of runs) {
    const start = Math.max(run.start.getTime(), from ? from.getTime() : -Infinity);
    const end = Math.min(run.end.getTime(), to.getTime());
    if (end > start) ms += end - start;
  }
  return Math.round((ms / 3_600_000) * 10) / 10;
}

export type CareEvent = { kind: CareKind; at: Date };
export type CareStanding = { kind: CareKind; lastAt: Date | null; hoursSince: number; intervalHours: number | null; due: boolean };

/** Where a recorder stands for each kind of care as of `now`. */
export function careStanding(input: { runs: Run[]; events: CareEvent[]; intervals: CareIntervals; now: Date }): CareStanding[] {
  return careKinds.map((kind) => {
    const last = input.events.filter((e) => e.kind === kind && e.at <= input.now).sort((a, b) => b.at.getTime() - a.at.getTime())[0];
    const hoursSince = runningHours(input.runs, input.now, last?.at ?? null);
    const intervalHours = kind === "repair" ? null : input.intervals[kind];
    return { kind, lastAt: last?.at ?? null, hoursSince, intervalHours, due: intervalHours !== null && hoursSince >= intervalHours };
  });
}

/**
 * Booked sessions ahead (in start order) that would take the recorder past its alignment interval:
 * each is returned with the running hours since alignment its end would reach.
 */
export function sessionsPastAlignment<T extends { start: Date; end: Date }>(input: { hoursSinceAlignment: number; intervalHours: number; upcoming: T[] }): { session: T; hoursAtEnd: number }[] {
  let hours = input.hoursSinceAlignment;
  const past: { session: T; hoursAtEnd: number }[] = [];
  for (const session of [...input.upcoming].sort((a, b) => a.start.getTime() - b.start.getTime())) {
    hours += Math.max(0, session.end.getTime() - session.start.getTime()) / 3_600_000;
    if (hours > input.intervalHours) past.push({ session, hoursAtEnd: Math.round(hours * 10) / 10 });
  }
  return past;
}
