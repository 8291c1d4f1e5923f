import { and, eq, inArray, sql } from "drizzle-orm";
import { auditEvents, bookings, invoicedSources, invoices, rateCardVersions, rooms, type DbOrTx } from "@takeup/db";
import { bookingLines, formatStudioRange, type BillableItemDto } from "@takeup/domain";
import { HttpError } from "../../../lib/http-error.ts";
import type { BillableSource, LoadedSource, SourceContext } from "./types.ts";

/**
 * Wrapped sessions: the booking's quote lines (room time, premiums, engineer time) with their
 * amounts unchanged, plus any overrun when the studio bills on actual time. A paid deposit
 * invoice for the booking is deducted on its final invoice, once.
 */

const columns = {
  id: bookings.id,
  clientAccountId: bookings.clientAccountId,
  status: bookings.status,
  startsAt: bookings.startsAt,
  endsAt: bookings.endsAt,
  quote: bookings.quote,
  title: bookings.title,
  roomName: rooms.name,
  hourlyRateCents: rateCardVersions.hourlyRateCents,
  billingIncrementMinutes: rateCardVersions.billingIncrementMinutes,
};
type Row = { id: number; startsAt: Date; endsAt: Date; quote: (typeof bookings.$inferSelect)["quote"]; title: string | null; roomName: string; hourlyRateCents: number; billingIncrementMinutes: number };

async function wrappedAtOf(db: DbOrTx, ids: number[]): Promise<Map<number, Date>> {
  if (ids.length === 0) return new Map();
  const rows = await db
    .select({ id: auditEvents.entityId, at: sql<Date>`max(${auditEvents.at})`.mapWith(auditEvents.at) })
    .from(auditEvents)
    .where(and(eq(auditEvents.entityType, "booking"), eq(auditEvents.action, "booking.wrapped"), inArray(auditEvents.entityId, ids.map(String))))
    .groupBy(auditEvents.entityId);
  return new Map(rows.map((r) => [Number(r.id), r.at]));
}

async function paidDeposits(db: DbOrTx, ids: number[]) {
  if (ids.length === 0) return new Map<number, { id: number; paidMinor: number; number: string | null }>();
  const rows = await db
    .select({ id: invoices.id, bookingId: invoices.bookingId, paidMinor: invoices.paidMinor, number: invoices.number })
    .from(invoices)
    .where(and(eq(invoices.kind, "deposit"), eq(invoices.status, "paid"), inArray(invoices.bookingId, ids)));
  const applied = new Set(
    (await db.select({ id: invoicedSources.sourceId }).from(invoicedSources).where(and(eq(invoicedSources.sourceKind, "deposit_applied"), inArray(invoicedSources.sourceId, rows.map((r) => String(r.id)).concat("-"))))).map((r) => r.id),
  );
  return new Map(rows.filter((r) => !applied.has(String(r.id))).map((r) => [r.bookingId!, r]));
}

function load(rows: Row[], wrapped: Map<number, Date>, deposits: Awaited<ReturnType<typeof paidDeposits>>, ctx: SourceContext): LoadedSource[] {
  return rows.map((row) => {
    const when = formatStudioRange(row.startsAt, row.endsAt, ctx.studio.timeZone);
    const groupLabel = `${row.roomName}, ${when}${row.title ? ` — ${row.title}` : ""}`;
    const lines = bookingLines({
      quote: row.quote,
      basis: ctx.settings.billingBasis,
      bookedEndsAt: row.endsAt,
      wrappedAt: wrapped.get(row.id) ?? null,
      hourlyRateCents: row.hourlyRateCents,
      billingIncrementMinutes: row.billingIncrementMinutes,
      sessionLabel: row.roomName,
    });
    const deposit = deposits.get(row.id);
    return {
      sourceId: String(row.id),
      groupLabel,
      lines,
      ...(deposit
        ? { deduction: { key: { kind: "deposit_applied", id: String(deposit.id) }, amountMinor: deposit.paidMinor, label: `Deposit paid (${deposit.number ?? "deposit invoice"})` } }
        : {}),
    };
  });
}

const base = (db: DbOrTx) =>
  db
    .select(columns)
    .from(bookings)
    .innerJoin(rooms, eq(rooms.id, bookings.roomId))
    .innerJoin(rateCardVersions, eq(rateCardVersions.id, bookings.rateCardVersionId));

export const bookingSource: BillableSource = {
  kind: "booking",

  async listUnbilled(db, clientAccountId, ctx) {
    const rows = await base(db)
      .where(
        and(
          eq(bookings.clientAccountId, clientAccountId),
          eq(bookings.status, "wrapped"),
          sql`not exists (select 1 from invoiced_sources s where s.source_kind = 'booking' and s.source_id = cast(${bookings.id} as char))`,
        ),
      )
      .orderBy(bookings.startsAt);
    const ids = rows.map((r) => r.id);
    const loaded = load(rows, await wrappedAtOf(db, ids), await paidDeposits(db, ids), ctx);
    return loaded.map((item, i): BillableItemDto => {
      const lines = item.lines.map((l) => ({ description: l.description, explanation: l.explanation, category: l.category, amountCents: l.fixedAmountMinor ?? 0 }));
      return {
        kind: "booking",
        id: item.sourceId,
        date: rows[i]!.startsAt.toISOString(),
        description: item.groupLabel,
        amountCents: lines.reduce((sum, l) => sum + l.amountCents, 0),
        lines,
      };
    });
  },

  async loadForInvoice(tx, clientAccountId, ids, ctx) {
    const numeric = ids.map((r) => ({ ...r, n: /^\d{1,15}$/.test(r.id) ? Number(r.id) : -1 }));
    const wanted = numeric.map((r) => r.n).filter((n) => n > 0).concat(-1);
    // Lock the bookings (in id order) so a wrap or cancel cannot slip in while they are billed.
    await tx.select({ id: bookings.id }).from(bookings).where(inArray(bookings.id, wanted)).orderBy(bookings.id).for("update");
    const rows = await base(tx).where(inArray(bookings.id, wanted));
    for (const ref of numeric) {
      const row = rows.find((r) => r.id === ref.n);
      const field = `sources.${ref.index}.id`;
      if (!row || row.clientAccountId !== clientAccountId) {
        throw new HttpError(404, "not_found", `Booking ${ref.id} is not one of this client's`, [{ field, rule: "exists", message: "No such booking for this client" }]);
      }
      if (row.status !== "wrapped") {
        throw new HttpError(409, "not_billable", `Booking ${ref.id} is ${row.status.replace("_", " ")}; a session is billed once it is wrapped`, [{ field, rule: "wrapped", message: "Not wrapped yet" }]);
      }
    }
    const chosen = numeric.map((ref) => rows.find((r) => r.id === ref.n)!);
    const bookingIds = chosen.map((r) => r.id);
    return load(chosen, await wrappedAtOf(tx, bookingIds), await paidDeposits(tx, bookingIds), ctx);
  },
};
