import { randomUUID } from "node:crypto";
import { and, asc, desc, eq, inArray, like, max, ne, or, type SQL } from "drizzle-orm";
import { DateTime } from "luxon";
import {
  bookingEngineers,
  bookings,
  clientAccounts,
  projects,
  reelMovements,
  reels,
  reelSongs,
  reelTracks,
  staffProfiles,
  storageCharges,
  studio,
  type Db,
  type DbOrTx,
} from "@takeup/db";
import {
  feeStartDate,
  labelIdFor,
  readLabelId,
  type CheckInInput,
  type CheckOutInput,
  type CreateReelInput,
  type ReelDetailDto,
  type ReelStatus,
  type ReelSummaryDto,
  type ReleaseInput,
  type TrackSheetInput,
  type UpdateReelInput,
} from "@takeup/domain";
import type { Actor } from "../../lib/actor.ts";
import { writeAudit } from "../../lib/audit.ts";
import { assertClientScope } from "../../lib/client-scope.ts";
import { HttpError, notFound } from "../../lib/http-error.ts";

const badField = (field: string, rule: string, message: string) => new HttpError(400, "invalid_input", message, [{ field, rule, message }]);

const summaryColumns = {
  id: reels.id,
  labelId: reels.labelId,
  clientAccountId: reels.clientAccountId,
  clientName: clientAccounts.name,
  projectId: reels.projectId,
  projectName: projects.name,
  tapeProductId: reels.tapeProductId,
  trackCount: reels.trackCount,
  tapeWidthMils: reels.tapeWidthMils,
  speedIps: reels.speedIps,
  noiseReduction: reels.noiseReduction,
  referenceLevel: reels.referenceLevel,
  recordedOn: reels.recordedOn,
  contentsNote: reels.contentsNote,
  shelf: reels.shelf,
  status: reels.status,
};

type SummaryRow = Omit<ReelSummaryDto, "dueBack">;

async function selectSummaries(db: DbOrTx, where: SQL | undefined, limit = 2000): Promise<ReelSummaryDto[]> {
  const rows: SummaryRow[] = await db
    .select(summaryColumns)
    .from(reels)
    .innerJoin(clientAccounts, eq(clientAccounts.id, reels.clientAccountId))
    .leftJoin(projects, eq(projects.id, reels.projectId))
    .where(where)
    .orderBy(asc(reels.labelId))
    .limit(limit);
  const out = rows.filter((r) => r.status === "checked_out").map((r) => r.id);
  const due = new Map<number, string | null>();
  if (out.length) {
    const moves = await db
      .select({ reelId: reelMovements.reelId, dueBack: reelMovements.dueBack, id: reelMovements.id })
      .from(reelMovements)
      .where(and(inArray(reelMovements.reelId, out), eq(reelMovements.kind, "check_out")))
      .orderBy(asc(reelMovements.id));
    for (const m of moves) due.set(m.reelId, m.dueBack);
  }
  return rows.map((r) => ({ ...r, dueBack: due.get(r.id) ?? null }));
}

