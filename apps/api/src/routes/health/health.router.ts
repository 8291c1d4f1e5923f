import { sql } from "drizzle-orm";
import { healthRoutes } from "@takeup/domain";
import { ApiRouter } from "../../lib/api-router.ts";
import type { Deps } from "../../deps.ts";

export function healthRouter({ db }: Deps) {
  return new ApiRouter("/api/health", "System").handle(healthRoutes.get, async ({ res }) => {
    try {
      await db.execute(sql`SELECT 1`);
      return { status: "ok", db: "ok" } as const;
    } catch {
      res.status(503);
      return { status: "degraded", db: "down" } as const;
    }
  });
}
