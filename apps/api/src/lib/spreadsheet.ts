// The one place exports write cells: every CSV line and every XLSX row goes through here, so a name
// like "=HYPERLINK(…)" arrives in the bookkeeper's spreadsheet as text, not as a formula.
import type ExcelJS from "exceljs";

/**
 * OWASP's CSV-injection guidance: a text cell that starts with =, +, -, @, tab or carriage
 * return may be read as a formula, so it is prefixed with a single quote. Numbers stay numbers,
 * and text that is just a number ("-5.00" written by toFixed) is a number to the reader too.
 */
const formulaStart = /^[=+\-@\t\r]/;
const plainNumber = /^[+-]?(\d+(\.\d*)?|\.\d+)$/;

export function neutraliseFormula<T>(value: T): T | string {
  return typeof value === "string" && formulaStart.test(value) && !plainNumber.test(value) ? `'${value}` : value;
}

/** A CSV field (RFC 4180: quoted when it holds a comma, quote or line break), neutralised first. */
export function csvField(value: unknown): string {
  const text = String(neutraliseFormula(value ?? ""));
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** A whole CSV document: CRLF line ends, a final CRLF. */
export function toCsv(lines: readonly (readonly unknown[])[]): string {
  return lines.map((line) => line.map(csvField).join(",")).join("\r\n") + "\r\n";
}

type RowValues = Record<string, unknown> | unknown[];

/** Adds a row of data to a sheet with every text cell neutralised. */
export function addSafeRow(sheet: ExcelJS.Worksheet, values: RowValues): ExcelJS.Row {
  const safe = Array.isArray(values)
    ? values.map(neutraliseFormula)
    : Object.fromEntries(Object.entries(values).map(([key, value]) => [key, neutraliseFormula(value)]));
  // eslint-disable-next-line no-restricted-syntax -- the one call that may add rows
  return sheet.addRow(safe);
}