export async function listReels(db: Db, actor: Actor, query: { clientAccountId?: number; status?: ReelStatus; q?: string }): Promise<ReelSummaryDto[]> {
  const filters: (SQL | undefined)[] = [];
  if (actor.role === "client") filters.push(eq(reels.clientAccountId, actor.clientAccountId ?? 0));
  if (query.clientAccountId) filters.push(eq(reels.clientAccountId, query.clientAccountId));
  if (query.status) filters.push(eq(reels.status, query.status));
  const q = query.q?.trim();
  if (q) {
    const pattern = `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    filters.push(or(like(reels.labelId, pattern), like(reels.shelf, pattern), like(reels.contentsNote, pattern), like(projects.name, pattern), like(clientAccounts.name, pattern)));
  }
  return selectSummaries(db, and(...filters));
}

async function summaryOrNotFound(db: DbOrTx, actor: Actor, id: number): Promise<ReelSummaryDto> {
  const [row] = await selectSummaries(db, eq(reels.id, id), 1);
  if (!row) throw notFound("That reel");
  assertClientScope(actor, row.clientAccountId, "That reel");
  return row;
}

export async function findReelByLabel(db: Db, actor: Actor, label: string): Promise<ReelSummaryDto> {
  const scan = readLabelId(label);
  if (!scan.ok) throw badField("label", "label_id", scan.problem);
  const [row] = await selectSummaries(db, eq(reels.labelId, scan.labelId), 1);
  if (!row) throw notFound(`Reel ${scan.labelId}`);
  assertClientScope(actor, row.clientAccountId, "That reel");
  return row;
}

const twoDigits = (n: number) => String(n).padStart(2, "0");
export const formatReelPosition = (seconds: number) => `${twoDigits(Math.floor(seconds / 60))}:${twoDigits(seconds % 60)}`;
const readReelPosition = (text: string) => {
  const [m, s] = text.split(":").map(Number) as [number, number];
  return m * 60 + s;
};

async function loadVaultSettings(db: DbOrTx) {
  const [row] = await db
    .select({ timeZone: studio.timeZone, freeDays: studio.storageFreeDays, monthlyFeeCents: studio.storageMonthlyFeeCents })
    .from(studio)
    .where(eq(studio.id, 1));
  if (!row) throw new HttpError(503, "studio_not_set_up", "The studio has not been set up yet (run the seed)");
  return row;
}

/**
 * The studio-local day of the project's last session (held, confirmed, running or wrapped — not
 * cancelled), or the day the reel was recorded when it has no project or sessions.
 */
export async function lastSessionDay(db: DbOrTx, reel: { projectId: number | null; recordedOn: string | null }, timeZone: string): Promise<string | null> {
  if (reel.projectId) {
    const [row] = await db
      .select({ last: max(bookings.endsAt) })
      .from(bookings)
      .where(and(eq(bookings.projectId, reel.projectId), inArray(bookings.status, ["confirmed", "in_session", "wrapped"])));
    if (row?.last) return DateTime.fromJSDate(new Date(row.last), { zone: timeZone }).toISODate();
  }
  return reel.recordedOn;
}

/** An engineer may fill in a reel's track sheet when they are on one of its project's sessions. */
async function engineerOnProject(db: DbOrTx, userId: string, projectId: number | null): Promise<boolean> {
  if (!projectId) return false;
  const [row] = await db
    .select({ id: bookings.id })
    .from(bookingEngineers)
    .innerJoin(bookings, eq(bookings.id, bookingEngineers.bookingId))
    .where(and(eq(bookingEngineers.staffUserId, userId), eq(bookings.projectId, projectId), ne(bookings.status, "cancelled")))
    .limit(1);
  return Boolean(row);
}

async function mayEditTrackSheet(db: DbOrTx, actor: Actor, reel: { projectId: number | null }) {
  if (actor.role === "owner" || actor.role === "manager") return true;
  if (actor.role === "engineer") return engineerOnProject(db, actor.userId, reel.projectId);
  return false;
}

export async function getReel(db: DbOrTx, actor: Actor, id: number): Promise<ReelDetailDto> {
  const summary = await summaryOrNotFound(db, actor, id);
  const [tracks, songs, movements, charges, settings] = await Promise.all([
    db.select({ trackNo: reelTracks.trackNo, contents: reelTracks.contents }).from(reelTracks).where(eq(reelTracks.reelId, id)).orderBy(asc(reelTracks.trackNo)),
    db.select().from(reelSongs).where(eq(reelSongs.reelId, id)).orderBy(asc(reelSongs.position)),
    db
      .select({ id: reelMovements.id, kind: reelMovements.kind, person: reelMovements.person, reason: reelMovements.reason, dueBack: reelMovements.dueBack, at: reelMovements.at, recordedBy: staffProfiles.displayName })
      .from(reelMovements)
      .leftJoin(staffProfiles, eq(staffProfiles.userId, reelMovements.recordedByUserId))
      .where(eq(reelMovements.reelId, id))
      .orderBy(desc(reelMovements.at), desc(reelMovements.id)),
    db.select({ id: storageCharges.id, month: storageCharges.month, amountCents: storageCharges.amountCents }).from(storageCharges).where(eq(storageCharges.reelId, id)).orderBy(asc(storageCharges.month)),
    loadVaultSettings(db),
  ]);
  const lastDay = await lastSessionDay(db, summary, settings.timeZone);
  return {
    ...summary,
    tracks,
    songs: songs.map((s) => ({ title: s.title, start: formatReelPosition(s.startSeconds), keptTakes: s.keptTakes })),
    movements: movements.map((m) => ({ ...m, at: m.at.toISOString(), recordedBy: m.recordedBy ?? null })),
    feesFrom: lastDay ? feeStartDate(lastDay, settings.freeDays) : null,
    storageCharges: charges,
    canEditTrackSheet: await mayEditTrackSheet(db, actor, summary),
  };
}

async function checkOwnerAndProject(db: DbOrTx, clientAccountId: number, projectId: number | null | undefined) {
  const [client] = await db.select({ id: clientAccounts.id }).from(clientAccounts).where(eq(clientAccounts.id, clientAccountId));
  if (!client) throw badField("clientAccountId", "exists", "Choose a client account that exists");
  if (projectId) {
    const [project] = await db.select({ clientAccountId: projects.clientAccountId }).from(projects).where(eq(projects.id, projectId));
    if (!project || project.clientAccountId !== clientAccountId) throw badField("projectId", "client_project", "Choose one of this client's projects");
  }
}

const blankToNull = (v: string | undefined) => (v === undefined ? undefined : v.trim() === "" ? null : v.trim());

function reelValues(input: UpdateReelInput) {
  return {
    clientAccountId: input.clientAccountId,
    projectId: input.projectId,
    tapeProductId: input.tapeProductId,
    trackCount: input.trackCount,
    tapeWidthMils: input.tapeWidthMils,
    speedIps: input.speedIps,
    noiseReduction: input.noiseReduction,
    referenceLevel: blankToNull(input.referenceLevel),
    recordedOn: input.recordedOn,
    contentsNote: blankToNull(input.contentsNote),
    shelf: blankToNull(input.shelf),
  };
}

export async function createReel(db: Db, actor: Actor, input: CreateReelInput): Promise<ReelDetailDto> {
  return db.transaction(async (tx) => {
    await checkOwnerAndProject(tx, input.clientAccountId, input.projectId);
    // The label id comes from the reel's own id, known once the row exists.
    const [created] = await tx
      .insert(reels)
      .values({ ...reelValues(input), clientAccountId: input.clientAccountId, trackCount: input.trackCount, tapeWidthMils: input.tapeWidthMils, speedIps: input.speedIps, labelId: `new-${randomUUID()}`.slice(0, 24) })
      .$returningId();
    const id = created!.id;
    await tx.update(reels).set({ labelId: labelIdFor(id) }).where(eq(reels.id, id));
    const after = await getReel(tx, actor, id);
    await writeAudit(tx, actor, "reel.created", { type: "reel", id }, { after });
    return after;
  });
}

async function lockReel(tx: DbOrTx, actor: Actor, id: number) {
  const [row] = await tx.select().from(reels).where(eq(reels.id, id)).for("update");
  if (!row) throw notFound("That reel");
  assertClientScope(actor, row.clientAccountId, "That reel");
  return row;
}

export async function updateReel(db: Db, actor: Actor, id: number, input: UpdateReelInput): Promise<ReelDetailDto> {
  return db.transaction(async (tx) => {
    const row = await lockReel(tx, actor, id);
    const changes = Object.fromEntries(Object.entries(reelValues(input)).filter(([, v]) => v !== undefined));
    if (Object.keys(changes).length === 0) return getReel(tx, actor, id);
    const clientAccountId = input.clientAccountId ?? row.clientAccountId;
    const projectId = input.projectId === undefined ? (input.clientAccountId ? null : row.projectId) : input.projectId;
    await checkOwnerAndProject(tx, clientAccountId, projectId);
    const trackCount = input.trackCount ?? row.trackCount;
    const [highest] = await tx.select({ n: max(reelTracks.trackNo) }).from(reelTracks).where(eq(reelTracks.reelId, id));
    if ((highest?.n ?? 0) > trackCount) throw badField("trackCount", "covers_track_sheet", `The track sheet fills track ${highest!.n}; clear it before giving the reel ${trackCount} tracks`);
    const before = await getReel(tx, actor, id);
    await tx.update(reels).set({ ...changes, projectId }).where(eq(reels.id, id));
    const after = await getReel(tx, actor, id);
    await writeAudit(tx, actor, "reel.updated", { type: "reel", id }, { before, after });
    return after;
  });
}

export async function saveTrackSheet(db: Db, actor: Actor, id: number, input: TrackSheetInput): Promise<ReelDetailDto> {
  return db.transaction(async (tx) => {
    const row = await lockReel(tx, actor, id);
    // An engineer who was not on the project's sessions sees this like any row that is not theirs.
    if (!(await mayEditTrackSheet(tx, actor, row))) throw notFound("That reel");
    const seen = new Set<number>();
    for (const [i, track] of (input.tracks ?? []).entries()) {
      if (track.trackNo > row.trackCount) throw badField(`tracks.${i}.trackNo`, "within_format", `This reel has ${row.trackCount} tracks; track ${track.trackNo} is not on it`);
      if (seen.has(track.trackNo)) throw badField(`tracks.${i}.trackNo`, "unique", `Track ${track.trackNo} is listed twice`);
      seen.add(track.trackNo);
    }
    if (input.tracks === undefined && input.songs === undefined) return getReel(tx, actor, id);
    const before = await getReel(tx, actor, id);
    if (input.tracks !== undefined) {
      await tx.delete(reelTracks).where(eq(reelTracks.reelId, id));
      const filled = input.tracks.filter((t) => t.contents.trim() !== "");
      if (filled.length) await tx.insert(reelTracks).values(filled.map((t) => ({ reelId: id, trackNo: t.trackNo, contents: t.contents.trim() })));
    }
    if (input.songs !== undefined) {
      await tx.delete(reelSongs).where(eq(reelSongs.reelId, id));
      if (input.songs.length) {
        await tx.insert(reelSongs).values(input.songs.map((s, position) => ({ reelId: id, position, title: s.title, startSeconds: readReelPosition(s.start), keptTakes: blankToNull(s.keptTakes) ?? null })));
      }
    }
    const after = await getReel(tx, actor, id);
    await writeAudit(tx, actor, "reel.track_sheet_saved", { type: "reel", id }, { before: { tracks: before.tracks, songs: before.songs }, after: { tracks: after.tracks, songs: after.songs } });
    return after;
  });
}

type Move = { kind: "check_out"; input: CheckOutInput } | { kind: "check_in"; input: CheckInInput } | { kind: "release"; input: ReleaseInput };

const moveRules: Record<Move["kind"], { from: ReelStatus[]; to: ReelStatus; refusal: string }> = {
  check_out: { from: ["in_vault"], to: "checked_out", refusal: "Only a reel in the vault can be checked out" },
  check_in: { from: ["checked_out"], to: "in_vault", refusal: "Only a checked-out reel can be checked in" },
  release: { from: ["in_vault", "checked_out"], to: "released", refusal: "This reel has already been released to its owner" },
};

export async function moveReel(db: Db, actor: Actor, id: number, move: Move, now = new Date()): Promise<ReelDetailDto> {
  return db.transaction(async (tx) => {
    const row = await lockReel(tx, actor, id);
    const rule = moveRules[move.kind];
    if (!rule.from.includes(row.status)) throw new HttpError(409, "reel_state", `${rule.refusal}; ${row.labelId} is ${row.status.replace("_", " ")}`);
    if (move.kind === "check_out") {
      const { timeZone } = await loadVaultSettings(tx);
      const today = DateTime.fromJSDate(now, { zone: timeZone }).toISODate()!;
      if (move.input.dueBack < today) throw badField("dueBack", "not_past", "The due-back date cannot be in the past");
    }
    const before = await getReel(tx, actor, id);
    await tx.insert(reelMovements).values({
      reelId: id,
      kind: move.kind,
      person: move.input.person.trim(),
      reason: "reason" in move.input ? (blankToNull(move.input.reason) ?? null) : null,
      dueBack: move.kind === "check_out" ? move.input.dueBack : null,
      recordedByUserId: actor.userId,
      at: now,
    });
    await tx.update(reels).set({ status: rule.to }).where(eq(reels.id, id));
    const after = await getReel(tx, actor, id);
    await writeAudit(tx, actor, `reel.${move.kind}`, { type: "reel", id }, { before: { status: before.status }, after: { status: after.status, movement: after.movements[0] } });
    return after;
  });
}
