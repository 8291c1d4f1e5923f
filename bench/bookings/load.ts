// Bulk-loads synthetic bookings into the bench rooms with multi-row INSERTs. The rows are valid:
// per room they never overlap (turnover kept free), engineers belong to one room each, and
// every quote is a real quote from the pricing engine.
import type { Pool, PoolConnection, ResultSetHeader, RowDataPacket } from "mysql2/promise";
import { quote, type RateCard } from "@takeup/domain";
import { studioZone, type BenchFixtures, type BenchRoom } from "./fixtures.ts";
import { createRandom, type Random } from "./random.ts";

const minute = 60_000;
const hour = 60 * minute;
const day = 24 * hour;
const rowsPerInsert = 5_000;
const insertsPerTransaction = 10;
/** The first bench booking; rooms fill forward from here, a little over two sessions a day. */
const origin = Date.parse("1990-01-01T14:00:00.000Z");

type RoomCursor = { room: BenchRoom; random: Random; next: number; first: number; quotes: Map<string, { json: string; totalCents: number }> };
export type LoadedSpan = { roomId: number; engineerIds: [string, string]; turnoverMinutes: number; from: number; to: number };

const sqlTime = (ms: number) => `'${new Date(ms).toISOString().slice(0, 23).replace("T", " ")}'`;
const titles = ["'Tracking'", "'Overdubs'", "'Vocals'", "'Mix'", "'Edit and comp'", "NULL"];

/**
 * Pricing every one of a million rows would take ~10 minutes (the engine resolves the studio's
 * time zone day by day), so quotes are priced once per shape — local weekday, start hour, length
 * and engineers — on a reference week, and reused. Totals and line structure stay genuine; the
 * calendar dates inside a reused quote's lines are the reference week's.
 */
const referenceMonday = Date.parse("2026-01-12T06:00:00.000Z"); // 00:00 in Chicago, away from DST changes
const templateCard = (card: RateCard): RateCard => ({ ...card, id: "@@CARD@@", label: "@@LABEL@@" });
const templateEngineers = [
  { id: "@@ENG_A@@", name: "@@ENG_A_NAME@@", grade: "engineer" as const },
  { id: "@@ENG_B@@", name: "@@ENG_B_NAME@@", grade: "assistant" as const },
];
const templates = new Map<string, { json: string; totalCents: number }>();

function templateQuote(card: RateCard, startsAt: number, hours: number, engineerMask: number) {
  // Chicago's standard offset is enough to pick a shape; the template itself is priced properly.
  const local = new Date(startsAt - 6 * hour);
  const weekday = (local.getUTCDay() + 6) % 7;
  const key = `${weekday}|${local.getUTCHours()}|${hours}|${engineerMask}`;
  let template = templates.get(key);
  if (!template) {
    const start = referenceMonday + weekday * day + local.getUTCHours() * hour;
    const engineers = templateEngineers.filter((_, i) => engineerMask & (1 << i));
    const priced = quote(templateCard(card), { startsAt: new Date(start), endsAt: new Date(start + hours * hour), engineers }, { timeZone: studioZone, currency: "USD" });
    template = { json: JSON.stringify(priced), totalCents: priced.totalCents };
    templates.set(key, template);
  }
  return { key, template };
}

const jsonText = (text: string) => JSON.stringify(text).slice(1, -1);

export class BookingLoader {
  private readonly cursors: RoomCursor[];
  private nextId = 0;
  private count = 0;

  constructor(
    private readonly pool: Pool,
    private readonly fixtures: BenchFixtures,
    seed = 20260112,
  ) {
    this.cursors = fixtures.rooms.map((room, i) => ({ room, random: createRandom(seed + i), next: origin + i * 37 * minute, first: origin + i * 37 * minute, quotes: new Map() }));
  }

  get total() {
    return this.count;
  }

  /** Where each room has bookings, for picking measurement windows inside the data. */
  spans(): LoadedSpan[] {
    return this.cursors.map((c) => ({ roomId: c.room.id, engineerIds: [c.room.engineers[0].id, c.room.engineers[1].id], turnoverMinutes: c.room.turnoverMinutes, from: c.first, to: c.next }));
  }

  async init() {
    const [rows] = await this.pool.query<RowDataPacket[]>("SELECT COUNT(*) AS n, COALESCE(MAX(id), 0) AS maxId FROM bookings");
    this.count = Number(rows[0]!.n);
    this.nextId = Number(rows[0]!.maxId) + 1;
  }

  /** Adds bookings until the table holds `target` rows, printing progress. */
  async growTo(target: number, progress: (loaded: number, target: number) => void): Promise<void> {
    const conn = await this.pool.getConnection();
    try {
      // Uniqueness is guaranteed by construction (fresh explicit ids), so InnoDB may skip the
      // duplicate probes during the load; foreign keys stay checked.
      await conn.query("SET SESSION unique_checks = 0");
      let inTransaction = 0;
      let pending: Promise<unknown> | null = null;
      while (this.count < target) {
        const batch = this.buildBatch(conn, Math.min(rowsPerInsert, target - this.count));
        if (pending) await pending;
        if (inTransaction === 0) await conn.query("START TRANSACTION");
        // Send this batch, then build the next one while the server inserts it.
        pending = this.send(conn, batch).then(() => progress(this.count, target));
        this.count += batch.rows;
        inTransaction++;
        if (inTransaction === insertsPerTransaction) {
          await pending;
          pending = null;
          await conn.query("COMMIT");
          inTransaction = 0;
        }
      }
      if (pending) await pending;
      if (inTransaction > 0) await conn.query("COMMIT");
      await conn.query("SET SESSION unique_checks = 1");
    } finally {
      conn.release();
    }
  }

