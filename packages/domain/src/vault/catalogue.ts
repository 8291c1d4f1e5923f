/** Where a reel stands: on its shelf, out of the vault for a while, or handed back to its owner for good. */
export const reelStatuses = ["in_vault", "checked_out", "released"] as const;
export type ReelStatus = (typeof reelStatuses)[number];
export const reelStatusLabels: Record<ReelStatus, string> = { in_vault: "In the vault", checked_out: "Checked out", released: "Released to owner" };

/** Whether noise reduction was used while recording: we keep the fact, not a system's name. */
export const noiseReductions = ["none", "encoded"] as const;
export type NoiseReduction = (typeof noiseReductions)[number];

export const reelMovementKinds = ["check_out", "check_in", "release"] as const;
export type ReelMovementKind = (typeof reelMovementKinds)[number];
export const reelMovementLabels: Record<ReelMovementKind, string> = { check_out: "Checked out", check_in: "Checked in", release: "Released to owner" };
