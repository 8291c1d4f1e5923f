import { sql } from "drizzle-orm";
import { healthDto } from "@takeup/domain";
import { ApiRouter } from "../../lib/api-router.ts";
import type { Deps } from "../../deps.ts";

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
        res.status(503);
        return { status: "degraded", db: "down" };
      }
    },
  });
}
