export * from "./categories.ts";
export * from "./tax.ts";
export * from "./totals.ts";
export * from "./ageing.ts";
export * from "./terms.ts";
export * from "./booking-lines.ts";
