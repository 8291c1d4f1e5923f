import { eq } from "drizzle-orm";
import { clientAccounts, clientUsers, staffProfiles, user, type Db } from "@takeup/db";
import type { Role } from "@takeup/domain";

/** The signed-in person a request acts for. */
export type Actor = {
  userId: string;
  name: string;
  email: string;
  role: Role;
  /** Set for client users only: the one account they may see. */
  clientAccountId: number | null;
  clientAccountName: string | null;
  active: boolean;
};

export async function loadActor(db: Db, userId: string): Promise<Actor | null> {
  const [row] = await db
    .select({
      userId: user.id,
      name: user.name,
      email: user.email,
      staffRole: staffProfiles.role,
      staffActive: staffProfiles.active,
      clientAccountId: clientUsers.clientAccountId,
      clientActive: clientUsers.active,
      clientAccountName: clientAccounts.name,
    })
    .from(user)
    .leftJoin(staffProfiles, eq(staffProfiles.userId, user.id))
    .leftJoin(clientUsers, eq(clientUsers.userId, user.id))
    .leftJoin(clientAccounts, eq(clientAccounts.id, clientUsers.clientAccountId))
    .where(eq(user.id, userId))
    .limit(1);
  if (!row) return null;
  if (row.staffRole) {
    return { ...base(row), role: row.staffRole, clientAccountId: null, clientAccountName: null, active: row.staffActive ?? false };
  }
  if (row.clientAccountId) {
    return {
      ...base(row),
      role: "client",
      clientAccountId: row.clientAccountId,
      clientAccountName: row.clientAccountName,
      active: row.clientActive ?? false,
    };
  }
  return null;
}

const base = (row: { userId: string; name: string; email: string }) => ({
  userId: row.userId,
  name: row.name,
  email: row.email,
});
