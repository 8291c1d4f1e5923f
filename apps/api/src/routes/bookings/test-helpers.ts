import { eq } from "drizzle-orm";
import { DateTime } from "luxon";
import { clientAccounts, rooms, staffProfiles } from "@takeup/db";
import type { TestApp } from "../../test/harness.ts";

export const zone = "America/Chicago";

/** An instant from a studio-local wall time a number of weeks ahead (clear of the seeded month). */
export function at(weeksAhead: number, weekday: number, time: string) {
  const [h, m] = time.split(":").map(Number) as [number, number];
  return DateTime.now().setZone(zone).startOf("week").plus({ weeks: weeksAhead, days: weekday - 1 }).set({ hour: h, minute: m }).toISO()!;
}

export async function demoIds(t: TestApp) {
  const roomRows = await t.db.select().from(rooms);
  const clients = await t.db.select().from(clientAccounts);
  const staff = await t.db.select().from(staffProfiles);
  const room = (name: string) => roomRows.find((r) => r.name === name)!.id;
  const client = (name: string) => clients.find((c) => c.name === name)!.id;
  const person = (name: string) => staff.find((s) => s.displayName === name)!.userId;
  return { room, client, person };
}

export async function roomId(t: TestApp, name: string) {
  const [row] = await t.db.select().from(rooms).where(eq(rooms.name, name));
  return row!.id;
}
