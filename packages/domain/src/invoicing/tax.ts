import { product, roundHalfUpDiv } from "../shared/money.ts";
import type { TaxCategory } from "./categories.ts";

/**
 * Sales tax and VAT on integer minor units. Rates are parts per million of the net amount
 * (6.25% = 62 500), so rates with up to four decimals of a percent are exact.
 *
 * - `half_up`: every rounded figure is rounded half up, as the Streamlined Sales and Use Tax
 *   Agreement §324 (compute to three decimals, round up when the third is above 4) and HMRC
 *   VATREC12030 (under half a penny down, half or more up) both describe.
 * - `down`: the tax is rounded down to the minor unit, as UK VAT Notice 700 §17.5 allows for
 *   the total VAT of an invoice.
 *
 * `per_line` rounds each line's tax; `per_invoice` rounds once per category rate on the sum of
 * the nets (SSUTA §324 leaves the choice to the seller).
 */
export const taxCalculations = ["per_line", "per_invoice"] as const;
export type TaxCalculation = (typeof taxCalculations)[number];
export const taxRoundings = ["half_up", "down"] as const;
export type TaxRounding = (typeof taxRoundings)[number];

export type TaxRates = Record<TaxCategory, number>;

export const ppmScale = 1_000_000n;

export function taxOn(netMinor: number, ratePpm: number, rounding: TaxRounding): number {
  if (!Number.isSafeInteger(netMinor) || netMinor < 0) throw new RangeError("A taxed amount must be a non-negative whole number of minor units");
  if (!Number.isSafeInteger(ratePpm) || ratePpm < 0) throw new RangeError("A tax rate must be a non-negative whole number of parts per million");
  const exact = product(netMinor, ratePpm);
  return rounding === "half_up" ? roundHalfUpDiv(exact, ppmScale) : Number(exact / ppmScale);
}

export interface TaxedLine {
  category: TaxCategory;
  /** The line's amount after its own and its share of the invoice's discount. */
  netMinor: number;
}

export interface TaxSummaryRow {
  category: TaxCategory;
  ratePpm: number;
  netMinor: number;
  taxMinor: number;
}

export interface TaxResult {
  /** Each line's tax, in line order (per-invoice calculation spreads each category's tax over its lines). */
  lineTaxMinor: number[];
  byCategory: TaxSummaryRow[];
  totalTaxMinor: number;
}

/** The tax on a set of lines under the studio's rates, calculation and rounding. */
export function computeTax(lines: readonly TaxedLine[], rates: TaxRates, calculation: TaxCalculation, rounding: TaxRounding): TaxResult {
  const byCategory = new Map<TaxCategory, TaxSummaryRow>();
  const lineTaxMinor = lines.map(() => 0);
  lines.forEach((line, index) => {
    const ratePpm = rates[line.category];
    const row = byCategory.get(line.category) ?? { category: line.category, ratePpm, netMinor: 0, taxMinor: 0 };
    row.netMinor += line.netMinor;
    if (calculation === "per_line") {
      const tax = taxOn(line.netMinor, ratePpm, rounding);
      lineTaxMinor[index] = tax;
      row.taxMinor += tax;
    }
    byCategory.set(line.category, row);
  });
  if (calculation === "per_invoice") {
    for (const row of byCategory.values()) {
      row.taxMinor = taxOn(row.netMinor, row.ratePpm, rounding);
      // Spread the category's tax over its lines in proportion to their nets, so the lines add up.
      const members = lines.map((line, index) => ({ line, index })).filter(({ line }) => line.category === row.category);
      let runningNet = 0n;
      let given = 0;
      for (const { line, index } of members) {
        runningNet += BigInt(line.netMinor);
        const upTo = row.netMinor === 0 ? 0 : Number((runningNet * BigInt(row.taxMinor)) / BigInt(row.netMinor));
        lineTaxMinor[index] = upTo - given;
        given = upTo;
      }
      if (members.length > 0) lineTaxMinor[members.at(-1)!.index]! += row.taxMinor - given;
    }
  }
  const rows = [...byCategory.values()];
  return { lineTaxMinor, byCategory: rows, totalTaxMinor: rows.reduce((sum, row) => sum + row.taxMinor, 0) };
}

/** "6.25%" from 62 500 parts per million. */
export function formatTaxRate(ratePpm: number): string {
  const whole = Math.floor(ratePpm / 10_000);
  const fraction = String(ratePpm % 10_000).padStart(4, "0").replace(/0+$/, "");
  return fraction ? `${whole}.${fraction}%` : `${whole}%`;
}
