/** "1,234.5" → 123450 minor units (two decimals); null when it is not an amount. */
export function parseMoney(text: string): number | null {
  const clean = text.replace(/[,\s$£€]/g, "");
  if (!/^\d{1,9}(\.\d{1,2})?$/.test(clean)) return null;
  const [whole, fraction = ""] = clean.split(".");
  return Number(whole) * 100 + Number(fraction.padEnd(2, "0"));
}
