import { offsetMinutesAt } from "../shared/zone-offset.ts";
import type { PunchRounding } from "./types.ts";

const minuteMs = 60_000;

const gridMinutes: Record<PunchRounding, number> = { none: 1, "5": 5, "6": 6, "15": 15 };

/**
 * Rounds a punch to the nearest point of the studio's grid (29 CFR 785.48(b)).
 *
 * The grid is laid on local wall time, not UTC, because a zone whose offset is not a whole
 * number of grid steps (e.g. +5:45 with tenths of an hour) would otherwise round 8:03 local
 * to somewhere other than 8:00 or 8:06.
 *
 * Tie policy: a punch exactly half-way between two grid points rounds to the later one.
 * Rounding then never moves an earlier punch past a later one (entries cannot be made to
 * overlap), and over time a tie at clock-in (costs the employee) is offset by a tie at
 * clock-out (pays the employee), as 785.48(b) requires rounding to average out.
 * With "none" the punch still lands on the whole minute, seconds rounding the same way.
 */
export function roundPunch(at: Date, rounding: PunchRounding, timeZone: string): Date {
  const instantMs = at.getTime();
  if (!Number.isFinite(instantMs)) throw new RangeError(`Cannot read ${String(at)} in ${timeZone}`);
  const stepMs = gridMinutes[rounding] * minuteMs;
  const wallMs = instantMs + offsetMinutesAt(instantMs, timeZone) * minuteMs;
  const past = ((wallMs % stepMs) + stepMs) % stepMs;
  if (past === 0) return new Date(instantMs);
  return new Date(past * 2 >= stepMs ? instantMs - past + stepMs : instantMs - past);
}

/** Rounds to the whole minute only; used for break intervals, which are not put on the grid. */
export function roundToMinute(at: Date, timeZone: string): Date {
  return roundPunch(at, "none", timeZone);
}
