/**
 * The tape planner: how many reels a project needs and which takes go on which reel.
 *
 * Running time of a reel [S, physics]: feet = in/s × seconds ÷ 12, so minutes = feet ÷ (5 × in/s).
 * A head-and-tail allowance (leader, run-up, the tail left on the reel) comes off each reel.
 * Takes are laid out first-fit decreasing: longest take first, each onto the first reel with
 * room, a new reel when none has room; no take is ever split across reels. First-fit
 * decreasing is not always optimal, but it never uses more than 11/9 × the optimum + 6/9 reels
 * (Dósa 2007, from memory), and never fewer than the total time ÷ the usable time per reel, rounded up.
 */

/** Speeds a studio tape recorder commonly runs at, in inches per second. */
export const studioSpeedsIps = [7.5, 15, 30] as const;
export const defaultAllowanceMinutes = 1;

export type PlanSong = { title?: string; minutes: number; takes: number };
export type PlanInput = {
  songs: PlanSong[];
  speedIps: number;
  reelLengthFt: number;
  allowanceMinutes?: number;
  /** The recorder's other speeds, for the alternatives; the common studio speeds when absent. */
  otherSpeedsIps?: readonly number[];
};
export type PlannedReel = { songs: { title: string; takes: number }[]; minutesUsed: number };
export type PlanAlternative = { speedIps: number; minutesPerReel: number; reelsNeeded: number | null; note: string };
export type TapePlan = {
  /** Raw running time of one reel at this speed. */
  reelMinutes: number;
  /** What is usable after the allowance. */
  minutesPerReel: number;
  totalMinutes: number;
  reelsNeeded: number;
  reels: PlannedReel[];
  alternatives: PlanAlternative[];
};

export class TapePlanError extends Error {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(message);
    this.name = "TapePlanError";
  }
}

// Minutes are decimals (4.5, 33⅓); sums are compared with a little slack for binary fractions.
const slack = 1e-9;
const round2 = (n: number) => Math.round(n * 100) / 100;

/** Running minutes of `feet` of tape at `speedIps`. */
export const reelMinutes = (feet: number, speedIps: number) => feet / (5 * speedIps);

/** Feet of tape `minutes` take at `speedIps` (the same rule turned round). */
export const feetFor = (minutes: number, speedIps: number) => minutes * 5 * speedIps;

export function usableMinutes(feet: number, speedIps: number, allowanceMinutes = defaultAllowanceMinutes) {
  return reelMinutes(feet, speedIps) - allowanceMinutes;
}

const titleOf = (song: PlanSong, index: number) => song.title?.trim() || `Song ${index + 1}`;

type Take = { song: number; minutes: number };

/** First-fit decreasing; throws when a take is longer than a reel holds. */
function layOut(songs: PlanSong[], capacity: number, speedIps: number): { reels: { takes: Take[]; used: number }[] } {
  songs.forEach((song, i) => {
    if (song.takes > 0 && song.minutes > capacity + slack) {
      throw new TapePlanError(
        `songs.${i}.minutes`,
        `“${titleOf(song, i)}” runs ${round2(song.minutes)} min, longer than the ${round2(capacity)} usable minutes of one reel at ${speedIps} in/s`,
      );
    }
  });
  const takes: Take[] = songs.flatMap((song, i) => Array.from({ length: song.takes }, () => ({ song: i, minutes: song.minutes })));
  // Stable sort: equal takes keep the songs' order.
  takes.sort((a, b) => b.minutes - a.minutes);
  // First fit through a max-tree of the room left on each reel (reels not yet opened have a whole
  // reel's room), so finding the leftmost reel with room costs log(reels), not a scan.
  let size = 1;
  while (size < Math.max(1, takes.length)) size *= 2;
  const room = new Float64Array(2 * size).fill(capacity);
  const reels: { takes: Take[]; used: number }[] = [];
  for (const take of takes) {
    let node = 1;
    while (node < size) node = room[2 * node]! + slack >= take.minutes ? 2 * node : 2 * node + 1;
    const index = node - size;
    const reel = (reels[index] ??= { takes: [], used: 0 });
    reel.takes.push(take);
    reel.used += take.minutes;
    room[node] = capacity - reel.used;
    for (node >>= 1; node >= 1; node >>= 1) room[node] = Math.max(room[2 * node]!, room[2 * node + 1]!);
  }
  return { reels };
}

function checkInput(input: PlanInput, allowance: number) {
  if (!(input.speedIps > 0)) throw new TapePlanError("speedIps", "Choose a tape speed above zero");
  if (!(input.reelLengthFt > 0)) throw new TapePlanError("reelLengthFt", "Choose a reel length above zero");
  if (!(allowance >= 0)) throw new TapePlanError("allowanceMinutes", "The allowance is zero minutes or more");
  if (usableMinutes(input.reelLengthFt, input.speedIps, allowance) <= 0) {
    throw new TapePlanError("allowanceMinutes", `The allowance takes up the whole reel at ${input.speedIps} in/s`);
  }
  input.songs.forEach((song, i) => {
    if (!(song.minutes > 0)) throw new TapePlanError(`songs.${i}.minutes`, `“${titleOf(song, i)}” needs a length above zero`);
    if (!Number.isInteger(song.takes) || song.takes < 0) throw new TapePlanError(`songs.${i}.takes`, `“${titleOf(song, i)}” needs a whole number of takes`);
  });
}

export function planTape(input: PlanInput): TapePlan {
  const allowance = input.allowanceMinutes ?? defaultAllowanceMinutes;
  checkInput(input, allowance);
  const capacity = usableMinutes(input.reelLengthFt, input.speedIps, allowance);
  const { reels } = layOut(input.songs, capacity, input.speedIps);
  const totalMinutes = input.songs.reduce((sum, s) => sum + s.minutes * s.takes, 0);
  const planned: PlannedReel[] = reels.map((reel) => {
    const counts = new Map<number, number>();
    for (const take of reel.takes) counts.set(take.song, (counts.get(take.song) ?? 0) + 1);
    return {
      songs: [...counts.entries()].sort(([a], [b]) => a - b).map(([song, takes]) => ({ title: titleOf(input.songs[song]!, song), takes })),
      minutesUsed: round2(reel.used),
    };
  });
  const others = (input.otherSpeedsIps ?? studioSpeedsIps).filter((s) => s > 0 && s !== input.speedIps);
  const alternatives = [...new Set(others)].sort((a, b) => a - b).map((speedIps): PlanAlternative => {
    const perReel = usableMinutes(input.reelLengthFt, speedIps, allowance);
    const base = { speedIps, minutesPerReel: round2(Math.max(0, perReel)) };
    if (perReel <= 0) return { ...base, reelsNeeded: null, note: "The allowance takes up the whole reel" };
    try {
      const count = layOut(input.songs, perReel, speedIps).reels.length;
      const tone = speedIps < input.speedIps ? "more time per reel, more hiss" : speedIps > input.speedIps ? "less time per reel, less hiss" : "";
      return { ...base, reelsNeeded: count, note: tone };
    } catch (error) {
      if (error instanceof TapePlanError) return { ...base, reelsNeeded: null, note: error.message };
      throw error;
    }
  });
  return {
    reelMinutes: round2(reelMinutes(input.reelLengthFt, input.speedIps)),
    minutesPerReel: round2(capacity),
    totalMinutes: round2(totalMinutes),
    reelsNeeded: planned.length,
    reels: planned,
    alternatives,
  };
}
