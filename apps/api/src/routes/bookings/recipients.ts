import { and, eq, inArray } from "drizzle-orm";
import { clientAccounts, clientUsers, staffProfiles, user, type DbOrTx } from "@takeup/db";

/** Who hears about a client's bookings: the account's e-mail and its active client users. */
export async function clientRecipients(db: DbOrTx, clientAccountId: number): Promise<{ email: string; name: string }[]> {
  const [account] = await db.select().from(clientAccounts).where(eq(clientAccounts.id, clientAccountId));
  const users = await db
    .select({ email: user.email, name: user.name })
    .from(clientUsers)
    .innerJoin(user, eq(user.id, clientUsers.userId))
    .where(and(eq(clientUsers.clientAccountId, clientAccountId), eq(clientUsers.active, true)));
  const all = [...(account?.email ? [{ email: account.email, name: account.name }] : []), ...users];
  return all.filter((r, i) => all.findIndex((o) => o.email.toLowerCase() === r.email.toLowerCase()) === i);
}

export async function staffRecipients(db: DbOrTx, filter: { roles?: ("owner" | "manager")[]; userIds?: string[] }) {
  const where = filter.userIds
    ? and(inArray(staffProfiles.userId, filter.userIds.length ? filter.userIds : ["-"]), eq(staffProfiles.active, true))
    : and(inArray(staffProfiles.role, filter.roles ?? ["manager"]), eq(staffProfiles.active, true));
  return db.select({ email: user.email, name: staffProfiles.displayName }).from(staffProfiles).innerJoin(user, eq(user.id, staffProfiles.userId)).where(where);
}
