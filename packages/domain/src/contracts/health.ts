import { z } from "zod";
import { defineRoute } from "./route.ts";

export const healthDto = z.object({ status: z.enum(["ok", "degraded"]), db: z.enum(["ok", "down"]) });
export type HealthDto = z.infer<typeof healthDto>;

export const healthRoutes = {
  get: defineRoute({
    method: "get",
    path: "/api/health",
    summary: "Liveness and database reachability",
    access: "public",
    response: healthDto,
  }),
};
