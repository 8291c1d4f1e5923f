// Two weeks of clocked time for the demo engineers: an overtime week, a lockout day over
// 12 hours, a session past midnight, and a correction waiting for the manager. Invented data.
import { eq } from "drizzle-orm";
import { DateTime } from "luxon";
import type { Tx } from "../client.ts";
import { bookings, payRates, staffProfiles, studio, timeEntries, timeEntryBreaks, timeEntryEdits } from "../schema/index.ts";

const zone = "America/Chicago";

type Shift = { who: string; day: number; from: string; to: string; breakAt?: string; breakMinutes?: number; session?: string; code?: string };

// Days count from this week's Monday: -14…-8 is the week before last, -7…-1 last week.
const shifts: Shift[] = [
  // Week before last: an ordinary week.
  ...[-14, -13, -12, -11].map((day) => ({ who: "Priya Oduya", day, from: "09:58", to: "18:04", breakAt: "13:00", breakMinutes: 30 })),
  ...[-14, -12, -10].map((day) => ({ who: "Sam Reyes", day, from: "11:02", to: "19:07", breakAt: "15:00", breakMinutes: 45 })),
  ...[-13, -11].map((day) => ({ who: "Jo Kettering", day, from: "12:00", to: "17:55" })),
  // Last week: Priya's overtime week with a 13-hour lockout day.
  { who: "Priya Oduya", day: -7, from: "08:55", to: "18:10", breakAt: "13:00", breakMinutes: 30 },
  { who: "Priya Oduya", day: -6, from: "12:50", to: "17:20", session: "Vocal overdubs" },
  { who: "Priya Oduya", day: -5, from: "09:30", to: "22:40", breakAt: "15:00", breakMinutes: 30, session: "Drums and bass" },
  { who: "Priya Oduya", day: -4, from: "09:00", to: "19:05", breakAt: "13:30", breakMinutes: 30 },
  { who: "Priya Oduya", day: -3, from: "08:57", to: "19:02", breakAt: "13:00", breakMinutes: 30 },
  { who: "Priya Oduya", day: -2, from: "10:00", to: "16:03" },
  { who: "Sam Reyes", day: -7, from: "09:45", to: "18:20", breakAt: "13:00", breakMinutes: 30, session: "Mix, songs 1–3" },
  { who: "Sam Reyes", day: -4, from: "10:00", to: "19:30", breakAt: "14:00", breakMinutes: 30 },
  // Jo works as assistant on the lockout and as engineer on a late session that runs past midnight.
  { who: "Jo Kettering", day: -5, from: "10:30", to: "19:10", breakAt: "14:00", breakMinutes: 30, session: "Drums and bass" },
  { who: "Jo Kettering", day: -4, from: "20:00", to: "01:35", code: "engineer" },
];

export async function seedTime(tx: Tx, now = new Date()) {
  await tx.update(studio).set({ punchRounding: "15" }).where(eq(studio.id, 1));
  const staff = await tx.select().from(staffProfiles);
  const id = (name: string) => staff.find((s) => s.displayName === name)!.userId;
  await tx.insert(payRates).values([
    { staffUserId: id("Priya Oduya"), code: "engineer", hourlyRateCents: 3200, effectiveFrom: "2026-01-01" },
    { staffUserId: id("Sam Reyes"), code: "engineer", hourlyRateCents: 3000, effectiveFrom: "2026-01-01" },
    { staffUserId: id("Jo Kettering"), code: "assistant", hourlyRateCents: 2200, effectiveFrom: "2026-01-01" },
    { staffUserId: id("Jo Kettering"), code: "engineer", hourlyRateCents: 2800, effectiveFrom: "2026-01-01" },
  ]);
  const sessions = await tx.select({ id: bookings.id, title: bookings.title }).from(bookings);
  const monday = DateTime.fromJSDate(now, { zone }).startOf("week");
  const at = (day: number, time: string) => {
    const [h, m] = time.split(":").map(Number) as [number, number];
    return monday.plus({ days: day }).set({ hour: h, minute: m }).toJSDate();
  };
  let samLateEntry = 0;
  for (const s of shifts) {
    const start = at(s.day, s.from);
    let end = at(s.day, s.to);
    if (end <= start) end = at(s.day + 1, s.to);
    const staffMember = staff.find((p) => p.displayName === s.who)!;
    const bookingId = s.session ? (sessions.find((b) => b.title === s.session)?.id ?? null) : null;
    const [created] = await tx
      .insert(timeEntries)
      .values({
        staffUserId: staffMember.userId,
        bookingId,
        kind: bookingId ? "session" : "shop",
        payRateCode: s.code ?? staffMember.engineerGrade ?? "engineer",
        startedAt: start,
        endedAt: end,
        source: "clock",
        createdByUserId: staffMember.userId,
      })
      .$returningId();
    if (s.breakAt && s.breakMinutes) {
      const breakStart = at(s.day, s.breakAt);
      await tx.insert(timeEntryBreaks).values({ timeEntryId: created!.id, startedAt: breakStart, endedAt: new Date(breakStart.getTime() + s.breakMinutes * 60_000) });
    }
    if (s.who === "Sam Reyes" && s.day === -4) samLateEntry = created!.id;
  }
  // Sam forgot to clock out on time and asks for a correction.
  await tx.insert(timeEntryEdits).values({
    timeEntryId: samLateEntry,
    staffUserId: id("Sam Reyes"),
    proposedByUserId: id("Sam Reyes"),
    proposed: { startedAt: at(-4, "10:00").toISOString(), endedAt: at(-4, "18:00").toISOString(), breaks: [{ startedAt: at(-4, "14:00").toISOString(), endedAt: at(-4, "14:30").toISOString() }], bookingId: null },
    reason: "Forgot to clock out when I left at 18:00",
  });
}
