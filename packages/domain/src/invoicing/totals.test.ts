import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { taxCategories } from "./categories.ts";
import { computeInvoice, invoiceBalance, lineAmount, paidStatus, splitPayment, type Discount, type InvoiceLineInput } from "./totals.ts";
import type { TaxRates } from "./tax.ts";

const noTax = { rates: { room: 0, engineer: 0, tape_goods: 0, storage: 0, other: 0 }, calculation: "per_line" as const, rounding: "half_up" as const };

describe("invoice lines", () => {
  it("round quantity × unit price once per line, half up ([D] 2.5 h × $33.33 = $83.325 → $83.33)", () => {
    expect(lineAmount({ quantityMilli: 2500, unitPriceMinor: 3333 })).toBe(8333);
  });

  it("keep a booking line's quote amount even when quantity × rate differs by a cent", () => {
    expect(lineAmount({ quantityMilli: 1667, unitPriceMinor: 6000, fixedAmountMinor: 10_000 })).toBe(10_000);
  });

  it("take a line discount and an invoice discount before tax", () => {
    const totals = computeInvoice({
      lines: [
        { category: "room", quantityMilli: 1000, unitPriceMinor: 10_000, discount: { kind: "percent", bp: 1000 } },
        { category: "other", quantityMilli: 1000, unitPriceMinor: 1000 },
      ],
      invoiceDiscount: { kind: "amount", amountMinor: 1000 },
      tax: { ...noTax, rates: { ...noTax.rates, room: 100_000, other: 100_000 } },
    });
    // 9000 + 1000 after the line discount; the invoice's 1000 shared 900 / 100.
    expect(totals.lines.map((l) => l.netMinor)).toEqual([8100, 900]);
    expect(totals.taxMinor).toBe(810 + 90);
    expect(totals.totalMinor).toBe(9000 + 900);
  });

  it("refuse a discount larger than its line, naming the line", () => {
    expect(() => computeInvoice({ lines: [{ category: "other", quantityMilli: 1000, unitPriceMinor: 100, discount: { kind: "amount", amountMinor: 101 } }], tax: noTax })).toThrow(
      expect.objectContaining({ field: "lines.0.discount" }),
    );
  });
});

const categoryArb = fc.constantFrom(...taxCategories);
const discountArb: fc.Arbitrary<Discount | null> = fc.oneof(fc.constant(null), fc.integer({ min: 0, max: 10_000 }).map((bp) => ({ kind: "percent" as const, bp })));
const lineArb: fc.Arbitrary<InvoiceLineInput> = fc.record({
  category: categoryArb,
  quantityMilli: fc.integer({ min: 0, max: 100_000 }),
  unitPriceMinor: fc.integer({ min: 0, max: 500_000 }),
  discount: discountArb,
});
const ratesArb: fc.Arbitrary<TaxRates> = fc.record({
  room: fc.integer({ min: 0, max: 250_000 }),
  engineer: fc.integer({ min: 0, max: 250_000 }),
  tape_goods: fc.integer({ min: 0, max: 250_000 }),
  storage: fc.integer({ min: 0, max: 250_000 }),
  other: fc.integer({ min: 0, max: 250_000 }),
});
const invoiceArb = fc.record({
  lines: fc.array(lineArb, { minLength: 1, maxLength: 30 }),
  invoiceDiscount: discountArb,
  tax: fc.record({ rates: ratesArb, calculation: fc.constantFrom("per_line" as const, "per_invoice" as const), rounding: fc.constantFrom("half_up" as const, "down" as const) }),
});

describe("properties of every invoice", () => {
  it("adds up: the lines' amounts + tax − discounts = the total, and each line's net + tax adds to it too", () => {
    fc.assert(
      fc.property(invoiceArb, (input) => {
        const t = computeInvoice(input);
        expect(t.subtotalMinor + t.taxMinor - t.discountMinor).toBe(t.totalMinor);
        expect(t.lines.reduce((sum, l) => sum + l.netMinor + l.taxMinor, 0)).toBe(t.totalMinor);
        expect(t.lines.every((l) => l.netMinor >= 0 && l.taxMinor >= 0)).toBe(true);
      }),
      { numRuns: 300 },
    );
  });

  it("never lets payments and credits settle more than the total: the rest becomes a client credit", () => {
    fc.assert(
      fc.property(invoiceArb, fc.array(fc.integer({ min: 1, max: 5_000_000 }), { maxLength: 8 }), (input, payments) => {
        const { totalMinor } = computeInvoice(input);
        let applied = 0;
        let credit = 0;
        for (const amount of payments) {
          const split = splitPayment(totalMinor - applied, amount);
          applied += split.appliedMinor;
          credit += split.creditMinor;
        }
        expect(applied).toBeLessThanOrEqual(totalMinor);
        expect(applied + credit).toBe(payments.reduce((a, b) => a + b, 0));
        expect(paidStatus(totalMinor, applied)).toBe(applied === 0 ? (totalMinor === 0 ? "paid" : "issued") : applied >= totalMinor ? "paid" : "part_paid");
      }),
      { numRuns: 300 },
    );
  });

  it("brings the balance to zero with a credit note for the whole invoice, whatever was paid", () => {
    fc.assert(
      fc.property(invoiceArb, fc.nat(), (input, seed) => {
        const { totalMinor } = computeInvoice(input);
        const paid = totalMinor === 0 ? 0 : seed % (totalMinor + 1);
        const creditNote = totalMinor - paid; // a whole-invoice credit note credits what is still open
        expect(invoiceBalance({ totalMinor, depositAppliedMinor: 0, creditAppliedMinor: 0, paymentsMinor: paid, creditNotesMinor: creditNote })).toBe(0);
      }),
    );
  });
});
