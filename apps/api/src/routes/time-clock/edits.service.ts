import { and, count, desc, eq, gt, isNull, lt, ne, or } from "drizzle-orm";
import { alias } from "drizzle-orm/mysql-core";
import { bookingEngineers, staffProfiles, timeEntries, timeEntryBreaks, timeEntryEdits, user, type Db, type ProposedEntry, type Tx } from "@takeup/db";
import { timeDateProblem, type ApprovalRule, type ProposeEditInput, type Role, type StaffRole, type TimeEntryEditDto } from "@takeup/domain";
import { conflict, HttpError, notFound } from "../../lib/http-error.ts";
import { writeAudit } from "../../lib/audit.ts";
import type { Actor } from "../../lib/actor.ts";
import { loadPayroll } from "../payroll/payroll-settings.ts";
import { assertPeriodsOpen } from "../payroll/period-guard.ts";

const problem = (field: string, message: string) => new HttpError(400, "invalid_input", message, [{ field, rule: "time_order", message }]);

function checkShape(p: ProposedEntry) {
  const start = new Date(p.startedAt);
  const end = new Date(p.endedAt);
  const outside = [timeDateProblem("startedAt", start), timeDateProblem("endedAt", end)].filter((x) => x !== null);
  if (outside.length > 0) throw new HttpError(400, "invalid_input", outside[0]!.message, outside);
  if (end <= start) throw problem("endedAt", "The end must be after the start");
  if (end.getTime() - start.getTime() > 24 * 3_600_000) throw problem("endedAt", "An entry lasts at most 24 hours; split longer work into two entries");
  for (const [i, b] of p.breaks.entries()) {
    if (new Date(b.endedAt) <= new Date(b.startedAt)) throw problem(`breaks.${i}.endedAt`, "A break ends after it starts");
    if (new Date(b.startedAt) < start || new Date(b.endedAt) > end) throw problem(`breaks.${i}`, "A break falls within the entry");
  }
}

const proposer = alias(user, "proposer");

/** Active owners other than this person: with none, an owner's own correction is self-approved. */
async function otherOwners(db: Db | Tx, userId: string): Promise<number> {
  const [row] = await db
    .select({ n: count() })
    .from(staffProfiles)
    .where(and(eq(staffProfiles.role, "owner"), eq(staffProfiles.active, true), ne(staffProfiles.userId, userId)));
  return Number(row?.n ?? 0);
}

/** Who may approve a change to whose time (decision 011). */
function approvalRule(viewer: { userId: string; role: Role }, person: { userId: string; role: StaffRole }, otherOwnerCount: number): ApprovalRule {
  if (viewer.role !== "owner" && viewer.role !== "manager") return "cannot_decide";
  if (viewer.userId === person.userId) {
    if (viewer.role === "manager") return "own_time";
    return otherOwnerCount > 0 ? "another_owner" : "self_approval";
  }
  if (person.role === "owner" && viewer.role !== "owner") return "owners_only";
  return "may_approve";
}

const refusal: Record<Exclude<ApprovalRule, "may_approve" | "self_approval">, HttpError> = {
  own_time: new HttpError(403, "own_time", "Nobody approves a change to your own time: an owner or another manager decides"),
  another_owner: new HttpError(403, "own_time", "Nobody approves a change to your own time: another owner decides"),
  owners_only: new HttpError(403, "owner_time", "An owner's time is approved by another owner, or self-approved by the sole owner"),
  cannot_decide: new HttpError(403, "forbidden", "Only an owner or a manager decides corrections"),
};

