import { describe, expect, it } from "vitest";
import { computeInvoice, type InvoiceLineInput } from "./totals.ts";
import { computeTax, formatTaxRate, taxOn, type TaxRates } from "./tax.ts";

const rates = (other: number): TaxRates => ({ room: other, engineer: other, tape_goods: other, storage: other, other });
const items = (count: number, unitPriceMinor: number): InvoiceLineInput[] =>
  Array.from({ length: count }, () => ({ category: "other" as const, quantityMilli: 1000, unitPriceMinor }));

describe("sales tax, SSUTA §324 (e.g. RCW 82.08.054), rounded half up", () => {
  it("taxes 3 × $0.99 at 6.25% as $0.06 per item, $0.18 in all, when calculated per line", () => {
    const totals = computeInvoice({ lines: items(3, 99), tax: { rates: rates(62_500), calculation: "per_line", rounding: "half_up" } });
    expect(totals.lines.map((l) => l.taxMinor)).toEqual([6, 6, 6]);
    expect(totals.taxMinor).toBe(18);
  });

  it("taxes 3 × $0.99 at 6.25% as $0.19 when calculated on the invoice", () => {
    const totals = computeInvoice({ lines: items(3, 99), tax: { rates: rates(62_500), calculation: "per_invoice", rounding: "half_up" } });
    expect(totals.taxMinor).toBe(19);
    expect(totals.lines.reduce((sum, l) => sum + l.taxMinor, 0)).toBe(19);
  });

  it("taxes $19.99 at 8.25% as $1.65", () => {
    expect(taxOn(1999, 82_500, "half_up")).toBe(165);
  });
});

describe("VAT, HMRC VATREC12030 and VAT Notice 700 §17.5", () => {
  it("taxes 50 × £1.37 at 20% as £0.27 a line, £13.50 in all, when calculated per line", () => {
    const totals = computeInvoice({ lines: items(50, 137), tax: { rates: rates(200_000), calculation: "per_line", rounding: "half_up" } });
    expect(totals.lines[0]!.taxMinor).toBe(27);
    expect(totals.taxMinor).toBe(1350);
  });

  it("taxes 50 × £1.37 at 20% as £13.70 when calculated on the total", () => {
    const totals = computeInvoice({ lines: items(50, 137), tax: { rates: rates(200_000), calculation: "per_invoice", rounding: "half_up" } });
    expect(totals.taxMinor).toBe(1370);
  });

  it("rounds the VAT on a net £704.88 at 20% (140.976) down to £140.97 under §17.5", () => {
    const result = computeTax([{ category: "other", netMinor: 70_488 }], rates(200_000), "per_invoice", "down");
    expect(result.totalTaxMinor).toBe(14_097);
  });

  it("rounds the VAT on a net £704.88 at 20% (140.976) half up to £140.98", () => {
    expect(taxOn(70_488, 200_000, "half_up")).toBe(14_098);
  });
});

describe("half a minor unit", () => {
  it("rounds 2.5 cents of tax up to 3, where half-to-even would answer 2 ([D] 250 cents at 1%)", () => {
    expect(taxOn(250, 10_000, "half_up")).toBe(3);
    expect(taxOn(250, 10_000, "down")).toBe(2);
  });

  it("rounds 3.5 cents of tax up to 4, where half-to-even would also answer 4 ([D] 350 cents at 1%)", () => {
    expect(taxOn(350, 10_000, "half_up")).toBe(4);
  });
});

describe("tax by category", () => {
  it("taxes only the categories with a rate, e.g. a state rate on tape goods alone ([D] demo value)", () => {
    const totals = computeInvoice({
      lines: [
        { category: "room", quantityMilli: 1000, unitPriceMinor: 85_000 },
        { category: "tape_goods", quantityMilli: 2000, unitPriceMinor: 32_000 },
      ],
      tax: { rates: { room: 0, engineer: 0, tape_goods: 62_500, storage: 0, other: 0 }, calculation: "per_line", rounding: "half_up" },
    });
    expect(totals.lines.map((l) => l.taxMinor)).toEqual([0, 4000]);
    expect(totals.taxRows).toEqual([
      { category: "room", ratePpm: 0, netMinor: 85_000, taxMinor: 0 },
      { category: "tape_goods", ratePpm: 62_500, netMinor: 64_000, taxMinor: 4000 },
    ]);
  });

  it("writes rates as percentages without trailing zeros", () => {
    expect([formatTaxRate(62_500), formatTaxRate(200_000), formatTaxRate(73_750), formatTaxRate(0)]).toEqual(["6.25%", "20%", "7.375%", "0%"]);
  });
});
