import { createHash, randomBytes } from "node:crypto";
import { and, eq, gt, isNull } from "drizzle-orm";
import { generateId } from "better-auth";
import { hashPassword } from "better-auth/crypto";
import {
  account,
  clientAccounts,
  clientUsers,
  invitations,
  staffProfiles,
  user,
  type Db,
  type Invitation,
  type Tx,
} from "@takeup/db";
import type { InvitationDto, PendingInvitationDto, Role } from "@takeup/domain";
import { conflict, HttpError } from "../../lib/http-error.ts";
import { writeAudit } from "../../lib/audit.ts";
import type { Actor } from "../../lib/actor.ts";
import type { Deps } from "../../deps.ts";
import { invitationEmail } from "../../emails/invitation.ts";
import { loadStudio } from "../studio/studio.service.ts";

const invitationLifetimeMs = 7 * 24 * 60 * 60 * 1000;
const hashToken = (token: string) => createHash("sha256").update(token).digest("hex");

export const toPendingDto = (i: Invitation): PendingInvitationDto => ({
  id: i.id,
  name: i.name,
  email: i.email,
  role: i.role,
  expiresAt: i.expiresAt.toISOString(),
});

export const pendingInvitationsWhere = () =>
  and(isNull(invitations.acceptedAt), isNull(invitations.revokedAt), gt(invitations.expiresAt, new Date()));

/**
 * Writes an invitation (inside the caller's transaction) and returns its one-time token.
 * A newer invitation to the same address replaces any still pending.
 */
export async function createInvitation(
  tx: Tx,
  actor: Actor,
  input: { email: string; name: string; role: Role; clientAccountId: number | null },
): Promise<{ invitation: Invitation; token: string }> {
  const email = input.email.toLowerCase();
  const [existing] = await tx.select({ id: user.id }).from(user).where(eq(user.email, email)).limit(1);
  if (existing) throw conflict("email_taken", `${email} already has a sign-in at the studio`);
  await tx
    .update(invitations)
    .set({ revokedAt: new Date() })
    .where(and(eq(invitations.email, email), pendingInvitationsWhere()));
  const token = randomBytes(32).toString("base64url");
  const values = {
    email,
    name: input.name,
    role: input.role,
    clientAccountId: input.clientAccountId,
    tokenHash: hashToken(token),
    invitedByUserId: actor.userId,
    expiresAt: new Date(Date.now() + invitationLifetimeMs),
  };
  const [created] = await tx.insert(invitations).values(values).$returningId();
  const [invitation] = await tx.select().from(invitations).where(eq(invitations.id, created!.id));
  await writeAudit(tx, actor, "invitation.created", { type: "invitation", id: created!.id }, {
    after: { email, name: input.name, role: input.role, clientAccountId: input.clientAccountId },
  });
  return { invitation: invitation!, token };
}

export async function sendInvitation(deps: Deps, actor: Actor, invitation: Invitation, token: string, clientAccountName: string | null) {
  const studio = await loadStudio(deps.db);
  await deps.mailer.send(
    invitationEmail({
      studioName: studio.name,
      to: invitation.email,
      name: invitation.name,
      role: invitation.role,
      clientAccountName,
      invitedBy: actor.name,
      url: `${deps.config.appUrl}/invitations/${token}`,
      expiresAt: invitation.expiresAt,
    }),
  );
}

async function findUsable(db: Db | Tx, token: string) {
  const [row] = await db
    .select({ invitation: invitations, clientAccountName: clientAccounts.name })
    .from(invitations)
    .leftJoin(clientAccounts, eq(clientAccounts.id, invitations.clientAccountId))
    .where(and(eq(invitations.tokenHash, hashToken(token)), pendingInvitationsWhere()))
    .limit(1);
  if (!row) throw new HttpError(404, "invitation_not_found", "This invitation link has expired, was replaced or was already used");
  return row;
}

export async function getInvitation(db: Db, token: string): Promise<InvitationDto> {
  const { invitation, clientAccountName } = await findUsable(db, token);
  const studio = await loadStudio(db);
  return {
    name: invitation.name,
    email: invitation.email,
    role: invitation.role,
    studioName: studio.name,
    clientAccountName: clientAccountName ?? null,
    expiresAt: invitation.expiresAt.toISOString(),
  };
}

/** Creates the sign-in, its password and its role in one transaction; returns the e-mail. */
export async function acceptInvitation(db: Db, token: string, password: string): Promise<string> {
  const passwordHash = await hashPassword(password);
  return db.transaction(async (tx) => {
    const { invitation } = await findUsable(tx, token);
    await tx
      .select({ id: invitations.id })
      .from(invitations)
      .where(eq(invitations.id, invitation.id))
      .for("update");
    const [taken] = await tx.select({ id: user.id }).from(user).where(eq(user.email, invitation.email)).limit(1);
    if (taken) throw conflict("email_taken", `${invitation.email} already has a sign-in`);
    const userId = generateId();
    await tx.insert(user).values({ id: userId, email: invitation.email, name: invitation.name, emailVerified: true });
    await tx.insert(account).values({ id: generateId(), userId, accountId: userId, providerId: "credential", password: passwordHash });
    if (invitation.role === "client") {
      if (!invitation.clientAccountId) throw new HttpError(409, "invitation_broken", "This invitation has no client account");
      await tx.insert(clientUsers).values({ userId, clientAccountId: invitation.clientAccountId });
    } else {
      await tx.insert(staffProfiles).values({ userId, role: invitation.role, displayName: invitation.name });
    }
    const updated = await tx
      .update(invitations)
      .set({ acceptedAt: new Date() })
      .where(and(eq(invitations.id, invitation.id), isNull(invitations.acceptedAt)));
    if (updated[0].affectedRows !== 1) throw new HttpError(409, "invitation_used", "This invitation was just used");
    await writeAudit(tx, { userId }, "invitation.accepted", { type: "invitation", id: invitation.id }, {
      after: { userId, role: invitation.role },
    });
    return invitation.email;
  });
}
