import { eq } from "drizzle-orm";
import { isDuplicateKeyError, rooms, type Db, type Room, type RateCardVersion } from "@takeup/db";
import type { CreateRateCardVersionInput, CreateRoomInput, RoomDto, UpdateRoomInput } from "@takeup/domain";
import { conflict, notFound } from "../../lib/http-error.ts";
import { writeAudit } from "../../lib/audit.ts";
import type { Actor } from "../../lib/actor.ts";
import { insertRateCardVersion, roomsWithCurrentCard, toRateCardDto } from "./rate-cards.service.ts";

const toRoomDto = (room: Room, current: RateCardVersion | null): RoomDto => ({
  id: room.id,
  name: room.name,
  description: room.description,
  capacity: room.capacity,
  colour: room.colour,
  turnoverMinutes: room.turnoverMinutes,
  position: room.position,
  active: room.active,
  currentRateCard: current ? toRateCardDto(current) : null,
});

export async function listRooms(db: Db): Promise<RoomDto[]> {
  return (await roomsWithCurrentCard(db)).map(({ room, current }) => toRoomDto(room, current));
}

async function roomDto(db: Db, id: number) {
  const found = (await listRooms(db)).find((r) => r.id === id);
  if (!found) throw notFound("That room");
  return found;
}

const nameTaken = (name: string) => conflict("room_exists", `A room called “${name}” already exists`);

export async function createRoom(db: Db, actor: Actor, input: CreateRoomInput): Promise<RoomDto> {
  try {
    const id = await db.transaction(async (tx) => {
      const [created] = await tx.insert(rooms).values({ ...input, description: input.description?.trim() || null }).$returningId();
      await writeAudit(tx, actor, "room.created", { type: "room", id: created!.id }, { after: input });
      return created!.id;
    });
    return roomDto(db, id);
  } catch (error) {
    if (isDuplicateKeyError(error)) throw nameTaken(input.name);
    throw error;
  }
}

export async function updateRoom(db: Db, actor: Actor, id: number, input: UpdateRoomInput): Promise<RoomDto> {
  try {
    await db.transaction(async (tx) => {
      const [before] = await tx.select().from(rooms).where(eq(rooms.id, id)).for("update");
      if (!before) throw notFound("That room");
      const changes = { ...input, ...(input.description !== undefined ? { description: input.description.trim() || null } : {}) };
      if (Object.keys(changes).length > 0) await tx.update(rooms).set(changes).where(eq(rooms.id, id));
      const [after] = await tx.select().from(rooms).where(eq(rooms.id, id));
      await writeAudit(tx, actor, "room.updated", { type: "room", id }, { before, after });
    });
    return roomDto(db, id);
  } catch (error) {
    if (isDuplicateKeyError(error) && input.name) throw nameTaken(input.name);
    throw error;
  }
}

export async function addRateCardVersion(db: Db, actor: Actor, roomId: number, input: CreateRateCardVersionInput) {
  return db.transaction(async (tx) => {
    const [room] = await tx.select().from(rooms).where(eq(rooms.id, roomId)).for("update");
    if (!room) throw notFound("That room");
    const version = await insertRateCardVersion(tx, roomId, input, actor.userId);
    await writeAudit(tx, actor, "rate_card.version_added", { type: "room", id: roomId }, { after: toRateCardDto(version) });
    return toRateCardDto(version);
  });
}
