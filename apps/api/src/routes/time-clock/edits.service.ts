import { and, desc, eq, gt, isNull, lt, ne, or } from "drizzle-orm";
import { bookingEngineers, staffProfiles, timeEntries, timeEntryBreaks, timeEntryEdits, user, type Db, type ProposedEntry, type Tx } from "@takeup/db";
import type { ProposeEditInput, TimeEntryEditDto } from "@takeup/domain";
import { conflict, HttpError, notFound } from "../../lib/http-error.ts";
import { writeAudit } from "../../lib/audit.ts";
import type { Actor } from "../../lib/actor.ts";
import { loadPayroll } from "../payroll/payroll-settings.ts";
import { assertPeriodsOpen } from "../payroll/period-guard.ts";

const problem = (field: string, message: string) => new HttpError(400, "invalid_input", message, [{ field, rule: "time_order", message }]);

function checkShape(p: ProposedEntry) {
  const start = new Date(p.startedAt);
  const end = new Date(p.endedAt);
  if (end <= start) throw problem("endedAt", "The end must be after the start");
  if (end.getTime() - start.getTime() > 24 * 3_600_000) throw problem("endedAt", "An entry lasts at most 24 hours; split longer work into two entries");
  for (const [i, b] of p.breaks.entries()) {
    if (new Date(b.endedAt) <= new Date(b.startedAt)) throw problem(`breaks.${i}.endedAt`, "A break ends after it starts");
    if (new Date(b.startedAt) < start || new Date(b.endedAt) > end) throw problem(`breaks.${i}`, "A break falls within the entry");
  }
}

async function toDtos(db: Db | Tx, where: ReturnType<typeof and>): Promise<TimeEntryEditDto[]> {
  const rows = await db
    .select({ edit: timeEntryEdits, staffName: staffProfiles.displayName, entry: timeEntries, decidedByName: user.name })
    .from(timeEntryEdits)
    .innerJoin(staffProfiles, eq(staffProfiles.userId, timeEntryEdits.staffUserId))
    .leftJoin(timeEntries, eq(timeEntries.id, timeEntryEdits.timeEntryId))
    .leftJoin(user, eq(user.id, timeEntryEdits.decidedByUserId))
    .where(where)
    .orderBy(desc(timeEntryEdits.id))
    .limit(500);
  const result: TimeEntryEditDto[] = [];
  for (const { edit, staffName, entry, decidedByName } of rows) {
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
      decidedByName: decidedByName ?? null,
      decidedAt: edit.decidedAt?.toISOString() ?? null,
      decisionNote: edit.decisionNote,
      createdAt: edit.createdAt.toISOString(),
    });
  }
  return result;
}

export const listEdits = (db: Db, actor: Actor, status?: "pending" | "approved" | "rejected") =>
  toDtos(db, and(status ? eq(timeEntryEdits.status, status) : undefined, actor.role === "engineer" ? eq(timeEntryEdits.staffUserId, actor.userId) : undefined));

/** An engineer proposes a correction to their own entry, or a missing entry; nothing changes until approved. */
export async function proposeEdit(db: Db, actor: Actor, input: ProposeEditInput): Promise<TimeEntryEditDto> {
  const proposed: ProposedEntry = { startedAt: input.startedAt, endedAt: input.endedAt, breaks: input.breaks ?? [], bookingId: input.bookingId ?? null };
  checkShape(proposed);
  const payroll = await loadPayroll(db);
  const id = await db.transaction(async (tx) => {
    const touched = [new Date(proposed.startedAt), new Date(proposed.endedAt)];
    if (input.timeEntryId) {
      const [entry] = await tx.select().from(timeEntries).where(eq(timeEntries.id, input.timeEntryId));
      if (!entry || (actor.role === "engineer" && entry.staffUserId !== actor.userId)) throw notFound("That time entry");
      if (!entry.endedAt) throw conflict("entry_open", "Clock out before correcting this entry");
      const [pending] = await tx.select().from(timeEntryEdits).where(and(eq(timeEntryEdits.timeEntryId, entry.id), eq(timeEntryEdits.status, "pending")));
      if (pending) throw conflict("edit_pending", "A correction to this entry is already waiting for a decision");
      touched.push(entry.startedAt, entry.endedAt);
    }
    // Refused now rather than at approval: a correction nobody may approve would only wait forever
    // and keep the period from being closed again after an unlock.
    await assertPeriodsOpen(tx, payroll, touched);
    const [created] = await tx.insert(timeEntryEdits).values({ timeEntryId: input.timeEntryId ?? null, staffUserId: actor.userId, proposed, reason: input.reason }).$returningId();
    await writeAudit(tx, actor, "time_edit.proposed", { type: "time_entry_edit", id: created!.id }, { after: { timeEntryId: input.timeEntryId ?? null, proposed, reason: input.reason } });
    return created!.id;
  });
  return (await toDtos(db, and(eq(timeEntryEdits.id, id))))[0]!;
}

