// Opens a written workbook with exceljs's streaming reader, as a bookkeeper's spreadsheet would
// have to: sheet names, rows per sheet, the summary's total row, and the Entries rows paid nothing.
import ExcelJS from "exceljs";

export type SheetReadBack = { name: string; rows: number; lastRow: number };
export type ReadBack = { sheets: SheetReadBack[]; totalGross: unknown; zeroHourEntries: number; roundsToNothingNotes: number };

export async function readBackWorkbook(file: string): Promise<ReadBack> {
  const reader = new ExcelJS.stream.xlsx.WorkbookReader(file, { worksheets: "emit", sharedStrings: "cache", hyperlinks: "ignore", styles: "ignore", entries: "ignore" });
  const result: ReadBack = { sheets: [], totalGross: null, zeroHourEntries: 0, roundsToNothingNotes: 0 };
  for await (const sheet of reader) {
    // The reader names a sheet once it has read workbook.xml, which the writer puts after the sheets.
    const name = (sheet as unknown as { name?: string }).name ?? "(unnamed)";
    let rows = 0;
    let lastRow = 0;
    for await (const row of sheet) {
      rows++;
      lastRow = row.number;
      if (name === "Summary" && row.getCell(1).value === "Total") result.totalGross = row.getCell(14).value;
      if (name === "Entries" && row.number > 1) {
        if (row.getCell(12).value === 0) result.zeroHourEntries++;
        if (String(row.getCell(14).value ?? "").startsWith("Rounds to no paid time")) result.roundsToNothingNotes++;
      }
    }
    result.sheets.push({ name, rows, lastRow });
  }
  return result;
}

/** The workbook must hold the sheets and rows the period computed, and the summary's gross total. */
export function checkReadBack(readBack: ReadBack, expectedLastRows: Record<string, number>, grossCents: number, noPaidTime: number) {
  const names = readBack.sheets.map((s) => s.name).join(", ");
  if (names !== Object.keys(expectedLastRows).join(", ")) throw new Error(`the workbook read back has the sheets ${names}`);
  for (const sheet of readBack.sheets) {
    if (sheet.lastRow !== expectedLastRows[sheet.name]) throw new Error(`the ${sheet.name} sheet ends on row ${sheet.lastRow}, expected ${expectedLastRows[sheet.name]}`);
  }
  // Every row of the Entries sheet is filled, so its count must match its last row.
  const entries = readBack.sheets.find((s) => s.name === "Entries")!;
  if (entries.rows !== entries.lastRow) throw new Error(`the Entries sheet has ${entries.rows} rows, expected ${entries.lastRow}`);
  if (readBack.zeroHourEntries !== noPaidTime) throw new Error(`the Entries sheet has ${readBack.zeroHourEntries} rows of 0 hours, expected ${noPaidTime}`);
  if (readBack.totalGross !== grossCents / 100) throw new Error(`the summary's gross total reads ${String(readBack.totalGross)}, expected ${grossCents / 100}`);
}
