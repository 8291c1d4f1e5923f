import { eq } from "drizzle-orm";
import { studio, type Db, type DbOrTx } from "@takeup/db";
import type { UpdateVaultSettingsInput, VaultSettingsDto } from "@takeup/domain";
import type { Actor } from "../../lib/actor.ts";
import { writeAudit } from "../../lib/audit.ts";
import { HttpError } from "../../lib/http-error.ts";

export async function loadVaultSettings(db: DbOrTx): Promise<VaultSettingsDto> {
  const [row] = await db
    .select({
      storageFreeDays: studio.storageFreeDays,
      storageMonthlyFeeCents: studio.storageMonthlyFeeCents,
      alignmentIntervalHours: studio.alignmentIntervalHours,
      cleaningIntervalHours: studio.cleaningIntervalHours,
    })
    .from(studio)
    .where(eq(studio.id, 1));
  if (!row) throw new HttpError(503, "studio_not_set_up", "The studio has not been set up yet (run the seed)");
  return row;
}

export async function updateVaultSettings(db: Db, actor: Actor, input: UpdateVaultSettingsInput): Promise<VaultSettingsDto> {
  return db.transaction(async (tx) => {
    const before = await loadVaultSettings(tx);
    const changes = Object.fromEntries(Object.entries(input).filter(([, v]) => v !== undefined));
    if (Object.keys(changes).length === 0) return before;
    await tx.update(studio).set(changes).where(eq(studio.id, 1));
    const after = await loadVaultSettings(tx);
    await writeAudit(tx, actor, "vault_settings.updated", { type: "studio", id: 1 }, { before, after });
    return after;
  });
}