/** A manager or owner decides; an approval writes the change, keeping before and after in the audit log. */
export async function decideEdit(db: Db, actor: Actor, id: number, decision: "approved" | "rejected", note?: string): Promise<TimeEntryEditDto> {
  const payroll = await loadPayroll(db);
  await db.transaction(async (tx) => {
    const [edit] = await tx.select().from(timeEntryEdits).where(eq(timeEntryEdits.id, id)).for("update");
    if (!edit) throw notFound("That correction");
    if (edit.status !== "pending") throw conflict("edit_decided", `This correction was already ${edit.status}`);
    if (decision === "approved") await applyEdit(tx, actor, edit, payroll);
    await tx.update(timeEntryEdits).set({ status: decision, decidedByUserId: actor.userId, decidedAt: new Date(), decisionNote: note?.trim() || null }).where(eq(timeEntryEdits.id, id));
    await writeAudit(tx, actor, `time_edit.${decision}`, { type: "time_entry_edit", id }, { before: { status: "pending" }, after: { status: decision, note: note ?? null } });
  });
  return (await toDtos(db, and(eq(timeEntryEdits.id, id))))[0]!;
}

async function applyEdit(tx: Tx, actor: Actor, edit: typeof timeEntryEdits.$inferSelect, payroll: Awaited<ReturnType<typeof loadPayroll>>) {
  const p = edit.proposed;
  const start = new Date(p.startedAt);
  const end = new Date(p.endedAt);
  const [person] = await tx.select().from(staffProfiles).where(eq(staffProfiles.userId, edit.staffUserId)).for("update");
  if (!person) throw notFound("That member of staff");
  const [before] = edit.timeEntryId ? await tx.select().from(timeEntries).where(eq(timeEntries.id, edit.timeEntryId)).for("update") : [];
  await assertPeriodsOpen(tx, payroll, [start, end, ...(before ? [before.startedAt, before.endedAt ?? before.startedAt] : [])]);
  const [overlap] = await tx
    .select({ id: timeEntries.id })
    .from(timeEntries)
    .where(
      and(
        eq(timeEntries.staffUserId, edit.staffUserId),
        lt(timeEntries.startedAt, end),
        or(isNull(timeEntries.endedAt), gt(timeEntries.endedAt, start)),
        before ? ne(timeEntries.id, before.id) : undefined,
      ),
    )
    .limit(1);
  if (overlap) throw conflict("entry_overlap", "The corrected times overlap another of this person's entries");
  if (p.bookingId) {
    const [on] = await tx.select().from(bookingEngineers).where(and(eq(bookingEngineers.bookingId, p.bookingId), eq(bookingEngineers.staffUserId, edit.staffUserId)));
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
      .values({ staffUserId: edit.staffUserId, bookingId: p.bookingId, kind: p.bookingId ? "session" : "shop", payRateCode: person.engineerGrade ?? "engineer", startedAt: start, endedAt: end, source: "manual", note: `Added: ${edit.reason}`.slice(0, 500), createdByUserId: actor.userId })
      .$returningId();
    entryId = created!.id;
  }
  if (p.breaks.length) await tx.insert(timeEntryBreaks).values(p.breaks.map((b) => ({ timeEntryId: entryId!, startedAt: new Date(b.startedAt), endedAt: new Date(b.endedAt) })));
  await writeAudit(tx, actor, before ? "time_entry.corrected" : "time_entry.added_manually", { type: "time_entry", id: entryId! }, {
    before: before ? { startedAt: before.startedAt, endedAt: before.endedAt, bookingId: before.bookingId } : null,
    after: { startedAt: start, endedAt: end, bookingId: p.bookingId, breaks: p.breaks },
  });
}
