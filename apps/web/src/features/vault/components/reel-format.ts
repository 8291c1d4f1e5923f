import type { ReelSummaryDto } from "@takeup/domain";

const widths: Record<number, string> = { 250: "1/4-inch", 500: "1/2-inch", 1000: "1-inch", 2000: "2-inch" };

/** "24 tracks, 2-inch, 15 in/s" */
export const reelFormat = (r: Pick<ReelSummaryDto, "trackCount" | "tapeWidthMils" | "speedIps">) =>
  `${r.trackCount} ${r.trackCount === 1 ? "track" : "tracks"}, ${widths[r.tapeWidthMils] ?? `${r.tapeWidthMils / 1000}-inch`}, ${r.speedIps} in/s`;
