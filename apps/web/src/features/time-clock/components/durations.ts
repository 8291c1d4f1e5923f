/** Worked time as people say it: 3 h 12 min, 41 h 30 min, 8 h, 45 min. */
export function formatWorked(minutes: number): string {
  const total = Math.max(0, Math.round(minutes));
  const hours = Math.floor(total / 60);
  const rest = total % 60;
  if (hours === 0) return `${rest} min`;
  return rest === 0 ? `${hours} h` : `${hours} h ${rest} min`;
}

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
