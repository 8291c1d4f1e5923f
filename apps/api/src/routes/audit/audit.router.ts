import { desc, eq } from "drizzle-orm";
import { auditRoutes } from "@takeup/domain";
import { auditEvents, clientAccounts, clientUsers, user } from "@takeup/db";
import { ApiRouter } from "../../lib/api-router.ts";
import type { Deps } from "../../deps.ts";

export function auditRouter({ db }: Deps) {
  return new ApiRouter("/api/audit-events", "Audit").handle(auditRoutes.list, async ({ query }) => {
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
  });
}
