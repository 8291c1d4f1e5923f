import { and, asc, eq, ne, sql } from "drizzle-orm";
import { invitations, session, staffProfiles, user, type Db } from "@takeup/db";
import type { InviteStaffInput, StaffListDto, StaffMemberDto, UpdateStaffInput } from "@takeup/domain";
import { conflict, notFound } from "../../lib/http-error.ts";
import { writeAudit } from "../../lib/audit.ts";
import type { Actor } from "../../lib/actor.ts";
import type { Deps } from "../../deps.ts";
import { createInvitation, pendingInvitationsWhere, sendInvitation, toPendingDto } from "../invitations/invitations.service.ts";

const memberColumns = {
  userId: staffProfiles.userId,
  name: staffProfiles.displayName,
  email: user.email,
  role: staffProfiles.role,
  active: staffProfiles.active,
  joinedAt: staffProfiles.createdAt,
};

const toMemberDto = (row: { joinedAt: Date } & Omit<StaffMemberDto, "joinedAt">): StaffMemberDto => ({
  ...row,
  joinedAt: row.joinedAt.toISOString(),
});

export async function listStaff(db: Db): Promise<StaffListDto> {
  const members = await db
    .select(memberColumns)
    .from(staffProfiles)
    .innerJoin(user, eq(user.id, staffProfiles.userId))
    .orderBy(asc(staffProfiles.displayName));
  const pending = await db
    .select()
    .from(invitations)
    .where(and(ne(invitations.role, "client"), pendingInvitationsWhere()))
    .orderBy(asc(invitations.createdAt));
  return { members: members.map(toMemberDto), invitations: pending.map(toPendingDto) };
}

export async function inviteStaff(deps: Deps, actor: Actor, input: InviteStaffInput) {
  const { invitation, token } = await deps.db.transaction((tx) =>
    createInvitation(tx, actor, { ...input, clientAccountId: null }),
  );
  await sendInvitation(deps, actor, invitation, token, null);
  return toPendingDto(invitation);
}

/** Changes a role or (de)activates a member; the studio always keeps one active owner. */
export async function updateStaff(db: Db, actor: Actor, userId: string, input: UpdateStaffInput): Promise<StaffMemberDto> {
  return db.transaction(async (tx) => {
    // Lock every owner row so two owners cannot demote each other at the same moment.
    await tx.select({ id: staffProfiles.userId }).from(staffProfiles).where(eq(staffProfiles.role, "owner")).for("update");
    const [before] = await tx
      .select(memberColumns)
      .from(staffProfiles)
      .innerJoin(user, eq(user.id, staffProfiles.userId))
      .where(eq(staffProfiles.userId, userId))
      .for("update");
    if (!before) throw notFound("That member of staff");
    const nextRole = input.role ?? before.role;
    const nextActive = input.active ?? before.active;
    if (before.role === "owner" && before.active && (nextRole !== "owner" || !nextActive)) {
      const [{ owners } = { owners: 0 }] = await tx
        .select({ owners: sql<number>`count(*)` })
        .from(staffProfiles)
        .where(and(eq(staffProfiles.role, "owner"), eq(staffProfiles.active, true)));
      if (Number(owners) <= 1) {
        throw conflict("last_owner", "The studio needs at least one active owner: make someone else owner first");
      }
    }
    await tx.update(staffProfiles).set({ role: nextRole, active: nextActive }).where(eq(staffProfiles.userId, userId));
    if (!nextActive) await tx.delete(session).where(eq(session.userId, userId));
    const after = { ...before, role: nextRole, active: nextActive };
    const action = before.active && !nextActive ? "staff.deactivated" : !before.active && nextActive ? "staff.reactivated" : "staff.role_changed";
    await writeAudit(tx, actor, action, { type: "staff", id: userId }, {
      before: { role: before.role, active: before.active },
      after: { role: after.role, active: after.active },
    });
    return toMemberDto(after);
  });
}
