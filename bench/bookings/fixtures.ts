// The bench's own rooms, engineers and clients, added beside the seeded Wrenfield Sound demo so
// the synthetic bookings never touch the demo rooms (Room A/B/C keep their month of sessions).
import { randomUUID } from "node:crypto";
import { eq } from "drizzle-orm";
import { clientAccounts, projects, rateCardVersions, rooms, staffProfiles, user, type Db } from "@takeup/db";
import { clientKinds, rateCardFromVersion, roomColours, type EngineerGrade, type RateCard } from "@takeup/domain";

export const benchRoomCount = 20;
export const benchClientCount = 50;
/** Each bench room has its own two engineers, so an engineer is never in two rooms at once. */
export const engineersPerRoom = 2;
export const studioZone = "America/Chicago";
export const engineerRates = { engineer: 4000, assistant: 2500 };

export type BenchEngineer = { id: string; name: string; grade: EngineerGrade };
export type BenchRoom = {
  id: number;
  name: string;
  turnoverMinutes: number;
  rateCardVersionId: number;
  card: RateCard;
  engineers: [BenchEngineer, BenchEngineer];
};
export type BenchFixtures = {
  rooms: BenchRoom[];
  clients: { id: number; projectId: number }[];
  managerId: string;
};

// Prices modelled on the demo's mix suite; the numbers only shape the stored quotes.
const version = {
  version: 1,
  effectiveFrom: new Date("1990-01-01T06:00:00.000Z"),
  hourlyRateCents: 7000,
  dayRateCents: 60000,
  dayCoversMinutes: 600,
  minimumBillableMinutes: 180,
  billingIncrementMinutes: 30,
  afterHoursStartMinute: 22 * 60,
  afterHoursEndMinute: 8 * 60,
  afterHoursPremiumBp: 2500,
  weekendPremiumBp: 1500,
};

export async function createBenchFixtures(db: Db): Promise<BenchFixtures> {
  const [manager] = await db.select({ id: user.id }).from(user).where(eq(user.email, "manager@wrenfield.test"));
  if (!manager) throw new Error("the demo seed has no manager@wrenfield.test");

  const engineers: BenchEngineer[] = Array.from({ length: benchRoomCount * engineersPerRoom }, (_, i) => ({
    id: randomUUID(),
    name: `Bench engineer ${i + 1}`,
    grade: i % 2 === 0 ? "engineer" : "assistant",
  }));
  const now = new Date();
  await db.insert(user).values(engineers.map((e, i) => ({ id: e.id, name: e.name, email: `bench-engineer-${i + 1}@bench.test`, emailVerified: true, createdAt: now, updatedAt: now })));
  await db.insert(staffProfiles).values(engineers.map((e) => ({ userId: e.id, role: "engineer" as const, displayName: e.name, engineerGrade: e.grade })));

  const benchRooms: BenchRoom[] = [];
  for (let i = 0; i < benchRoomCount; i++) {
    const name = `Bench room ${i + 1}`;
    const [room] = await db
      .insert(rooms)
      .values({ name, description: "Generated for the bookings benchmark.", capacity: 4, colour: roomColours[i % roomColours.length]!, turnoverMinutes: 30, position: 100 + i })
      .$returningId();
    const [v] = await db.insert(rateCardVersions).values({ roomId: room!.id, ...version, note: "Bench prices" }).$returningId();
    benchRooms.push({
      id: room!.id,
      name,
      turnoverMinutes: 30,
      rateCardVersionId: v!.id,
      card: rateCardFromVersion(name, { id: v!.id, ...version }, engineerRates, studioZone),
      engineers: [engineers[i * engineersPerRoom]!, engineers[i * engineersPerRoom + 1]!],
    });
  }

  const clients: BenchFixtures["clients"] = [];
  for (let i = 0; i < benchClientCount; i++) {
    const [account] = await db.insert(clientAccounts).values({ name: `Bench client ${i + 1}`, kind: clientKinds[i % clientKinds.length]!, email: `client-${i + 1}@bench.test` }).$returningId();
    const [project] = await db.insert(projects).values({ clientAccountId: account!.id, name: `Bench project ${i + 1}` }).$returningId();
    clients.push({ id: account!.id, projectId: project!.id });
  }
  return { rooms: benchRooms, clients, managerId: manager.id };
}
