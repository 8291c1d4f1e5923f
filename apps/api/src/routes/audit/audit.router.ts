import { desc, eq } from "drizzle-orm";
import { auditRoutes } from "@takeup/domain";
import { auditEvents, user } from "@takeup/db";
import { ApiRouter } from "../../lib/api-router.ts";
import type { Deps } from "../../deps.ts";

export function auditRouter({ db }: Deps) {
  return new ApiRouter("/api/audit-events", "Audit").handle(auditRoutes.list, async ({ query }) => {
    const rows = await db
      .select({ event: auditEvents, actorName: user.name })
      .from(auditEvents)
      .leftJoin(user, eq(user.id, auditEvents.actorUserId))
      .where(query.entityType ? eq(auditEvents.entityType, query.entityType) : undefined)
      .orderBy(desc(auditEvents.id))
      .limit(query.limit);
    return rows.map(({ event, actorName }) => ({ ...event, at: event.at.toISOString(), actorName }));
  });
}