async function toDtos(db: Db | Tx, viewer: Actor, where: ReturnType<typeof and>): Promise<TimeEntryEditDto[]> {
  const rows = await db
    .select({ edit: timeEntryEdits, staffName: staffProfiles.displayName, staffRole: staffProfiles.role, entry: timeEntries, decidedByName: user.name, proposedByName: proposer.name })
    .from(timeEntryEdits)
    .innerJoin(staffProfiles, eq(staffProfiles.userId, timeEntryEdits.staffUserId))
    .leftJoin(timeEntries, eq(timeEntries.id, timeEntryEdits.timeEntryId))
    .leftJoin(user, eq(user.id, timeEntryEdits.decidedByUserId))
    .leftJoin(proposer, eq(proposer.id, timeEntryEdits.proposedByUserId))
    .where(where)
    .orderBy(desc(timeEntryEdits.id))
    .limit(500);
  const others = viewer.role === "owner" ? await otherOwners(db, viewer.userId) : 0;
  const result: TimeEntryEditDto[] = [];
  for (const { edit, staffName, staffRole, entry, decidedByName, proposedByName } of rows) {
    const breaks = entry ? await db.select().from(timeEntryBreaks).where(eq(timeEntryBreaks.timeEntryId, entry.id)) : [];
    result.push({
      id: edit.id,
      timeEntryId: edit.timeEntryId,
      staffUserId: edit.staffUserId,
      staffName,
      proposed: edit.proposed,
      current: entry
        ? { startedAt: entry.startedAt.toISOString(), endedAt: entry.endedAt?.toISOString() ?? null, breaks: breaks.map((b) => ({ startedAt: b.startedAt.toISOString(), endedAt: b.endedAt?.toISOString() ?? null })) }
        : null,
      reason: edit.reason,
      status: edit.status,
      proposedByName: proposedByName ?? null,
      approvalRule: approvalRule(viewer, { userId: edit.staffUserId, role: staffRole }, others),
      selfApproved: edit.selfApproved,
      decidedByName: decidedByName ?? null,
      decidedAt: edit.decidedAt?.toISOString() ?? null,
      decisionNote: edit.decisionNote,
      createdAt: edit.createdAt.toISOString(),
    });
  }
  return result;
}

export const listEdits = (db: Db, actor: Actor, status?: "pending" | "approved" | "rejected") =>
  toDtos(db, actor, and(status ? eq(timeEntryEdits.status, status) : undefined, actor.role === "engineer" ? eq(timeEntryEdits.staffUserId, actor.userId) : undefined));

/**
 * Someone proposes a correction to an entry (an engineer only to their own), or a missing entry of
 * their own; nothing changes until approved. The correction is recorded for the person whose entry it is.
 */
export async function proposeEdit(db: Db, actor: Actor, input: ProposeEditInput): Promise<TimeEntryEditDto> {
  const proposed: ProposedEntry = { startedAt: input.startedAt, endedAt: input.endedAt, breaks: input.breaks ?? [], bookingId: input.bookingId ?? null };
  checkShape(proposed);
  const payroll = await loadPayroll(db);
  const id = await db.transaction(async (tx) => {
    const touched = [new Date(proposed.startedAt), new Date(proposed.endedAt)];
    let staffUserId = actor.userId;
    if (input.timeEntryId) {
      const [entry] = await tx.select().from(timeEntries).where(eq(timeEntries.id, input.timeEntryId));
      if (!entry || (actor.role === "engineer" && entry.staffUserId !== actor.userId)) throw notFound("That time entry");
      if (!entry.endedAt) throw conflict("entry_open", "Clock out before correcting this entry");
      const [pending] = await tx.select().from(timeEntryEdits).where(and(eq(timeEntryEdits.timeEntryId, entry.id), eq(timeEntryEdits.status, "pending")));
      if (pending) throw conflict("edit_pending", "A correction to this entry is already waiting for a decision");
      touched.push(entry.startedAt, entry.endedAt);
      staffUserId = entry.staffUserId;
    }
    // Refused now rather than at approval: a correction nobody may approve would only wait forever
    // and keep the period from being closed again after an unlock.
    await assertPeriodsOpen(tx, payroll, touched);
    const [created] = await tx.insert(timeEntryEdits).values({ timeEntryId: input.timeEntryId ?? null, staffUserId, proposedByUserId: actor.userId, proposed, reason: input.reason }).$returningId();
    await writeAudit(tx, actor, "time_edit.proposed", { type: "time_entry_edit", id: created!.id }, { after: { timeEntryId: input.timeEntryId ?? null, staffUserId, proposed, reason: input.reason } });
    return created!.id;
  });
  return (await toDtos(db, actor, and(eq(timeEntryEdits.id, id))))[0]!;
}

/**
 * A manager or owner decides; an approval writes the change, keeping before and after in the audit
 * log. Nobody approves a change to their own time; the sole owner's own is recorded as self-approved.
 */
