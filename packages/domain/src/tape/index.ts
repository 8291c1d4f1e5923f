export * from "./moving-average.ts";
export * from "./price.ts";
export * from "./planner.ts";
export * from "./catalogue.ts";
