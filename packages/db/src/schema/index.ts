export * from "./auth.ts";
export * from "./studio.ts";
export * from "./people.ts";
export * from "./audit.ts";
