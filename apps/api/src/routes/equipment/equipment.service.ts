import { asc, eq } from "drizzle-orm";
import { equipment, rooms, type Db } from "@takeup/db";
import type { CreateEquipmentInput, EquipmentDto, UpdateEquipmentInput } from "@takeup/domain";
import { notFound, HttpError } from "../../lib/http-error.ts";
import { writeAudit } from "../../lib/audit.ts";
import type { Actor } from "../../lib/actor.ts";

export async function listEquipment(db: Db): Promise<EquipmentDto[]> {
  const rows = await db
    .select({ item: equipment, homeRoomName: rooms.name })
    .from(equipment)
    .leftJoin(rooms, eq(rooms.id, equipment.homeRoomId))
    .orderBy(asc(equipment.name));
  return rows.map(({ item, homeRoomName }) => ({
    id: item.id,
    name: item.name,
    kind: item.kind,
    homeRoomId: item.homeRoomId,
    homeRoomName: homeRoomName ?? null,
    trackCount: item.trackCount,
    tapeWidthMils: item.tapeWidthMils,
    speedsIps: item.speedsIps ?? [],
    notes: item.notes,
    active: item.active,
  }));
}

async function assertRoom(db: Db, roomId: number | null | undefined) {
  if (roomId == null) return;
  const [room] = await db.select({ id: rooms.id }).from(rooms).where(eq(rooms.id, roomId));
  if (!room) throw new HttpError(422, "unknown_room", "That home room does not exist", [{ field: "homeRoomId", rule: "exists", message: "Choose an existing room" }]);
}

const dtoOf = async (db: Db, id: number) => {
  const found = (await listEquipment(db)).find((e) => e.id === id);
  if (!found) throw notFound("That piece of equipment");
  return found;
};

export async function createEquipment(db: Db, actor: Actor, input: CreateEquipmentInput) {
  await assertRoom(db, input.homeRoomId);
  const id = await db.transaction(async (tx) => {
    const [created] = await tx
      .insert(equipment)
      .values({ ...input, homeRoomId: input.homeRoomId ?? null, speedsIps: input.speedsIps ?? [], notes: input.notes?.trim() || null })
      .$returningId();
    await writeAudit(tx, actor, "equipment.created", { type: "equipment", id: created!.id }, { after: input });
    return created!.id;
  });
  return dtoOf(db, id);
}

export async function updateEquipment(db: Db, actor: Actor, id: number, input: UpdateEquipmentInput) {
  await assertRoom(db, input.homeRoomId);
  await db.transaction(async (tx) => {
    const [before] = await tx.select().from(equipment).where(eq(equipment.id, id)).for("update");
    if (!before) throw notFound("That piece of equipment");
    const changes = { ...input, ...(input.notes !== undefined ? { notes: input.notes.trim() || null } : {}) };
    if (Object.keys(changes).length > 0) await tx.update(equipment).set(changes).where(eq(equipment.id, id));
    const [after] = await tx.select().from(equipment).where(eq(equipment.id, id));
    const action = input.homeRoomId !== undefined && input.homeRoomId !== before.homeRoomId ? "equipment.moved" : "equipment.updated";
    await writeAudit(tx, actor, action, { type: "equipment", id }, { before, after });
  });
  return dtoOf(db, id);
}
