export * from "./client.ts";
export * as schema from "./schema/index.ts";
export * from "./schema/index.ts";
