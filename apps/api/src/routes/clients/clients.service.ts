import { and, asc, eq, sql } from "drizzle-orm";
import {
  clientAccounts,
  clientContacts,
  clientUsers,
  invitations,
  isDuplicateKeyError,
  session,
  user,
  type ClientAccount,
  type Db,
  type Tx,
} from "@takeup/db";
import type {
  ClientDetailDto,
  ClientSummaryDto,
  ContactInput,
  CreateClientInput,
  InviteClientUserInput,
  UpdateClientInput,
} from "@takeup/domain";
import { conflict, notFound } from "../../lib/http-error.ts";
import { writeAudit } from "../../lib/audit.ts";
import type { Actor } from "../../lib/actor.ts";
import type { Deps } from "../../deps.ts";
import { createInvitation, pendingInvitationsWhere, sendInvitation, toPendingDto } from "../invitations/invitations.service.ts";

const orNull = (v: string | undefined) => (v === undefined || v.trim() === "" ? null : v.trim());

// Correlated subqueries spelled out with table aliases: drizzle renders a bare column name
// inside sql``, which the inner query would resolve against its own table.
const primaryContactName = sql<string | null>`(
  select cc.name from client_contacts cc where cc.client_account_id = client_accounts.id
  order by cc.is_primary desc, cc.position asc limit 1)`;
const userCount = sql<number>`(select count(*) from client_users cu where cu.client_account_id = client_accounts.id)`;

const summaryColumns = {
  id: clientAccounts.id,
  name: clientAccounts.name,
  kind: clientAccounts.kind,
  email: clientAccounts.email,
  phone: clientAccounts.phone,
  active: clientAccounts.active,
  primaryContact: primaryContactName,
  userCount,
};

export async function listClients(db: Db): Promise<ClientSummaryDto[]> {
  const rows = await db.select(summaryColumns).from(clientAccounts).orderBy(asc(clientAccounts.name));
  return rows.map((r) => ({ ...r, userCount: Number(r.userCount) }));
}

export async function getClient(db: Db | Tx, id: number): Promise<ClientDetailDto> {
  const [summary] = await db.select({ ...summaryColumns, billingAddress: clientAccounts.billingAddress, notes: clientAccounts.notes }).from(clientAccounts).where(eq(clientAccounts.id, id));
  if (!summary) throw notFound("That client account");
  const contacts = await db
    .select({
      id: clientContacts.id,
      name: clientContacts.name,
      email: clientContacts.email,
      phone: clientContacts.phone,
      note: clientContacts.note,
      isPrimary: clientContacts.isPrimary,
    })
    .from(clientContacts)
    .where(eq(clientContacts.clientAccountId, id))
    .orderBy(asc(clientContacts.position));
  const users = await db
    .select({ userId: user.id, name: user.name, email: user.email, active: clientUsers.active })
    .from(clientUsers)
    .innerJoin(user, eq(user.id, clientUsers.userId))
    .where(eq(clientUsers.clientAccountId, id))
    .orderBy(asc(user.name));
  const pending = await db
    .select()
    .from(invitations)
    .where(and(eq(invitations.clientAccountId, id), pendingInvitationsWhere()));
  return { ...summary, userCount: Number(summary.userCount), contacts, users, invitations: pending.map(toPendingDto) };
}

async function replaceContacts(tx: Tx, clientAccountId: number, contacts: ContactInput[]) {
  await tx.delete(clientContacts).where(eq(clientContacts.clientAccountId, clientAccountId));
  if (contacts.length === 0) return;
  const primaryIndex = Math.max(0, contacts.findIndex((c) => c.isPrimary));
  await tx.insert(clientContacts).values(
    contacts.map((c, position) => ({
      clientAccountId,
      name: c.name,
      email: orNull(c.email),
      phone: orNull(c.phone),
      note: orNull(c.note),
      isPrimary: position === primaryIndex,
      position,
    })),
  );
}

const nameTaken = (name: string) => conflict("client_exists", `A client called “${name}” already exists`);

export async function createClient(db: Db, actor: Actor, input: CreateClientInput): Promise<ClientDetailDto> {
  try {
    return await db.transaction(async (tx) => {
      const [created] = await tx
        .insert(clientAccounts)
        .values({
          name: input.name,
          kind: input.kind,
          email: orNull(input.email),
          phone: orNull(input.phone),
          billingAddress: orNull(input.billingAddress),
          notes: orNull(input.notes),
        })
        .$returningId();
      const id = created!.id;
      await replaceContacts(tx, id, input.contacts ?? []);
      const after = await getClient(tx, id);
      await writeAudit(tx, actor, "client.created", { type: "client_account", id }, { after });
      return after;
    });
  } catch (error) {
    if (isDuplicateKeyError(error)) throw nameTaken(input.name);
    throw error;
  }
}

export async function updateClient(db: Db, actor: Actor, id: number, input: UpdateClientInput): Promise<ClientDetailDto> {
  try {
    return await db.transaction(async (tx) => {
      const [locked] = await tx.select({ id: clientAccounts.id }).from(clientAccounts).where(eq(clientAccounts.id, id)).for("update");
      if (!locked) throw notFound("That client account");
      const before = await getClient(tx, id);
      const changes: Partial<ClientAccount> = {
        name: input.name,
        kind: input.kind,
        active: input.active,
        ...(input.email !== undefined ? { email: orNull(input.email) } : {}),
        ...(input.phone !== undefined ? { phone: orNull(input.phone) } : {}),
        ...(input.billingAddress !== undefined ? { billingAddress: orNull(input.billingAddress) } : {}),
        ...(input.notes !== undefined ? { notes: orNull(input.notes) } : {}),
      };
      if (Object.values(changes).some((v) => v !== undefined)) {
        await tx.update(clientAccounts).set(changes).where(eq(clientAccounts.id, id));
      }
      if (input.contacts) await replaceContacts(tx, id, input.contacts);
      const after = await getClient(tx, id);
      await writeAudit(tx, actor, "client.updated", { type: "client_account", id }, { before, after });
      return after;
    });
  } catch (error) {
    if (isDuplicateKeyError(error) && input.name) throw nameTaken(input.name);
    throw error;
  }
}

export async function inviteClientUser(deps: Deps, actor: Actor, clientAccountId: number, input: InviteClientUserInput) {
  const { invitation, token, accountName } = await deps.db.transaction(async (tx) => {
    const [account] = await tx.select().from(clientAccounts).where(eq(clientAccounts.id, clientAccountId));
    if (!account) throw notFound("That client account");
    if (!account.active) throw conflict("client_inactive", `${account.name} is archived; reactivate it first`);
    const created = await createInvitation(tx, actor, { ...input, role: "client", clientAccountId });
    return { ...created, accountName: account.name };
  });
  await sendInvitation(deps, actor, invitation, token, accountName);
  return toPendingDto(invitation);
}

export async function setClientUserActive(db: Db, actor: Actor, clientAccountId: number, userId: string, active: boolean) {
  return db.transaction(async (tx) => {
    const [row] = await tx
      .select()
      .from(clientUsers)
      .where(and(eq(clientUsers.userId, userId), eq(clientUsers.clientAccountId, clientAccountId)))
      .for("update");
    if (!row) throw notFound("That client sign-in");
    await tx.update(clientUsers).set({ active }).where(eq(clientUsers.userId, userId));
    if (!active) await tx.delete(session).where(eq(session.userId, userId));
    await writeAudit(tx, actor, active ? "client_user.reactivated" : "client_user.deactivated", { type: "user", id: userId }, {
      before: { active: row.active },
      after: { active },
    });
    return getClient(tx, clientAccountId);
  });
}
