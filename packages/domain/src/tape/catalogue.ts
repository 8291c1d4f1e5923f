/** What tape products come in, and what a stock movement can be. */
export const tapeWidths = ["0.25", "0.5", "1", "2"] as const;
export type TapeWidth = (typeof tapeWidths)[number];
export const tapeWidthLabels: Record<TapeWidth, string> = { "0.25": "1/4 in", "0.5": "1/2 in", "1": "1 in", "2": "2 in" };

export const reelSizes = ["5", "7", "10.5"] as const;
export type ReelSize = (typeof reelSizes)[number];
export const reelSizeLabels: Record<ReelSize, string> = { "5": "5 in reel", "7": "7 in reel", "10.5": "10½ in reel" };

export const tapeTaxCategories = ["goods"] as const;

export const tapeMovementKinds = ["receipt", "sale", "return", "adjustment", "write_off"] as const;
export type TapeMovementKind = (typeof tapeMovementKinds)[number];
export const tapeMovementLabels: Record<TapeMovementKind, string> = {
  receipt: "Received",
  sale: "Sold",
  return: "Returned by client",
  adjustment: "Count adjustment",
  write_off: "Written off",
};
