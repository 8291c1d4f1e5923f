// OWASP, "CSV Injection" (owasp.org/www-community/attacks/CSV_Injection), as stated: prefix cells that
// start with =, +, -, @, tab (0x09) or carriage return (0x0D) with a single quote, and quote fields.
import { describe, expect, it } from "vitest";
import { csvField, neutraliseFormula, toCsv } from "./spreadsheet.ts";

describe("neutraliseFormula", () => {
  it("prefixes text that starts with a formula character with a single quote", () => {
    for (const text of ["=1+2", "+44 20 7946 0000", "-2+3", "@SUM(A1:A9)", "\tTabbed", "\rReturn", '=HYPERLINK("http://x.test","Click")']) {
      expect(neutraliseFormula(text)).toBe(`'${text}`);
    }
  });

  it("leaves ordinary text, numbers and numeric text alone", () => {
    for (const value of ["Priya Oduya", "", " =not first", "2026-01-05", 42, -5, 0.25, "-5.00", "+3", null]) {
      expect(neutraliseFormula(value)).toBe(value);
    }
  });
});

describe("csv", () => {
  it("quotes a neutralised field that holds a comma, quote or line break", () => {
    expect(csvField('=HYPERLINK("a","b")')).toBe(`"'=HYPERLINK(""a"",""b"")"`);
    expect(csvField("\rx")).toBe(`"'\rx"`);
    expect(toCsv([["Name", "Hours"], ["@me", "-1.50"]])).toBe("Name,Hours\r\n'@me,-1.50\r\n");
  });
});
