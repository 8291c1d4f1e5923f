/**
 * What an invoice line can be about. Each billable-source kind maps to a tax category; the
 * studio sets one tax rate per category (0 allowed). Adding a source kind means adding it here
 * and one provider file in the API (apps/api/src/routes/invoices/sources/).
 */

export const taxCategories = ["room", "engineer", "tape_goods", "storage", "other"] as const;
export type TaxCategory = (typeof taxCategories)[number];

export const taxCategoryLabels: Record<TaxCategory, string> = {
  room: "Room time",
  engineer: "Engineer time",
  tape_goods: "Tape and media sold",
  storage: "Vault storage",
  other: "Other",
};

/** Kinds of things that can be billed. `deposit` is the line of a hold's deposit invoice. */
export const billableSourceKinds = ["booking", "manual", "tape_sale", "storage", "deposit"] as const;
export type BillableSourceKind = (typeof billableSourceKinds)[number];

/** The tax category a source kind's lines fall in when the source does not say otherwise. */
export const defaultCategoryOfSource: Record<BillableSourceKind, TaxCategory> = {
  booking: "room",
  manual: "other",
  tape_sale: "tape_goods",
  storage: "storage",
  deposit: "other",
};

/** Booking quote lines: engineer lines are engineer time; every other quote line is room time. */
export function categoryOfQuoteLine(kind: string): TaxCategory {
  return kind === "engineer" ? "engineer" : "room";
}
