import { centsForMinutes } from "../pricing/money-math.ts";
import type { Quote } from "../pricing/types.ts";
import { categoryOfQuoteLine, type TaxCategory } from "./categories.ts";
import { quantityScale } from "./totals.ts";

/** Whether wrapped sessions are billed on the booked time, or on the actual time with any overrun. */
export const billingBases = ["booked", "actual"] as const;
export type BillingBasis = (typeof billingBases)[number];

export interface DraftLine {
  category: TaxCategory;
  description: string;
  explanation: string;
  quantityMilli: number;
  unit: string;
  unitPriceMinor: number;
  fixedAmountMinor?: number;
}

export interface BookingBillingInput {
  quote: Quote;
  basis: BillingBasis;
  bookedEndsAt: Date;
  /** When the session was wrapped, if it was; only read when billing on actual time. */
  wrappedAt: Date | null;
  hourlyRateCents: number;
  billingIncrementMinutes: number;
  /** Title shown before each line, e.g. "Room A, 3–5 Mar". */
  sessionLabel: string;
}

/**
 * A wrapped session's invoice lines: the quote's own lines with their amounts unchanged, and,
 * when the studio bills on actual time, the room-time overrun past the booked end at the
 * hourly rate (rounded up to the billing increment). A lockout has the room all day: no overrun.
 */
export function bookingLines(input: BookingBillingInput): DraftLine[] {
  const lines: DraftLine[] = input.quote.lines.map((line) => ({
    category: categoryOfQuoteLine(line.kind),
    description: `${input.sessionLabel}: ${line.label}`,
    explanation: `${line.explanation} (from the booking's quote${input.basis === "booked" ? ", billed on booked time" : ""})`,
    quantityMilli: line.unit === "hour" ? Math.round((line.quantity * quantityScale) / 60) : line.quantity * quantityScale,
    unit: line.unit,
    unitPriceMinor: line.unitAmountCents,
    fixedAmountMinor: line.amountCents,
  }));
  if (input.basis === "actual" && !input.quote.lockout && input.wrappedAt && input.wrappedAt > input.bookedEndsAt) {
    const over = Math.ceil((input.wrappedAt.getTime() - input.bookedEndsAt.getTime()) / 60_000);
    const step = Math.max(1, input.billingIncrementMinutes);
    const minutes = Math.ceil(over / step) * step;
    lines.push({
      category: "room",
      description: `${input.sessionLabel}: overrun`,
      explanation: `Billed on actual time: wrapped ${over} min after the booked end, billed as ${minutes} min (in ${step}-min steps) at the hourly rate`,
      quantityMilli: Math.round((minutes * quantityScale) / 60),
      unit: "hour",
      unitPriceMinor: input.hourlyRateCents,
      fixedAmountMinor: centsForMinutes(minutes, input.hourlyRateCents),
    });
  }
  return lines;
}
