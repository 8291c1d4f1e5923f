import { addIsoDays } from "./ageing.ts";

/** Payment terms: due a number of days after issue ("net 14"), or on receipt (0 days). */
export function dueDate(issuedOn: string, termsDays: number): string {
  if (!Number.isInteger(termsDays) || termsDays < 0 || termsDays > 365) throw new RangeError("Payment terms are 0–365 days");
  return addIsoDays(issuedOn, termsDays);
}

export function termsLabel(termsDays: number): string {
  return termsDays === 0 ? "Due on receipt" : `Due ${termsDays} days after issue`;
}

/**
 * The invoice number, our own format: the series prefix, the year of issue and the sequence
 * padded to four digits, e.g. "WF-2026-0042". Credit notes use their own series ("WF-CN-2026-0003").
 */
export function formatInvoiceNumber(prefix: string, year: number, sequence: number): string {
  if (!Number.isInteger(sequence) || sequence < 1) throw new RangeError("An invoice sequence starts at 1");
  return `${prefix}-${year}-${String(sequence).padStart(4, "0")}`;
}
