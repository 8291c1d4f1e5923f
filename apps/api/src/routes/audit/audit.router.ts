import { desc, eq } from "drizzle-orm";
import { z } from "zod";
import { auditEventDto, auditQuery } from "@takeup/domain";
import { auditEvents, clientAccounts, clientUsers, user } from "@takeup/db";
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
        .select({ event: auditEvents, actorName: user.name, actorClientAccountName: clientAccounts.name })
        .from(auditEvents)
        .leftJoin(user, eq(user.id, auditEvents.actorUserId))
        // A client user names themselves; staff see which client account the person really is.
        .leftJoin(clientUsers, eq(clientUsers.userId, auditEvents.actorUserId))
        .leftJoin(clientAccounts, eq(clientAccounts.id, clientUsers.clientAccountId))
        .where(query.entityType ? eq(auditEvents.entityType, query.entityType) : undefined)
        .orderBy(desc(auditEvents.id))
        .limit(query.limit);
      return rows.map(({ event, actorName, actorClientAccountName }) => ({
        ...event,
        at: event.at.toISOString(),
        actorName,
        actorClientAccountName,
      }));
    },
  });
}
