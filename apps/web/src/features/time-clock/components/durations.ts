import { formatDuration } from "@takeup/domain";

/** Worked time as people say it: 3 h 12 min, 41 h 30 min, 8 h, 45 min. */
export const formatWorked = (minutes: number): string => formatDuration(Math.max(0, Math.round(minutes)));

/** Minutes between two instants, less the breaks inside, up to `now` for anything still running. */
export function workedMinutesSoFar(
  startedAt: string,
  breaks: readonly { startedAt: string; endedAt: string | null }[],
  now: number,
): number {
  const breakMs = breaks.reduce((sum, b) => sum + Math.max(0, (b.endedAt ? Date.parse(b.endedAt) : now) - Date.parse(b.startedAt)), 0);
  return Math.max(0, Math.floor((now - Date.parse(startedAt) - breakMs) / 60_000));
}

/** Total minutes of the breaks that have ended. */
export const breakMinutes = (breaks: readonly { startedAt: string; endedAt: string | null }[], now = Date.now()) =>
  Math.round(breaks.reduce((sum, b) => sum + Math.max(0, (b.endedAt ? Date.parse(b.endedAt) : now) - Date.parse(b.startedAt)), 0) / 60_000);
