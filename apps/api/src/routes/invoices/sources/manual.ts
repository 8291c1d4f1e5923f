import { quantityScale, type DraftLine, type ManualLineInput } from "@takeup/domain";

/** Manual lines: anything the studio types in; quantity × unit price, rounded half up once. */
export function manualLines(lines: readonly ManualLineInput[]): (DraftLine & { discount: ManualLineInput["discount"] })[] {
  return lines.map((line) => ({
    category: line.category,
    description: line.description,
    explanation: "",
    quantityMilli: Math.round(line.quantity * quantityScale),
    unit: line.unit ?? "each",
    unitPriceMinor: line.unitPriceCents,
    discount: line.discount ?? null,
  }));
}
