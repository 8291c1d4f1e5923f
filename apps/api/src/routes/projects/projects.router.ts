import { and, asc, eq } from "drizzle-orm";
import { clientAccounts, projects } from "@takeup/db";
import { projectRoutes } from "@takeup/domain";
import { ApiRouter } from "../../lib/api-router.ts";
import { assertClientScope } from "../../lib/client-scope.ts";
import { notFound } from "../../lib/http-error.ts";
import { writeAudit } from "../../lib/audit.ts";
import type { Deps } from "../../deps.ts";

/** Projects (albums, EPs) belong to a client account: /api/clients/:id/projects. */
export function projectsRouter({ db }: Deps) {
  const list = (clientAccountId: number) =>
    db.select().from(projects).where(eq(projects.clientAccountId, clientAccountId)).orderBy(asc(projects.name));
  return new ApiRouter("/api/clients", "Clients")
    .handle(projectRoutes.list, async ({ actor, params }) => {
      assertClientScope(actor, params.id);
      return list(params.id);
    })
    .handle(projectRoutes.create, async ({ actor, params, body }) =>
      db.transaction(async (tx) => {
        const [account] = await tx.select({ id: clientAccounts.id }).from(clientAccounts).where(eq(clientAccounts.id, params.id));
        if (!account) throw notFound("That client account");
        const [created] = await tx.insert(projects).values({ clientAccountId: params.id, name: body.name, notes: body.notes?.trim() || null }).$returningId();
        await writeAudit(tx, actor, "project.created", { type: "project", id: created!.id }, { after: { clientAccountId: params.id, ...body } });
        const [row] = await tx.select().from(projects).where(and(eq(projects.id, created!.id)));
        return row!;
      }),
    );
}
