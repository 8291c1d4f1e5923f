// Wrenfield Sound's rooms, kit, prices and a month of bookings around the day the seed runs.
// Invented demo data; prices are the product brief's demo values.
import { eq } from "drizzle-orm";
import { DateTime } from "luxon";
import { basisPointsOf, lockoutSpan, quote, rateCardFromVersion, type EngineerRates } from "@takeup/domain";
import type { Tx } from "../client.ts";
import {
  bookingEngineers,
  bookingEquipment,
  bookings,
  clientAccounts,
  engineerRates,
  equipment,
  projects,
  rateCardVersions,
  rooms,
  staffProfiles,
  user,
} from "../schema/index.ts";

const zone = "America/Chicago";
const rules = { afterHoursStartMinute: 22 * 60, afterHoursEndMinute: 8 * 60, afterHoursPremiumBp: 2500, weekendPremiumBp: 1500 };
const common = { dayCoversMinutes: 600, minimumBillableMinutes: 180, billingIncrementMinutes: 30, ...rules };

export const demoRooms = [
  { name: "Room A", description: "Live room and control room: the big tracking room.", capacity: 10, colour: "rust" as const, turnoverMinutes: 30, position: 0, hourlyRateCents: 9500, dayRateCents: 85000 },
  { name: "Room B", description: "Overdub booth for vocals and single instruments.", capacity: 3, colour: "moss" as const, turnoverMinutes: 15, position: 1, hourlyRateCents: 5500, dayRateCents: 45000 },
  { name: "Room C", description: "Mix suite.", capacity: 4, colour: "slate" as const, turnoverMinutes: 30, position: 2, hourlyRateCents: 7000, dayRateCents: 60000 },
];

export const demoEngineerRates = { engineerCents: 4000, assistantCents: 2500 };

type Planned = {
  room: string;
  client: string;
  project?: string;
  /** Days from this week's Monday, and local start/end hours. */
  day: number;
  from: number;
  to: number;
  status: "hold" | "confirmed" | "wrapped" | "cancelled";
  engineers?: string[];
  kit?: string[];
  title?: string;
  secondHoldBehind?: number;
  /** Whole studio days around the clock, each at the day rate (docs/pricing.md, lockouts). */
  lockout?: boolean;
};

const plan: Planned[] = [
  // Last week: mixing and overdubs, wrapped.
  { room: "Room C", client: "Blue Hour Records", project: "Night Ferries", day: -7, from: 10, to: 18, status: "wrapped", engineers: ["Sam Reyes"], title: "Mix, songs 1–3" },
  { room: "Room B", client: "Ines Halloran", day: -6, from: 13, to: 17, status: "wrapped", engineers: ["Priya Oduya"], title: "Vocal overdubs" },
  { room: "Room A", client: "Copper Vale", project: "Low Country", day: -5, from: 11, to: 19, status: "wrapped", engineers: ["Priya Oduya", "Jo Kettering"], kit: ["16-track 1/2-inch tape recorder"], title: "Drums and bass" },
  // This week.
  { room: "Room B", client: "Ines Halloran", day: 1, from: 10, to: 14, status: "confirmed", engineers: ["Sam Reyes"], title: "Guitar overdubs" },
  { room: "Room C", client: "Blue Hour Records", project: "Night Ferries", day: 2, from: 10, to: 20, status: "confirmed", engineers: ["Sam Reyes"], title: "Mix, songs 4–6" },
  { room: "Room B", client: "Copper Vale", project: "Low Country", day: 3, from: 18, to: 23, status: "confirmed", engineers: ["Jo Kettering"], title: "Late vocal session" },
  // Next week: a three-day lockout in Room A (Monday to Wednesday, whole days at the day rate),
  // tracking live to 2-inch tape at 15 in/s.
  { room: "Room A", client: "Lantern Static", project: "Harbour Lights", day: 7, from: 10, to: 2 * 24 + 20, status: "confirmed", engineers: ["Priya Oduya", "Jo Kettering"], kit: ["24-track 2-inch tape recorder"], title: "Tracking live (lockout, 3 days)", lockout: true },
  { room: "Room B", client: "Lantern Static", project: "Harbour Lights", day: 10, from: 12, to: 16, status: "confirmed", engineers: ["Sam Reyes"], title: "Vocal overdubs" },
  { room: "Room C", client: "Ines Halloran", day: 11, from: 10, to: 18, status: "hold", engineers: ["Sam Reyes"], title: "Mix (pencilled)" },
  // A first hold and a second hold queued behind it on the same slot.
  { room: "Room A", client: "The Quiet Orchard", project: "Small Hours", day: 14, from: 10, to: 18, status: "hold", title: "Tracking (first hold)" },
  { room: "Room A", client: "Copper Vale", project: "Low Country", day: 14, from: 12, to: 18, status: "hold", title: "Overdubs (second hold)", secondHoldBehind: -1 },
  // A cancellation with a fee.
  { room: "Room B", client: "Copper Vale", day: 4, from: 14, to: 17, status: "cancelled", engineers: ["Jo Kettering"], title: "Backing vocals" },
  { room: "Room C", client: "The Quiet Orchard", project: "Small Hours", day: 21, from: 10, to: 20, status: "confirmed", engineers: ["Sam Reyes"], title: "Mix" },
];