  private async send(conn: PoolConnection, batch: { bookings: string; engineers: string | null }) {
    await conn.query<ResultSetHeader>(batch.bookings);
    if (batch.engineers) await conn.query<ResultSetHeader>(batch.engineers);
  }

  private buildBatch(conn: PoolConnection, rows: number) {
    const bookingRows: string[] = [];
    const engineerRows: string[] = [];
    const clients = this.fixtures.clients;
    const manager = conn.escape(this.fixtures.managerId);
    for (let i = 0; i < rows; i++) {
      // Round-robin over the rooms, so ids rise roughly with time across the studio, as they do
      // when people book session after session.
      const cursor = this.cursors[(this.count + i) % this.cursors.length]!;
      const r = cursor.random;
      const hours = 3 + r.int(8);
      const startsAt = cursor.next;
      const endsAt = startsAt + hours * hour;
      // The room's turnover plus 0–3.5 h, and now and then a dark day.
      cursor.next = endsAt + cursor.room.turnoverMinutes * minute + r.int(8) * 30 * minute + (r.next() < 0.08 ? day : 0);

      const pick = r.next();
      const engineerMask = pick < 0.3 ? 1 : pick < 0.42 ? 2 : pick < 0.5 ? 3 : 0;
      const priced = this.quoteFor(conn, cursor, startsAt, hours, engineerMask);
      const statusPick = r.next();
      const status = statusPick < 0.5 ? "confirmed" : statusPick < 0.85 ? "wrapped" : statusPick < 0.93 ? "hold" : "cancelled";
      const client = clients[r.int(clients.length)]!;
      const id = this.nextId++;
      const deposit = Math.floor((priced.totalCents * 3000 + 5000) / 10000);
      const createdAt = sqlTime(startsAt - 14 * day);
      bookingRows.push(
        `(${id},${cursor.room.id},${client.id},${r.next() < 0.4 ? client.projectId : "NULL"},${sqlTime(startsAt)},${sqlTime(endsAt)},'${status}',` +
          // A hold lapses two days before its session unless confirmed, like a real pencil.
          `${status === "hold" ? sqlTime(startsAt - 2 * day) : "NULL"},NULL,${cursor.room.rateCardVersionId},${priced.sql},${priced.totalCents},${deposit},` +
          `${status === "confirmed" || status === "wrapped" ? sqlTime(startsAt - 7 * day) : "NULL"},${titles[r.int(titles.length)]},NULL,0,` +
          (status === "cancelled"
            ? `${sqlTime(startsAt - 3 * day)},'Bench cancellation',${Math.floor((priced.totalCents * 2500 + 5000) / 10000)},`
            : "NULL,NULL,NULL,") +
          `NULL,NULL,${manager},${createdAt},${createdAt})`,
      );
      cursor.room.engineers.forEach((engineer, e) => {
        if (engineerMask & (1 << e)) engineerRows.push(`(${id},'${engineer.id}',${sqlTime(startsAt)},${sqlTime(endsAt)})`);
      });
    }
    return {
      rows,
      bookings:
        "INSERT INTO bookings (id, room_id, client_account_id, project_id, starts_at, ends_at, status, hold_expires_at, queued_behind_id, rate_card_version_id, " +
        "quote, quote_total_cents, deposit_required_cents, deposit_received_at, title, notes, requested_by_client, cancelled_at, cancellation_reason, " +
        "cancellation_fee_cents, reminder_sent_at, hold_notice_sent_at, created_by_user_id, created_at, updated_at) VALUES " +
        bookingRows.join(","),
      engineers: engineerRows.length ? `INSERT INTO booking_engineers (booking_id, staff_user_id, starts_at, ends_at) VALUES ${engineerRows.join(",")}` : null,
    };
  }

  private quoteFor(conn: PoolConnection, cursor: RoomCursor, startsAt: number, hours: number, engineerMask: number) {
    const { key, template } = templateQuote(cursor.room.card, startsAt, hours, engineerMask);
    let cached = cursor.quotes.get(key);
    if (!cached) {
      const [a, b] = cursor.room.engineers;
      const json = template.json
        .replaceAll("@@CARD@@", jsonText(cursor.room.card.id))
        .replaceAll("@@LABEL@@", jsonText(cursor.room.card.label))
        .replaceAll("@@ENG_A_NAME@@", jsonText(a.name))
        .replaceAll("@@ENG_B_NAME@@", jsonText(b.name))
        .replaceAll("@@ENG_A@@", a.id)
        .replaceAll("@@ENG_B@@", b.id);
      cached = { json: conn.escape(json), totalCents: template.totalCents };
      cursor.quotes.set(key, cached);
    }
    return { sql: cached.json, totalCents: cached.totalCents };
  }
}
