import { describe, expect, it } from "vitest";
import { emptyStock, issue, receive, restock, StockError, type StockState } from "./moving-average.ts";
import { marginBp, salePriceCents } from "./price.ts";

// OpenStax, Principles of Accounting Vol. 1, §10.2–10.3 (CC BY-NC-SA 4.0) [S]: Jul 1 opening
// 150 @ $21; Jul 5 sell 120 @ $36; Jul 10 buy 225 @ $27; Jul 15 sell 180 @ $39; Jul 25 buy 210 @ $33.
const dollars = (cents: number) => Math.round(cents / 100);

function openStaxJuly() {
  let s: StockState = receive(emptyStock, 150, 2100);
  const jul5 = issue(s, 120);
  s = receive(jul5.state, 225, 2700);
  const afterJul10 = s;
  const jul15 = issue(s, 180);
  s = receive(jul15.state, 210, 3300);
  const sales = 120 * 3600 + 180 * 3900;
  return { jul5, afterJul10, jul15, end: s, sales, cogs: jul5.costOfGoodsCents + jul15.costOfGoodsCents };
}

describe("perpetual moving-average cost (OpenStax Principles of Accounting Vol. 1, §10.3 [S])", () => {
  it("gives the book's average of $26.29 after the July 10 purchase ($6,705 ÷ 255)", () => {
    const { afterJul10 } = openStaxJuly();
    expect(afterJul10.onHand).toBe(255);
    expect(afterJul10.valueCents).toBe(670_500);
    expect(afterJul10.averageCostCents).toBe(2629);
  });

  it("gives the book's average of $31.24 after the July 25 purchase", () => {
    expect(openStaxJuly().end.averageCostCents).toBe(3124);
  });

  it("costs the July 15 sale at $4,733, the book's figure (unrounded average), not its text's $4,732 (180 × $26.29)", () => {
    const { jul15 } = openStaxJuly();
    expect(jul15.costOfGoodsCents).toBe(473_294);
    expect(dollars(jul15.costOfGoodsCents)).toBe(4733);
  });

  it("totals cost of goods $7,253, ending inventory $8,902 on 285 units and gross margin $4,087 on sales of $11,340", () => {
    const { cogs, end, sales } = openStaxJuly();
    expect(sales).toBe(1_134_000);
    expect(dollars(cogs)).toBe(7253);
    expect(end.onHand).toBe(285);
    expect(dollars(end.valueCents)).toBe(8902);
    expect(dollars(sales - cogs)).toBe(4087);
    // Goods available for sale ($16,155) are exactly split between cost of goods and what is left.
    expect(cogs + end.valueCents).toBe(1_615_500);
  });

  it("keeps the average through sales: only receipts set it", () => {
    const { jul5, jul15, afterJul10 } = openStaxJuly();
    expect(jul5.state.averageCostCents).toBe(2100);
    expect(jul15.state.averageCostCents).toBe(afterJul10.averageCostCents);
  });

  it("lets the last unit out take the last cent, so no value is left on empty stock", () => {
    let s = receive(emptyStock, 3, 1000);
    s = receive(s, 4, 1001); // 7,004 ÷ 7 is not whole cents
    const a = issue(s, 2);
    const b = issue(a.state, 5);
    expect(b.state).toMatchObject({ onHand: 0, valueCents: 0 });
    expect(a.costOfGoodsCents + b.costOfGoodsCents).toBe(7004);
  });

  it("refuses to take more than is on hand, saying how many are left", () => {
    const s = receive(emptyStock, 2, 500);
    expect(() => issue(s, 3)).toThrow(StockError);
    expect(() => issue(s, 3)).toThrow("only 2 are left");
    expect(() => issue(emptyStock, 1)).toThrow("none are left");
  });

  it("brings returned stock back at the average without moving it", () => {
    const s = receive(emptyStock, 4, 2500);
    const out = issue(s, 2);
    const back = restock(out.state, 1);
    expect(back.costCents).toBe(2500);
    expect(back.state).toMatchObject({ onHand: 3, valueCents: 7500, averageCostCents: 2500 });
  });
});

describe("sale price and margin", () => {
  it("uses a fixed price as it is", () => {
    expect(salePriceCents({ mode: "fixed", fixedPriceCents: 32_000, markupBp: null }, 25_000)).toBe(32_000);
  });

  it("marks the average cost up by basis points, half up to the cent ([D] $26.29 + 25 % = $32.8625 → $32.86)", () => {
    expect(salePriceCents({ mode: "markup", fixedPriceCents: null, markupBp: 2500 }, 2629)).toBe(3286);
    expect(salePriceCents({ mode: "markup", fixedPriceCents: null, markupBp: 2500 }, 2630)).toBe(3288); // 32.875 → 32.88
  });

  it("has no markup price before any cost is known", () => {
    expect(salePriceCents({ mode: "markup", fixedPriceCents: null, markupBp: 2500 }, 0)).toBeNull();
  });

  it("states margin as a share of the price ([D] $36 on a $21 cost is 41.67 %)", () => {
    expect(marginBp(3600, 2100)).toBe(4167);
    expect(marginBp(1000, 1200)).toBe(-2000);
    expect(marginBp(null, 100)).toBeNull();
  });
});
