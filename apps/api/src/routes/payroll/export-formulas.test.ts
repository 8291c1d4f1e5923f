// A name that looks like a formula reaches the bookkeeper's spreadsheet as text (OWASP, "CSV Injection":
// a text cell starting with =, +, -, @, tab or CR gets a leading single quote), in both export formats.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import readXlsxFile from "read-excel-file/node";
import { staffProfiles } from "@takeup/db";
import { binaryBody } from "../../test/binary-body.ts";
import { createTestApp, type TestApp } from "../../test/harness.ts";
import { demo } from "../../test/demo.ts";

let t: TestApp;
let books: Awaited<ReturnType<TestApp["signIn"]>>;
let periodId: number;
const hostile = ['=HYPERLINK("http://evil.test","Payslip")', "+1+cmd|' /C calc'!A0", "-2+3", "@SUM(1,2)", "\tTabbed", "\rReturned"];
const staffNames = new Map<string, string>();

beforeAll(async () => {
  t = await createTestApp();
  books = await t.signIn(demo.bookkeeper);
  // Every member of staff gets a hostile name (written straight to the database, as an older
  // version or another tool might have left it).
  const staff = await t.db.select().from(staffProfiles);
  staff.forEach((s, i) => staffNames.set(s.userId, hostile[i % hostile.length]!));
  for (const [userId, name] of staffNames) await t.db.update(staffProfiles).set({ displayName: name }).where(eq(staffProfiles.userId, userId));
  const periods = (await books.get("/api/pay-periods")).body as { id: number }[];
  for (const p of periods) {
    const review = (await books.get(`/api/pay-periods/${p.id}`)).body as { staff: unknown[] };
    if (review.staff.length > 0) {
      periodId = p.id;
      break;
    }
  }
  expect(periodId).toBeDefined();
});
afterAll(() => t.close());

const neutralised = (name: string) => `'${name}`;

describe("payroll exports and formulas", () => {
  it("writes hostile names in the CSV as quoted text, while hours and pay stay numbers", async () => {
    const response = await books.get(`/api/pay-periods/${periodId}/export?format=csv`);
    expect(response.status).toBe(200);
    // A minimal RFC 4180 reader: quoted fields may hold commas, quotes and line breaks.
    const rows: string[][] = [];
    let row: string[] = [];
    let field = "";
    let quoted = false;
    const text = response.text;
    for (let i = 0; i < text.length; i++) {
      const ch = text[i]!;
      if (quoted && ch === '"' && text[i + 1] === '"') {
        field += '"';
        i++;
      } else if (ch === '"') {
        quoted = !quoted;
      } else if (!quoted && ch === ",") {
        row.push(field);
        field = "";
      } else if (!quoted && ch === "\r" && text[i + 1] === "\n") {
        row.push(field);
        rows.push(row);
        row = [];
        field = "";
        i++;
      } else {
        field += ch;
      }
    }
    const body = rows.slice(1);
    expect(body.length).toBeGreaterThan(0);
    for (const r of body) {
      const name = staffNames.get(r[0]!);
      expect(name).toBeDefined();
      expect(r[1]).toBe(neutralised(name!));
      for (const figure of r.slice(4, 8)) expect(figure).toMatch(/^-?\d+\.\d\d$/);
    }
  });

  it("writes hostile names in every XLSX sheet as text starting with a quote, while hours stay numbers", async () => {
    const response = await books.get(`/api/pay-periods/${periodId}/export?format=xlsx`).buffer(true).parse(binaryBody);
    expect(response.status).toBe(200);
    const sheets = (await readXlsxFile(response.body as Buffer)) as unknown as { sheet: string; data: unknown[][] }[];
    const sheet = (name: string) => sheets.find((s) => s.sheet === name)!.data;
    const summary = sheet("Summary");
    const header = summary.findIndex((r) => r[0] === "Staff ID");
    const people = summary.slice(header + 1).filter((r) => r[0] !== "Total");
    expect(people.length).toBeGreaterThan(0);
    for (const r of people) {
      expect(r[1]).toBe(neutralised(staffNames.get(r[0] as string)!));
      expect(typeof r[4]).toBe("number");
      expect(typeof r[13]).toBe("number");
    }
    for (const r of sheet("Daily detail").slice(1)) {
      expect(r[1]).toBe(neutralised(staffNames.get(r[0] as string)!));
      expect(typeof r[4]).toBe("number");
    }
    for (const r of sheet("Entries").slice(1)) expect(r[2]).toBe(neutralised(staffNames.get(r[1] as string)!));
  });
});
