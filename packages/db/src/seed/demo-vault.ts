// Wrenfield Sound's tape vault: 40 reels across the demo clients, track sheets for Lantern Static's
// lockout, earlier sessions on the 24-track recorder and a care log for the two multitrack
// recorders (the 24-track is due for alignment). Invented demo data only.
import { and, eq } from "drizzle-orm";
import { DateTime } from "luxon";
import { labelIdFor, quote, rateCardFromVersion } from "@takeup/domain";
import type { Tx } from "../client.ts";
import {
  bookingEngineers,
  bookingEquipment,
  bookings,
  clientAccounts,
  equipment,
  projects,
  rateCardVersions,
  recorderCareEvents,
  reelMovements,
  reels,
  reelSongs,
  reelTracks,
  rooms,
  staffProfiles,
  user,
} from "../schema/index.ts";
import { demoEngineerRates } from "./demo-studio-floor.ts";

const zone = "America/Chicago";

const lockoutTracks = [
  "Kick in", "Kick out", "Snare top", "Snare bottom", "Hi-hat", "Rack tom", "Floor tom", "Overhead left",
  "Overhead right", "Room left", "Room right", "Bass DI", "Bass amp", "Guitar 1 close", "Guitar 1 room", "Guitar 2 close",
  "Organ left", "Organ right", "Lead vox (guide)", "Harmony vox", "Tambourine", "Shaker", "Talkback", "Click",
];
const lockoutSongs: [string, string, string][][] = [
  [["Harbour Lights", "00:30", "take 3, take 5"], ["Salt on the Wire", "06:10", "take 2"]],
  [["Lamplighter", "00:30", "take 4"], ["Northbound Slow", "05:45", "take 1, take 6"]],
  [["Tidewater", "00:30", "take 2"], ["Fog Bell", "07:20", "take 3"]],
  [["Harbour Lights (second pass)", "00:30", "take 8"], ["Breakwater", "05:05", "take 2"]],
  [["Slack Water", "00:30", "take 1"], ["Rope and Pulley", "04:40", "take 4"]],
  [["Low Tide Hymn", "00:30", "take 2, take 3"]],
];

type ReelPlan = {
  client: string;
  project?: string;
  trackCount: number;
  widthMils: number;
  speed: number;
  recordedOn: string;
  note: string;
  shelf: string;
  status?: "checked_out" | "released";
  sheet?: number;
};

