import { minorUnits } from "@takeup/domain";

// Forms speak the studio's language (dollars, hours, percent); the API keeps integers
// (cents, minutes, basis points). These are the only places the two meet.

/** "85.50" dollars → 8550 cents (minor units of the currency); null when it is not an amount. */
export function toMinorUnits(amount: string | number, currency: string): number | null {
  const text = String(amount).trim().replace(/,/g, "");
  if (!/^\d+(\.\d+)?$/.test(text)) return null;
  return Math.round(Number(text) * 10 ** minorUnits(currency));
}

/** 8550 cents → "85.50", for prefilling a money field. */
export function fromMinorUnits(amount: number, currency: string): string {
  const digits = minorUnits(currency);
  return (amount / 10 ** digits).toFixed(digits);
}

/** 12.5 % → 1250 basis points. */
export const percentToBp = (percent: number) => Math.round(percent * 100);

/** 1250 basis points → 12.5 (percent). */
export const bpToPercent = (bp: number) => bp / 100;

/** "12.5%": the domain's one wording of basis points. */
export { formatPercent } from "@takeup/domain";

/** 150 minutes → "2.5 h"; 600 → "10 h". */
export const formatHours = (minutes: number) => `${new Intl.NumberFormat("en-US", { maximumFractionDigits: 2 }).format(minutes / 60)} h`;

/** "15, 30" → [15, 30]; null when any part is not a positive number. */
export function parseNumberList(text: string): number[] | null {
  const parts = text
    .split(",")
    .map((part) => part.trim())
    .filter((part) => part !== "");
  const numbers = parts.map(Number);
  return numbers.every((n) => Number.isFinite(n) && n > 0) ? numbers : null;
}
