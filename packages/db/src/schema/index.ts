export * from "./auth.ts";
export * from "./studio.ts";
export * from "./people.ts";
export * from "./audit.ts";
export * from "./rooms.ts";
export * from "./bookings.ts";
export * from "./time.ts";
export * from "./throttle.ts";
