/**
 * Perpetual moving-average cost for one stock item, in integer cents.
 *
 * The item carries its quantity on hand and the total value of that stock. A receipt adds its
 * quantity and its cost, and that is the only event that sets a new average (value ÷ quantity).
 * Everything that takes stock out (a sale, a write-off, a count that finds less) takes its cost
 * of goods at that average: quantity × value ÷ on hand, rounded half up to the cent, and the
 * value left is what remains — so the last unit out takes the last cent and no pennies linger.
 * Stock that comes back (a client's return, a count that finds more) comes in at the average.
 *
 * Rounding against OpenStax, Principles of Accounting Vol. 1, §10.3: the book rounds the average
 * to the cent ($26.29) and its text multiplies by that (180 × $26.29 = $4,732) while its figure
 * uses the unrounded average ($4,733). We never multiply by a rounded average: cost of goods is
 * quantity × exact value ÷ on hand, rounded once, to the cent. That lands on the figure's $4,733
 * (473,294 cents), and the book's totals 7,253 / 8,902 / 4,087 follow to the dollar.
 */

export type StockState = {
  onHand: number;
  /** The total cost of what is on hand, in cents. */
  valueCents: number;
  /** The average set by the last receipt (what stock returns at when none is on hand), in cents, rounded. */
  averageCostCents: number;
};

export const emptyStock: StockState = { onHand: 0, valueCents: 0, averageCostCents: 0 };

export class StockError extends Error {
  constructor(
    readonly code: "insufficient_stock" | "invalid_quantity",
    message: string,
    readonly onHand: number,
  ) {
    super(message);
    this.name = "StockError";
  }
}

/** numerator ÷ divisor rounded half up, exact in BigInt (both non-negative, divisor above zero). */
export function divHalfUp(numerator: number | bigint, divisor: number | bigint): number {
  const n = BigInt(numerator);
  const d = BigInt(divisor);
  if (n < 0n || d <= 0n) throw new RangeError("divHalfUp takes a non-negative numerator and a positive divisor");
  return Number((2n * n + d) / (2n * d));
}

function assertQuantity(quantity: number, onHand: number) {
  if (!Number.isSafeInteger(quantity) || quantity <= 0) {
    throw new StockError("invalid_quantity", "A quantity is a whole number above zero", onHand);
  }
}

/** Stock received at a unit cost: sets the new average. */
export function receive(state: StockState, quantity: number, unitCostCents: number): StockState {
  assertQuantity(quantity, state.onHand);
  if (!Number.isSafeInteger(unitCostCents) || unitCostCents < 0) throw new RangeError("A unit cost is whole cents, zero or more");
  const onHand = state.onHand + quantity;
  const valueCents = state.valueCents + quantity * unitCostCents;
  return { onHand, valueCents, averageCostCents: divHalfUp(valueCents, onHand) };
}

/** What taking `quantity` out costs and leaves; refuses to go below zero. */
export function issue(state: StockState, quantity: number): { state: StockState; costOfGoodsCents: number } {
  assertQuantity(quantity, state.onHand);
  if (quantity > state.onHand) {
    throw new StockError("insufficient_stock", insufficientMessage(quantity, state.onHand), state.onHand);
  }
  const costOfGoodsCents = quantity === state.onHand ? state.valueCents : divHalfUp(BigInt(quantity) * BigInt(state.valueCents), state.onHand);
  return {
    state: { onHand: state.onHand - quantity, valueCents: state.valueCents - costOfGoodsCents, averageCostCents: state.averageCostCents },
    costOfGoodsCents,
  };
}

/** Stock coming back (a return, a count that finds more): at the current average; the average stays. */
export function restock(state: StockState, quantity: number): { state: StockState; costCents: number } {
  assertQuantity(quantity, state.onHand);
  const unit = state.onHand > 0 ? state.valueCents / state.onHand : state.averageCostCents;
  const costCents = Math.round(quantity * unit);
  return { state: { onHand: state.onHand + quantity, valueCents: state.valueCents + costCents, averageCostCents: state.averageCostCents }, costCents };
}

export function insufficientMessage(wanted: number, onHand: number): string {
  const left = onHand === 0 ? "none are left" : onHand === 1 ? "only 1 is left" : `only ${onHand} are left`;
  return `Cannot take ${wanted} from stock: ${left}`;
}
