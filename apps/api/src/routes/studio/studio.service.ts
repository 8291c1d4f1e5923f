import { eq } from "drizzle-orm";
import { studio, type Db, type DbOrTx } from "@takeup/db";
import type { StudioDto, UpdateStudioInput } from "@takeup/domain";
import { HttpError } from "../../lib/http-error.ts";
import { writeAudit } from "../../lib/audit.ts";
import type { Actor } from "../../lib/actor.ts";

export async function loadStudio(db: DbOrTx): Promise<StudioDto> {
  const [row] = await db.select().from(studio).where(eq(studio.id, 1)).limit(1);
  if (!row) throw new HttpError(503, "studio_not_set_up", "The studio has not been set up yet (run the seed)");
  const { id: _id, updatedAt: _u, ...dto } = row;
  return dto;
}

const blankToNull = (v: string | undefined) => (v === undefined ? undefined : v.trim() === "" ? null : v.trim());

export async function updateStudio(db: Db, actor: Actor, input: UpdateStudioInput): Promise<StudioDto> {
  return db.transaction(async (tx) => {
    const before = await loadStudio(tx);
    const changes = {
      name: input.name,
      timeZone: input.timeZone,
      currency: input.currency,
      address: blankToNull(input.address),
      email: blankToNull(input.email),
      phone: blankToNull(input.phone),
      holdHours: input.holdHours,
      depositBp: input.depositBp,
      // Kept shortest notice first, the order the fee schedule is read and shown in.
      cancellationTiers: input.cancellationTiers ? [...input.cancellationTiers].sort((a, b) => a.noticeUnderHours - b.noticeUnderHours) : undefined,
    };
    // An empty change is a no-op (drizzle refuses an UPDATE with nothing to set).
    if (Object.values(changes).every((v) => v === undefined)) return before;
    await tx.update(studio).set(changes).where(eq(studio.id, 1));
    const after = await loadStudio(tx);
    await writeAudit(tx, actor, "studio.updated", { type: "studio", id: 1 }, { before, after });
    return after;
  });
}
