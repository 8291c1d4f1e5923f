import { sql } from "drizzle-orm";
import { healthRoutes } from "@takeup/domain";
import { ApiRouter } from "../../lib/api-router.ts";
import type { Deps } from "../../deps.ts";
import { retryAfterSeconds } from "../../lib/database-probe.ts";

export function healthRouter({ db }: Deps) {
  return new ApiRouter("/api/health", "System").handle(healthRoutes.get, async ({ res }) => {
    try {
      await db.execute(sql`SELECT 1`);
      return { status: "ok", db: "ok" } as const;
    } catch {
      res.status(503).setHeader("retry-after", String(retryAfterSeconds.unavailable));
      return { status: "degraded", db: "down" } as const;
    }
  });
}
