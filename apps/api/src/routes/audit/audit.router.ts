import { desc, eq } from "drizzle-orm";
import { z } from "zod";
import { auditEventDto, auditQuery } from "@takeup/domain";
import { auditEvents, user } from "@takeup/db";
import { ApiRouter } from "../../lib/api-router.ts";
import type { Deps } from "../../deps.ts";

export function auditRouter({ db }: Deps) {
  return new ApiRouter("/api/audit-events", "Audit").route({
    method: "get",
    path: "/",
    summary: "Recent changes: who did what, with before and after",
    access: ["owner"],
    query: auditQuery,
    response: z.array(auditEventDto),
    handler: async ({ query }) => {
      const rows = await db
        .select({ event: auditEvents, actorName: user.name })
        .from(auditEvents)
        .leftJoin(user, eq(user.id, auditEvents.actorUserId))
        .where(query.entityType ? eq(auditEvents.entityType, query.entityType) : undefined)
        .orderBy(desc(auditEvents.id))
        .limit(query.limit);
      return rows.map(({ event, actorName }) => ({ ...event, at: event.at.toISOString(), actorName }));
    },
  });
}
