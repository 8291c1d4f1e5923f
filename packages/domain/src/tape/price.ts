import { divHalfUp } from "./moving-average.ts";

export const priceModes = ["fixed", "markup"] as const;
export type PriceMode = (typeof priceModes)[number];

export type PriceRule = { mode: PriceMode; fixedPriceCents: number | null; markupBp: number | null };

/**
 * Today's sale price of one unit: a fixed price, or the average cost plus a markup in basis
 * points (2,500 bp = 25 %), rounded half up to the cent. Null when a markup has no cost to mark up.
 */
export function salePriceCents(rule: PriceRule, averageCostCents: number): number | null {
  if (rule.mode === "fixed") return rule.fixedPriceCents;
  if (rule.markupBp === null || averageCostCents <= 0) return null;
  return divHalfUp(BigInt(averageCostCents) * BigInt(10_000 + rule.markupBp), 10_000);
}

/** Quantity × unit price, rounded once (the unit is whole cents, so it is exact). */
export const lineAmountCents = (quantity: number, unitPriceCents: number) => quantity * unitPriceCents;

/** Gross margin as a share of the price, in basis points (half up); null when there is no price. */
export function marginBp(priceCents: number | null, costCents: number): number | null {
  if (priceCents === null || priceCents <= 0) return null;
  const margin = priceCents - costCents;
  const sign = margin < 0 ? -1 : 1;
  return sign * divHalfUp(BigInt(Math.abs(margin)) * 10_000n, priceCents);
}
