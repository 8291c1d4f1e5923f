import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { ageReceivables, ageingBucketOf, bucketEstimate, daysPastDue } from "./ageing.ts";
import { dueDate, formatInvoiceNumber } from "./terms.ts";

describe("accounts-receivable ageing", () => {
  it("puts each open balance in its bucket by days past due as of the chosen date", () => {
    const asOf = "2026-06-30";
    const totals = ageReceivables(
      [
        { dueOn: "2026-07-10", balanceMinor: 100 }, // not yet due
        { dueOn: "2026-06-30", balanceMinor: 200 }, // due today: current
        { dueOn: "2026-06-29", balanceMinor: 300 }, // 1 day
        { dueOn: "2026-05-31", balanceMinor: 400 }, // 30 days
        { dueOn: "2026-05-30", balanceMinor: 500 }, // 31 days
        { dueOn: "2026-04-01", balanceMinor: 600 }, // 90 days
        { dueOn: "2026-03-31", balanceMinor: 700 }, // 91 days
        { dueOn: "2026-01-01", balanceMinor: 0 }, // paid: left out
      ],
      asOf,
    );
    expect(totals).toEqual({ current: 300, days_1_30: 700, days_31_60: 500, days_61_90: 600, over_90: 700, totalMinor: 2800 });
  });

  it("ages the same invoice differently as of different dates", () => {
    expect(ageingBucketOf(daysPastDue("2026-03-01", "2026-03-11"))).toBe("days_1_30");
    expect(ageingBucketOf(daysPastDue("2026-03-01", "2026-04-15"))).toBe("days_31_60");
  });

  it("estimates by bucket and sum: $145,740 × 10% + $102,100 × 20% + $77,010 × 30% = $58,097 (OpenStax Principles of Accounting Vol. 1, §9.2)", () => {
    const estimate = bucketEstimate([
      { amountMinor: 14_574_000, bp: 1000 },
      { amountMinor: 10_210_000, bp: 2000 },
      { amountMinor: 7_701_000, bp: 3000 },
    ]);
    expect(estimate.rows).toEqual([1_457_400, 2_042_000, 2_310_300]);
    expect(estimate.totalMinor).toBe(5_809_700);
  });

  it("estimates 485,000 @ 5% + 180,000 @ 10% + 80,000 @ 20% = $58,250 (OpenStax Principles of Accounting Vol. 1, §9.2)", () => {
    expect(bucketEstimate([{ amountMinor: 48_500_000, bp: 500 }, { amountMinor: 18_000_000, bp: 1000 }, { amountMinor: 8_000_000, bp: 2000 }]).totalMinor).toBe(5_825_000);
  });

  it("has buckets that always sum to the open balance", () => {
    fc.assert(
      fc.property(
        fc.array(fc.record({ offset: fc.integer({ min: -60, max: 400 }), balanceMinor: fc.integer({ min: 0, max: 10_000_000 }) }), { maxLength: 40 }),
        (rows) => {
          const asOf = "2026-09-15";
          const items = rows.map((r) => ({ dueOn: new Date(Date.UTC(2026, 8, 15) - r.offset * 86_400_000).toISOString().slice(0, 10), balanceMinor: r.balanceMinor }));
          const t = ageReceivables(items, asOf);
          expect(t.current + t.days_1_30 + t.days_31_60 + t.days_61_90 + t.over_90).toBe(t.totalMinor);
          expect(t.totalMinor).toBe(rows.reduce((s, r) => s + r.balanceMinor, 0));
        },
      ),
    );
  });
});

describe("terms and numbers", () => {
  it("make an invoice issued on 25 Feb 2028 on net 14 due on 10 Mar 2028 (a leap year)", () => {
    expect(dueDate("2028-02-25", 14)).toBe("2028-03-10");
    expect(dueDate("2026-05-01", 0)).toBe("2026-05-01");
  });

  it("number invoices as prefix, year and a four-digit sequence", () => {
    expect(formatInvoiceNumber("WF", 2026, 42)).toBe("WF-2026-0042");
    expect(formatInvoiceNumber("WF-CN", 2026, 12345)).toBe("WF-CN-2026-12345");
  });
});
