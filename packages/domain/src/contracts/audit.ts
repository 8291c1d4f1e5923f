import { z } from "zod";
import { defineRoute } from "./route.ts";

export const auditEventDto = z.object({
  id: z.number(),
  at: z.string(),
  actorName: z.string().nullable(),
  /** Set when the actor is a client user: the client account they belong to, shown beside their name. */
  actorClientAccountName: z.string().nullable(),
  action: z.string(),
  entityType: z.string(),
  entityId: z.string(),
  before: z.unknown(),
  after: z.unknown(),
});
export type AuditEventDto = z.infer<typeof auditEventDto>;

export const auditQuery = z.strictObject({
  entityType: z.string().max(48).optional(),
  limit: z.coerce.number().int().min(1).max(500).default(100),
});

export const auditRoutes = {
  list: defineRoute({
    method: "get",
    path: "/api/audit-events",
    summary: "Recent changes: who did what, with before and after",
    access: ["owner"],
    query: auditQuery,
    response: z.array(auditEventDto),
  }),
};
