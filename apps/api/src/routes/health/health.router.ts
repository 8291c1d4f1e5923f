import { sql } from "drizzle-orm";
import { healthDto } from "@takeup/domain";
import { ApiRouter } from "../../lib/api-router.ts";
import type { Deps } from "../../deps.ts";
import { retryAfterSeconds } from "../../lib/database-probe.ts";

export function healthRouter({ db }: Deps) {
  return new ApiRouter("/api/health", "System").route({
    method: "get",
    path: "/",
    summary: "Liveness and database reachability",
    access: "public",
    response: healthDto,
    handler: async ({ res }) => {
      try {
        await db.execute(sql`SELECT 1`);
        return { status: "ok", db: "ok" };
      } catch {
        res.status(503).setHeader("retry-after", String(retryAfterSeconds.unavailable));
        return { status: "degraded", db: "down" };
      }
    },
  });
}
