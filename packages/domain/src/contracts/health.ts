import { z } from "zod";

export const healthDto = z.object({ status: z.enum(["ok", "degraded"]), db: z.enum(["ok", "down"]) });
export type HealthDto = z.infer<typeof healthDto>;
