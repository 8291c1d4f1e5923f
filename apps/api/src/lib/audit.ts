import { auditEvents, type DbOrTx } from "@takeup/db";
import type { Actor } from "./actor.ts";

/** Records who changed what; call it inside the same transaction as the change. */
export async function writeAudit(
  tx: DbOrTx,
  actor: Pick<Actor, "userId"> | null,
  action: string,
  entity: { type: string; id: string | number },
  change: { before?: unknown; after?: unknown },
): Promise<void> {
  await tx.insert(auditEvents).values({
    actorUserId: actor?.userId ?? null,
    action,
    entityType: entity.type,
    entityId: String(entity.id),
    before: change.before ?? null,
    after: change.after ?? null,
  });
}
