import { eq } from "drizzle-orm";
import { bookingEngineers, bookingEquipment, bookings, type Tx } from "@takeup/db";

/** Replaces a booking's engineers and kit, copying its times so per-resource overlap checks stay indexed. */
export async function writeResourceLinks(tx: Tx, bookingId: number, window: { startsAt: Date; endsAt: Date }, engineerIds: string[], equipmentIds: number[]) {
  await tx.delete(bookingEngineers).where(eq(bookingEngineers.bookingId, bookingId));
  await tx.delete(bookingEquipment).where(eq(bookingEquipment.bookingId, bookingId));
  if (engineerIds.length) await tx.insert(bookingEngineers).values(engineerIds.map((staffUserId) => ({ bookingId, staffUserId, ...window })));
  if (equipmentIds.length) await tx.insert(bookingEquipment).values(equipmentIds.map((equipmentId) => ({ bookingId, equipmentId, ...window })));
}

export async function currentLinks(tx: Tx, bookingId: number) {
  const engineers = await tx.select({ id: bookingEngineers.staffUserId }).from(bookingEngineers).where(eq(bookingEngineers.bookingId, bookingId));
  const kit = await tx.select({ id: bookingEquipment.equipmentId }).from(bookingEquipment).where(eq(bookingEquipment.bookingId, bookingId));
  return { engineerIds: engineers.map((e) => e.id).sort(), equipmentIds: kit.map((k) => k.id).sort((a, b) => a - b) };
}

export async function lockBooking(tx: Tx, id: number) {
  const [row] = await tx.select().from(bookings).where(eq(bookings.id, id)).for("update");
  return row ?? null;
}
