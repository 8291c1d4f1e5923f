import { product, roundHalfUpDiv } from "../shared/money.ts";
import { roundRunningTotal } from "../pricing/money-math.ts";
import type { TaxCategory } from "./categories.ts";
import { computeTax, type TaxCalculation, type TaxRates, type TaxRounding, type TaxSummaryRow } from "./tax.ts";

/** A discount: a fixed amount of minor units, or basis points of the amount (1000 = 10%). */
export type Discount = { kind: "amount"; amountMinor: number } | { kind: "percent"; bp: number };

/** Quantities are thousandths, so 2.5 hours is 2500 and 3 reels are 3000. */
export const quantityScale = 1000;

export interface InvoiceLineInput {
  category: TaxCategory;
  quantityMilli: number;
  unitPriceMinor: number;
  /**
   * A fixed amount that wins over quantity × unit price: booking lines carry their quote's
   * amounts unchanged (room time is rounded as a running total, so it can differ by a cent).
   */
  fixedAmountMinor?: number;
  discount?: Discount | null;
}

export interface TaxSettings {
  rates: TaxRates;
  calculation: TaxCalculation;
  rounding: TaxRounding;
}

export interface InvoiceInput {
  lines: readonly InvoiceLineInput[];
  invoiceDiscount?: Discount | null;
  tax: TaxSettings;
}

export interface ComputedLine {
  amountMinor: number;
  /** The line's own discount plus its share of the invoice's discount. */
  discountMinor: number;
  netMinor: number;
  taxMinor: number;
}

export interface InvoiceTotals {
  lines: ComputedLine[];
  subtotalMinor: number;
  discountMinor: number;
  netMinor: number;
  taxMinor: number;
  taxRows: TaxSummaryRow[];
  totalMinor: number;
}

export class InvoiceRuleError extends Error {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(message);
    this.name = "InvoiceRuleError";
  }
}

const nonNegative = (value: number, field: string) => {
  if (!Number.isSafeInteger(value) || value < 0) throw new InvoiceRuleError(field, "Must be a whole number, zero or more");
};

/** quantity × unit price, rounded half up once for the line. */
export function lineAmount(line: Pick<InvoiceLineInput, "quantityMilli" | "unitPriceMinor" | "fixedAmountMinor">): number {
  if (line.fixedAmountMinor !== undefined) {
    nonNegative(line.fixedAmountMinor, "amountMinor");
    return line.fixedAmountMinor;
  }
  nonNegative(line.quantityMilli, "quantity");
  nonNegative(line.unitPriceMinor, "unitPriceMinor");
  return roundHalfUpDiv(product(line.quantityMilli, line.unitPriceMinor), BigInt(quantityScale));
}

/** How much a discount takes off an amount; it may not take off more than the amount. */
export function discountOn(amountMinor: number, discount: Discount | null | undefined, field: string): number {
  if (!discount) return 0;
  if (discount.kind === "percent") {
    if (!Number.isSafeInteger(discount.bp) || discount.bp < 0 || discount.bp > 10_000) throw new InvoiceRuleError(field, "A percentage discount is between 0% and 100%");
    return roundHalfUpDiv(product(amountMinor, discount.bp), 10_000n);
  }
  nonNegative(discount.amountMinor, field);
  if (discount.amountMinor > amountMinor) throw new InvoiceRuleError(field, "A discount cannot be more than the amount it is taken from");
  return discount.amountMinor;
}

/**
 * An invoice's lines, discounts (before tax) and tax. The invoice's discount is shared over the
 * lines in proportion to their amounts after their own discounts, so each tax category is taxed
 * on what the client actually pays for it.
 */
export function computeInvoice(input: InvoiceInput): InvoiceTotals {
  const amounts = input.lines.map((line) => lineAmount(line));
  const ownDiscounts = input.lines.map((line, i) => discountOn(amounts[i]!, line.discount, `lines.${i}.discount`));
  const afterOwn = amounts.map((amount, i) => amount - ownDiscounts[i]!);
  const afterOwnTotal = afterOwn.reduce((a, b) => a + b, 0);
  const invoiceDiscount = discountOn(afterOwnTotal, input.invoiceDiscount, "invoiceDiscount");
  const shares =
    afterOwnTotal === 0 ? afterOwn.map(() => 0) : roundRunningTotal(afterOwn.map((net) => product(net, invoiceDiscount)), BigInt(afterOwnTotal));
  const nets = afterOwn.map((net, i) => net - shares[i]!);
  const tax = computeTax(
    input.lines.map((line, i) => ({ category: line.category, netMinor: nets[i]! })),
    input.tax.rates,
    input.tax.calculation,
    input.tax.rounding,
  );
  const lines = amounts.map((amountMinor, i) => ({
    amountMinor,
    discountMinor: ownDiscounts[i]! + shares[i]!,
    netMinor: nets[i]!,
    taxMinor: tax.lineTaxMinor[i]!,
  }));
  const subtotalMinor = amounts.reduce((a, b) => a + b, 0);
  const discountMinor = lines.reduce((sum, l) => sum + l.discountMinor, 0);
  const netMinor = subtotalMinor - discountMinor;
  return {
    lines,
    subtotalMinor,
    discountMinor,
    netMinor,
    taxMinor: tax.totalTaxMinor,
    taxRows: tax.byCategory,
    totalMinor: netMinor + tax.totalTaxMinor,
  };
}

export interface BalanceInput {
  totalMinor: number;
  /** A paid deposit invoice's amount, deducted on the booking's final invoice. */
  depositAppliedMinor: number;
  /** Client credit (an earlier overpayment) used on this invoice. */
  creditAppliedMinor: number;
  /** Payments not reversed. */
  paymentsMinor: number;
  /** Credit notes issued against the invoice. */
  creditNotesMinor: number;
}

/** What is still owed on an invoice. Never negative: money beyond it becomes a client credit. */
export function invoiceBalance(b: BalanceInput): number {
  return b.totalMinor - b.depositAppliedMinor - b.creditAppliedMinor - b.paymentsMinor - b.creditNotesMinor;
}

/** How a payment lands on an invoice: up to the balance on the invoice, the rest as client credit. */
export function splitPayment(balanceMinor: number, amountMinor: number): { appliedMinor: number; creditMinor: number } {
  const appliedMinor = Math.min(Math.max(balanceMinor, 0), amountMinor);
  return { appliedMinor, creditMinor: amountMinor - appliedMinor };
}

export type PaidStatus = "issued" | "part_paid" | "paid";

/** The issued invoice's state from what has been paid or credited against it. */
export function paidStatus(dueMinor: number, settledMinor: number): PaidStatus {
  if (settledMinor <= 0) return dueMinor <= 0 ? "paid" : "issued";
  return settledMinor >= dueMinor ? "paid" : "part_paid";
}