export async function seedVault(tx: Tx, now = new Date()) {
  const monday = DateTime.fromJSDate(now, { zone }).startOf("week");
  const day = (n: number) => monday.plus({ days: n }).toISODate()!;
  const clients = new Map((await tx.select().from(clientAccounts)).map((c) => [c.name, c.id]));
  const kit = new Map((await tx.select().from(equipment)).map((e) => [e.name, e.id]));
  const staff = new Map((await tx.select().from(staffProfiles)).map((s) => [s.displayName, s.userId]));
  const [manager] = await tx.select({ id: user.id }).from(user).where(eq(user.email, "manager@wrenfield.test"));
  const projectId = async (client: string, name: string) => {
    const [found] = await tx.select().from(projects).where(and(eq(projects.clientAccountId, clients.get(client)!), eq(projects.name, name)));
    if (found) return found.id;
    const [created] = await tx.insert(projects).values({ clientAccountId: clients.get(client)!, name }).$returningId();
    return created!.id;
  };

  // Lantern Static's first EP, tracked ten weeks ago on the 24-track: 11 wrapped days of 10 hours,
  // which (after the alignment logged before them) leaves that recorder due for alignment.
  const [roomA] = await tx.select().from(rooms).where(eq(rooms.name, "Room A"));
  const [version] = await tx.select().from(rateCardVersions).where(eq(rateCardVersions.roomId, roomA!.id));
  const ep = await projectId("Lantern Static", "First Light EP");
  const priya = staff.get("Priya Oduya")!;
  const recorder24 = kit.get("24-track 2-inch tape recorder")!;
  const recorder16 = kit.get("16-track 1/2-inch tape recorder")!;
  const card = rateCardFromVersion("Room A", version!, { engineer: demoEngineerRates.engineerCents, assistant: demoEngineerRates.assistantCents }, zone);
  for (let d = -70; d <= -60; d++) {
    const startsAt = monday.plus({ days: d, hours: 10 }).toJSDate();
    const endsAt = monday.plus({ days: d, hours: 20 }).toJSDate();
    const priced = quote(card, { startsAt, endsAt, engineers: [{ id: priya, name: "Priya Oduya", grade: "engineer" }], lockout: false }, { timeZone: zone, currency: "USD" });
    const [created] = await tx
      .insert(bookings)
      .values({
        roomId: roomA!.id,
        clientAccountId: clients.get("Lantern Static")!,
        projectId: ep,
        startsAt,
        endsAt,
        status: "wrapped",
        rateCardVersionId: version!.id,
        quote: priced,
        quoteTotalCents: priced.totalCents,
        depositRequiredCents: Math.floor((priced.totalCents * 3000 + 5000) / 10000),
        depositReceivedAt: startsAt,
        title: `First Light EP, tracking day ${d + 71}`,
        createdByUserId: manager?.id ?? null,
      })
      .$returningId();
    await tx.insert(bookingEngineers).values({ bookingId: created!.id, staffUserId: priya, startsAt, endsAt });
    await tx.insert(bookingEquipment).values({ bookingId: created!.id, equipmentId: recorder24, startsAt, endsAt });
  }

  await tx.insert(recorderCareEvents).values([
    { equipmentId: recorder24, kind: "alignment", doneOn: day(-72), doneBy: "Dana Whitcombe (visiting technician)", notes: "Full alignment at 15 in/s with a fresh test reel; azimuth touched up on tracks 1 and 24.", recordedByUserId: manager?.id ?? null },
    { equipmentId: recorder24, kind: "cleaning", doneOn: day(-60), doneBy: "Priya Oduya", notes: "Heads and guides cleaned, heads demagnetised.", recordedByUserId: manager?.id ?? null },
    { equipmentId: recorder24, kind: "repair", doneOn: day(-30), doneBy: "Dana Whitcombe (visiting technician)", notes: "Replaced a worn pinch roller.", recordedByUserId: manager?.id ?? null },
    { equipmentId: recorder16, kind: "alignment", doneOn: day(-20), doneBy: "Dana Whitcombe (visiting technician)", notes: "Routine alignment at 15 in/s.", recordedByUserId: manager?.id ?? null },
    { equipmentId: recorder16, kind: "cleaning", doneOn: day(-5), doneBy: "Jo Kettering", notes: "Cleaned and demagnetised before the drums session.", recordedByUserId: manager?.id ?? null },
  ]);

  const plans: ReelPlan[] = [];
  // The lockout next week: six reels of 2-inch, 24 tracks at 15 in/s, track sheets made out in advance.
  for (let i = 0; i < 6; i++) {
    plans.push({ client: "Lantern Static", project: "Harbour Lights", trackCount: 24, widthMils: 2000, speed: 15, recordedOn: day(7 + Math.floor(i / 2)), note: `Live tracking, lockout day ${1 + Math.floor(i / 2)}`, shelf: `A-0${i + 1}`, sheet: i });
  }
  for (let i = 0; i < 4; i++) {
    plans.push({ client: "Lantern Static", project: "First Light EP", trackCount: 24, widthMils: 2000, speed: 15, recordedOn: day(-70 + 3 * i), note: `EP multitrack ${i + 1} of 4`, shelf: `A-1${i}`, status: i === 3 ? "checked_out" : undefined });
  }
  for (let i = 0; i < 4; i++) plans.push({ client: "Lantern Static", trackCount: 2, widthMils: 250, speed: 15, recordedOn: `2025-0${3 + i}-1${i}`, note: `Demo mixes, batch ${i + 1}`, shelf: `B-0${i + 1}` });
  for (let i = 0; i < 3; i++) plans.push({ client: "Copper Vale", project: "Low Country", trackCount: 16, widthMils: 500, speed: 15, recordedOn: day(-5), note: `Drums and bass, reel ${i + 1}`, shelf: `C-0${i + 1}` });
  for (let i = 0; i < 5; i++) plans.push({ client: "Copper Vale", trackCount: 16, widthMils: 500, speed: 30, recordedOn: `2025-0${1 + i}-2${i}`, note: `Earlier album multitrack ${i + 1}`, shelf: `C-1${i}` });
  for (let i = 0; i < 2; i++) plans.push({ client: "The Quiet Orchard", project: "Small Hours", trackCount: 24, widthMils: 2000, speed: 15, recordedOn: day(14), note: `Tracking, reel ${i + 1}`, shelf: `D-0${i + 1}` });
  for (let i = 0; i < 6; i++) plans.push({ client: "The Quiet Orchard", trackCount: 24, widthMils: 2000, speed: 30, recordedOn: `2025-0${2 + i}-0${1 + i}`, note: `Back catalogue multitrack ${i + 1}`, shelf: `D-1${i}` });
  for (let i = 0; i < 3; i++) plans.push({ client: "Blue Hour Records", project: "Night Ferries", trackCount: 2, widthMils: 250, speed: 30, recordedOn: day(-7), note: `Mix masters, songs ${1 + i}`, shelf: `E-0${i + 1}` });
  for (let i = 0; i < 3; i++) plans.push({ client: "Blue Hour Records", trackCount: 2, widthMils: 500, speed: 30, recordedOn: `2024-1${i}-15`, note: `Catalogue master ${i + 1}`, shelf: `E-1${i}`, status: i === 0 ? "released" : undefined });
  for (let i = 0; i < 4; i++) plans.push({ client: "Ines Halloran", trackCount: 2, widthMils: 250, speed: 15, recordedOn: `2025-08-0${1 + i}`, note: `Mix reel ${i + 1}`, shelf: `F-0${i + 1}`, status: i === 1 ? "checked_out" : undefined });

  const projectIds = new Map<string, number>();
  for (const p of plans) if (p.project && !projectIds.has(`${p.client}|${p.project}`)) projectIds.set(`${p.client}|${p.project}`, await projectId(p.client, p.project));

  for (const [index, p] of plans.entries()) {
    const [created] = await tx
      .insert(reels)
      .values({
        labelId: `seed-${index}`,
        clientAccountId: clients.get(p.client)!,
        projectId: p.project ? projectIds.get(`${p.client}|${p.project}`)! : null,
        trackCount: p.trackCount,
        tapeWidthMils: p.widthMils,
        speedIps: p.speed,
        noiseReduction: p.speed === 15 && p.widthMils === 2000 ? "encoded" : "none",
        referenceLevel: p.widthMils === 2000 ? "+6 over the house reference" : "+3 over the house reference",
        recordedOn: p.recordedOn,
        contentsNote: p.note,
        shelf: p.status === "released" ? null : p.shelf,
        status: p.status ?? "in_vault",
      })
      .$returningId();
    const id = created!.id;
    await tx.update(reels).set({ labelId: labelIdFor(id) }).where(eq(reels.id, id));
    if (p.sheet !== undefined) {
      await tx.insert(reelTracks).values(lockoutTracks.map((contents, i) => ({ reelId: id, trackNo: i + 1, contents })));
      await tx.insert(reelSongs).values(lockoutSongs[p.sheet]!.map(([title, start, kept], position) => ({ reelId: id, position, title, startSeconds: Number(start.slice(0, 2)) * 60 + Number(start.slice(3)), keptTakes: kept })));
    }
    if (p.status === "checked_out") {
      await tx.insert(reelMovements).values({ reelId: id, kind: "check_out", person: p.client === "Ines Halloran" ? "Ines Halloran" : "Rosa Delacourt", reason: "Transfer at another studio", dueBack: day(10), recordedByUserId: manager?.id ?? null, at: monday.plus({ days: -2, hours: 11 }).toJSDate() });
    }
    if (p.status === "released") {
      await tx.insert(reelMovements).values({ reelId: id, kind: "release", person: "Courier for Blue Hour Records", reason: "Label took its master home", recordedByUserId: manager?.id ?? null, at: monday.plus({ days: -14, hours: 15 }).toJSDate() });
    }
  }
}
