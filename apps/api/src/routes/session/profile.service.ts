import { eq } from "drizzle-orm";
import { staffProfiles, user, type Db } from "@takeup/db";
import type { UpdateMeInput } from "@takeup/domain";
import { loadActor, type Actor } from "../../lib/actor.ts";
import { writeAudit } from "../../lib/audit.ts";
import { HttpError } from "../../lib/http-error.ts";

/**
 * Changes the caller's own name (the contract has already trimmed and bounded it). A member of
 * staff's display name follows, so every screen shows the same name; the change is audited.
 */
export async function updateOwnProfile(db: Db, actor: Actor, input: UpdateMeInput): Promise<Actor> {
  await db.transaction(async (tx) => {
    const [before] = await tx.select({ name: user.name }).from(user).where(eq(user.id, actor.userId)).for("update");
    if (!before) throw new HttpError(404, "not_found", "This sign-in no longer exists");
    if (before.name === input.name) return;
    await tx.update(user).set({ name: input.name, updatedAt: new Date() }).where(eq(user.id, actor.userId));
    if (actor.role !== "client") {
      await tx.update(staffProfiles).set({ displayName: input.name }).where(eq(staffProfiles.userId, actor.userId));
    }
    await writeAudit(tx, actor, "profile.update", { type: "user", id: actor.userId }, { before: { name: before.name }, after: { name: input.name } });
  });
  const updated = await loadActor(db, actor.userId);
  if (!updated) throw new HttpError(404, "not_found", "This sign-in no longer exists");
  return updated;
}
