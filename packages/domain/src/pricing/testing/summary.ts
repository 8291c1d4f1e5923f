import type { Quote, QuoteLineKind } from "../types.ts";

/** The lines as [kind, quantity, amount] triples: what a person checks a quote by. */
export function summary(quote: Quote): [QuoteLineKind, number, number][] {
  return quote.lines.map((line) => [line.kind, line.quantity, line.amountCents]);
}
