import type { WorkPiece } from "./split-entries.ts";
import { addDays } from "./studio-calendar.ts";
import type { Allocation, AllocationReason, OvertimeRuleSet, PayCategory } from "./types.ts";

const minuteMs = 60_000;
const weeklyLimitMinutes = 40 * 60;
const dailyLimitMinutes = 8 * 60;
const dailyDoubleMinutes = 12 * 60;

interface Band {
  /** Minutes already counted (in the day or week) at which this band begins. */
  from: number;
  category: PayCategory;
  reason: AllocationReason;
}

function slice(piece: WorkPiece, fromMin: number, toMin: number, band: Band): Allocation {
  return {
    entryId: piece.entryId,
    workday: piece.workday,
    start: new Date(piece.start.getTime() + fromMin * minuteMs),
    end: new Date(piece.start.getTime() + toMin * minuteMs),
    minutes: toMin - fromMin,
    rateCode: piece.rateCode,
    centsPerHour: piece.centsPerHour,
    category: band.category,
    reason: band.reason,
  };
}

/**
 * Lays chronological pieces along a running count and cuts them where a band begins, so
 * the minutes past a limit are the last ones worked — the ones that crossed it.
 */
function applyBands(pieces: readonly WorkPiece[], bands: readonly Band[]): Allocation[] {
  const out: Allocation[] = [];
  let counted = 0;
  for (const piece of pieces) {
    let used = 0;
    while (used < piece.minutes) {
      const position = counted + used;
      const index = bands.findLastIndex((b) => b.from <= position);
      const band = bands[index];
      if (!band) throw new RangeError("Bands must begin at minute 0");
      const next = bands[index + 1];
      const take = Math.min(piece.minutes - used, next ? next.from - position : Infinity);
      out.push(slice(piece, used, used + take, band));
      used += take;
    }
    counted += piece.minutes;
  }
  return out;
}

const weekBands: Band[] = [
  { from: 0, category: "regular", reason: "within_limits" },
  { from: weeklyLimitMinutes, category: "overtime", reason: "over_40_in_workweek" },
];

const ordinaryDayBands: Band[] = [
  { from: 0, category: "regular", reason: "within_limits" },
  { from: dailyLimitMinutes, category: "overtime", reason: "over_8_in_workday" },
  { from: dailyDoubleMinutes, category: "double_time", reason: "over_12_in_workday" },
];

const seventhDayBands: Band[] = [
  { from: 0, category: "overtime", reason: "seventh_day_first_8" },
  { from: dailyLimitMinutes, category: "double_time", reason: "seventh_day_over_8" },
];

/** Turns an allocation back into a piece so a later pass can cut it again. */
function asPiece(a: Allocation, staffId: string): WorkPiece {
  const { entryId, workday, start, end, minutes, rateCode, centsPerHour } = a;
  return { entryId, staffId, workday, start, end, minutes, rateCode, centsPerHour };
}

export interface WeekAllocation {
  allocations: Allocation[];
  seventhDayRuleApplied: boolean;
}

/**
 * Categorises one employee's workweek. `pieces` must be that week's pieces, in time order,
 * not overlapping. See docs/payroll-rules.md for the worked seventh-day case.
 */
export function allocateWorkweek(
  pieces: readonly WorkPiece[],
  workweekStart: string,
  rules: OvertimeRuleSet,
): WeekAllocation {
  if (rules === "federal_weekly") {
    return { allocations: applyBands(pieces, weekBands), seventhDayRuleApplied: false };
  }
  const daysWorked = new Set(pieces.filter((p) => p.minutes > 0).map((p) => p.workday));
  // Only the seventh day *of the workweek*, after work on each of the six before it, counts;
  // a run of days that crosses into the next workweek does not.
  const seventhDay = daysWorked.size === 7 ? addDays(workweekStart, 6) : null;

  const daily: Allocation[] = [];
  for (const day of [...daysWorked].sort()) {
    const ofDay = pieces.filter((p) => p.workday === day);
    daily.push(...applyBands(ofDay, day === seventhDay ? seventhDayBands : ordinaryDayBands));
  }
  daily.sort((a, b) => a.start.getTime() - b.start.getTime());

  // Daily premium minutes stay as they are and never count toward the weekly 40: only
  // the minutes still regular after the daily pass are laid along the week.
  const staffId = pieces[0]?.staffId ?? "";
  const stillRegular = daily.filter((a) => a.category === "regular").map((a) => asPiece(a, staffId));
  const weekly = applyBands(stillRegular, weekBands);
  const allocations = [...daily.filter((a) => a.category !== "regular"), ...weekly].sort(
    (a, b) => a.start.getTime() - b.start.getTime(),
  );
  return { allocations, seventhDayRuleApplied: seventhDay !== null };
}