export async function seedStudioFloor(tx: Tx, now = new Date()) {
  const effectiveFrom = DateTime.fromISO("2026-01-01T00:00", { zone }).toJSDate();
  const roomIds = new Map<string, number>();
  const versions = new Map<string, typeof rateCardVersions.$inferSelect>();
  for (const room of demoRooms) {
    const [created] = await tx.insert(rooms).values({ name: room.name, description: room.description, capacity: room.capacity, colour: room.colour, turnoverMinutes: room.turnoverMinutes, position: room.position }).$returningId();
    roomIds.set(room.name, created!.id);
    const [v] = await tx.insert(rateCardVersions).values({ roomId: created!.id, version: 1, effectiveFrom, hourlyRateCents: room.hourlyRateCents, dayRateCents: room.dayRateCents, ...common, note: "Opening prices" }).$returningId();
    const [row] = await tx.select().from(rateCardVersions).where(eq(rateCardVersions.id, v!.id));
    versions.set(room.name, row!);
  }
  const kit = [
    { name: "24-track 2-inch tape recorder", kind: "tape_recorder" as const, room: "Room A", trackCount: 24, tapeWidthMils: 2000, speedsIps: [15, 30] },
    { name: "16-track 1/2-inch tape recorder", kind: "tape_recorder" as const, room: "Room A", trackCount: 16, tapeWidthMils: 500, speedsIps: [15, 30] },
    { name: "2-track 1/4-inch mastering recorder", kind: "tape_recorder" as const, room: "Room C", trackCount: 2, tapeWidthMils: 250, speedsIps: [7.5, 15, 30] },
    { name: "32-channel mixing console", kind: "console" as const, room: "Room A", trackCount: null, tapeWidthMils: null, speedsIps: [] },
  ];
  const kitIds = new Map<string, number>();
  for (const k of kit) {
    const [created] = await tx.insert(equipment).values({ name: k.name, kind: k.kind, homeRoomId: roomIds.get(k.room)!, trackCount: k.trackCount, tapeWidthMils: k.tapeWidthMils, speedsIps: k.speedsIps }).$returningId();
    kitIds.set(k.name, created!.id);
  }
  await tx.insert(engineerRates).values([
    { grade: "engineer", hourlyRateCents: demoEngineerRates.engineerCents, effectiveFrom },
    { grade: "assistant", hourlyRateCents: demoEngineerRates.assistantCents, effectiveFrom },
  ]);
  const staff = await tx.select({ userId: staffProfiles.userId, name: staffProfiles.displayName, role: staffProfiles.role }).from(staffProfiles);
  await tx.update(staffProfiles).set({ engineerGrade: "engineer" }).where(eq(staffProfiles.role, "engineer"));
  const jo = staff.find((s) => s.name === "Jo Kettering");
  if (jo) await tx.update(staffProfiles).set({ engineerGrade: "assistant" }).where(eq(staffProfiles.userId, jo.userId));
  const grades = new Map(staff.map((s) => [s.name, s.name === "Jo Kettering" ? ("assistant" as const) : ("engineer" as const)]));
  const [manager] = await tx.select({ id: user.id }).from(user).where(eq(user.email, "manager@wrenfield.test"));

  const clients = await tx.select().from(clientAccounts);
  const projectIds = new Map<string, number>();
  for (const name of new Set(plan.flatMap((p) => (p.project ? [`${p.client}|${p.project}`] : [])))) {
    const [clientName, projectName] = name.split("|") as [string, string];
    const client = clients.find((c) => c.name === clientName)!;
    const [created] = await tx.insert(projects).values({ clientAccountId: client.id, name: projectName }).$returningId();
    projectIds.set(name, created!.id);
  }

  const monday = DateTime.fromJSDate(now, { zone }).startOf("week");
  const rates: EngineerRates = { engineer: demoEngineerRates.engineerCents, assistant: demoEngineerRates.assistantCents };
  let previousId = 0;
  for (const p of plan) {
    const asked = { startsAt: monday.plus({ days: p.day, hours: p.from }).toJSDate(), endsAt: monday.plus({ days: p.day, hours: p.to }).toJSDate() };
    // A lockout holds whole studio days, as the API stores it.
    const { startsAt, endsAt } = p.lockout ? lockoutSpan(asked.startsAt, asked.endsAt, zone) : asked;
    const version = versions.get(p.room)!;
    const engineers = (p.engineers ?? []).map((name) => ({ id: staff.find((s) => s.name === name)!.userId, name, grade: grades.get(name)! }));
    const priced = quote(rateCardFromVersion(p.room, version, rates, zone), { startsAt, endsAt, engineers, lockout: p.lockout ?? false }, { timeZone: zone, currency: "USD" });
    const client = clients.find((c) => c.name === p.client)!;
    const queuedBehindId = p.secondHoldBehind ? previousId : null;
    const [created] = await tx
      .insert(bookings)
      .values({
        roomId: roomIds.get(p.room)!,
        clientAccountId: client.id,
        projectId: p.project ? projectIds.get(`${p.client}|${p.project}`)! : null,
        startsAt,
        endsAt,
        status: p.status,
        lockout: p.lockout ?? false,
        holdExpiresAt: p.status === "hold" && !queuedBehindId ? new Date(now.getTime() + 40 * 3_600_000) : null,
        queuedBehindId,
        rateCardVersionId: version.id,
        quote: priced,
        quoteTotalCents: priced.totalCents,
        depositRequiredCents: basisPointsOf(priced.totalCents, 3000),
        depositReceivedAt: p.status === "confirmed" || p.status === "wrapped" ? now : null,
        title: p.title ?? null,
        cancelledAt: p.status === "cancelled" ? now : null,
        cancellationReason: p.status === "cancelled" ? "Singer unwell" : null,
        cancellationFeeCents: p.status === "cancelled" ? basisPointsOf(priced.totalCents, 2500) : null,
        createdByUserId: manager?.id ?? null,
      })
      .$returningId();
    previousId = created!.id;
    if (engineers.length) await tx.insert(bookingEngineers).values(engineers.map((e) => ({ bookingId: created!.id, staffUserId: e.id, startsAt, endsAt })));
    if (p.kit?.length) await tx.insert(bookingEquipment).values(p.kit.map((name) => ({ bookingId: created!.id, equipmentId: kitIds.get(name)!, startsAt, endsAt })));
  }
}