export async function decideEdit(db: Db, actor: Actor, id: number, decision: "approved" | "rejected", note?: string): Promise<TimeEntryEditDto> {
  const payroll = await loadPayroll(db);
  await db.transaction(async (tx) => {
    const [edit] = await tx.select().from(timeEntryEdits).where(eq(timeEntryEdits.id, id)).for("update");
    if (!edit) throw notFound("That correction");
    if (edit.status !== "pending") throw conflict("edit_decided", `This correction was already ${edit.status}`);
    let selfApproved = false;
    let resultEntryId: number | null = null;
    if (decision === "approved") {
      const [person] = await tx.select().from(staffProfiles).where(eq(staffProfiles.userId, edit.staffUserId));
      if (!person) throw notFound("That member of staff");
      // Read in the transaction: an owner made or removed meanwhile changes who may decide.
      const rule = approvalRule(actor, person, actor.role === "owner" ? await otherOwners(tx, actor.userId) : 0);
      if (rule !== "may_approve" && rule !== "self_approval") throw refusal[rule];
      selfApproved = rule === "self_approval";
      resultEntryId = await applyEdit(tx, actor, edit, payroll);
    }
    await tx.update(timeEntryEdits).set({ status: decision, decidedByUserId: actor.userId, decidedAt: new Date(), decisionNote: note?.trim() || null, selfApproved, resultEntryId }).where(eq(timeEntryEdits.id, id));
    await writeAudit(tx, actor, `time_edit.${decision}`, { type: "time_entry_edit", id }, { before: { status: "pending" }, after: { status: decision, note: note ?? null, selfApproved } });
  });
  return (await toDtos(db, actor, and(eq(timeEntryEdits.id, id))))[0]!;
}

/** Writes an approved correction, checking periods and overlaps for the person whose time it is; returns the entry written. */
async function applyEdit(tx: Tx, actor: Actor, edit: typeof timeEntryEdits.$inferSelect, payroll: Awaited<ReturnType<typeof loadPayroll>>): Promise<number> {
  const p = edit.proposed;
  const start = new Date(p.startedAt);
  const end = new Date(p.endedAt);
  const [before] = edit.timeEntryId ? await tx.select().from(timeEntries).where(eq(timeEntries.id, edit.timeEntryId)).for("update") : [];
  // The entry's own person, whoever proposed the change (older rows recorded the proposer instead).
  const personId = before?.staffUserId ?? edit.staffUserId;
  const [person] = await tx.select().from(staffProfiles).where(eq(staffProfiles.userId, personId)).for("update");
  if (!person) throw notFound("That member of staff");
  await assertPeriodsOpen(tx, payroll, [start, end, ...(before ? [before.startedAt, before.endedAt ?? before.startedAt] : [])]);
  const [overlap] = await tx
    .select({ id: timeEntries.id })
    .from(timeEntries)
    .where(
      and(
        eq(timeEntries.staffUserId, personId),
        lt(timeEntries.startedAt, end),
        or(isNull(timeEntries.endedAt), gt(timeEntries.endedAt, start)),
        before ? ne(timeEntries.id, before.id) : undefined,
      ),
    )
    .limit(1);
  if (overlap) throw conflict("entry_overlap", "The corrected times overlap another of this person's entries");
  if (p.bookingId) {
    const [on] = await tx.select().from(bookingEngineers).where(and(eq(bookingEngineers.bookingId, p.bookingId), eq(bookingEngineers.staffUserId, personId)));
    if (!on) throw new HttpError(422, "not_on_booking", "The person is not booked on that session");
  }
  let entryId = before?.id;
  const note = `Corrected: ${edit.reason}`.slice(0, 500);
  if (before) {
    await tx.update(timeEntries).set({ startedAt: start, endedAt: end, bookingId: p.bookingId, kind: p.bookingId ? "session" : "shop", note }).where(eq(timeEntries.id, before.id));
    await tx.delete(timeEntryBreaks).where(eq(timeEntryBreaks.timeEntryId, before.id));
  } else {
    const [created] = await tx
      .insert(timeEntries)
      .values({ staffUserId: personId, bookingId: p.bookingId, kind: p.bookingId ? "session" : "shop", payRateCode: person.engineerGrade ?? "engineer", startedAt: start, endedAt: end, source: "manual", note: `Added: ${edit.reason}`.slice(0, 500), createdByUserId: actor.userId })
      .$returningId();
    entryId = created!.id;
  }
  if (p.breaks.length) await tx.insert(timeEntryBreaks).values(p.breaks.map((b) => ({ timeEntryId: entryId!, startedAt: new Date(b.startedAt), endedAt: new Date(b.endedAt) })));
  await writeAudit(tx, actor, before ? "time_entry.corrected" : "time_entry.added_manually", { type: "time_entry", id: entryId! }, {
    before: before ? { startedAt: before.startedAt, endedAt: before.endedAt, bookingId: before.bookingId } : null,
    after: { startedAt: start, endedAt: end, bookingId: p.bookingId, breaks: p.breaks },
  });
  return entryId!;
}
