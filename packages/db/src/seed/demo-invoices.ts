// A month of demo invoices for the invented clients of BRIEF.md: paid, part-paid, overdue by 10
// and by 45 days, one void, one corrected by a credit note; cheque and bank-transfer payments.
// Lines are typed in (manual), so the wrapped demo sessions stay billable for the screens.
import { eq } from "drizzle-orm";
import { DateTime } from "luxon";
import { computeInvoice, dueDate, formatInvoiceNumber, type TaxCategory, type TaxRates } from "@takeup/domain";
import type { Tx } from "../client.ts";
import { clientAccounts, creditNotes, documentCounters, invoiceLines, invoicePayments, invoiceSettings, invoices } from "../schema/index.ts";

const zone = "America/Chicago";

/** A DEMO VALUE, not advice: a 6.25% state rate on tape and media sold only. */
const demoTaxRates: TaxRates = { room: 0, engineer: 0, tape_goods: 62_500, storage: 0, other: 0 };

type DemoLine = { description: string; category: TaxCategory; quantity: number; unitPriceCents: number };
type DemoInvoice = {
  client: string;
  /** Days before today the invoice was issued. */
  issuedDaysAgo: number;
  lines: DemoLine[];
  payments?: { method: "cash" | "cheque" | "bank_transfer"; reference?: string; daysAgo: number; share: "all" | "part" }[];
  void?: string;
  creditLast?: string;
};

const tape = (reels: number): DemoLine => ({ description: "2-inch tape, 2500 ft reel", category: "tape_goods", quantity: reels, unitPriceCents: 32_000 });
const room = (description: string, hours: number, rate: number): DemoLine => ({ description, category: "room", quantity: hours, unitPriceCents: rate });
const engineer = (hours: number): DemoLine => ({ description: "House engineer", category: "engineer", quantity: hours, unitPriceCents: 6_500 });

const plan: DemoInvoice[] = [
  { client: "Lantern Static", issuedDaysAgo: 30, lines: [room("Room A tracking, Saturday", 10, 12_000), engineer(10), tape(2)], payments: [{ method: "cheque", reference: "2231", daysAgo: 20, share: "all" }] },
  { client: "Lantern Static", issuedDaysAgo: 12, lines: [room("Room B overdubs", 6, 7_500), engineer(6)], payments: [{ method: "bank_transfer", reference: "LS-OCT-18", daysAgo: 5, share: "part" }] },
  { client: "The Quiet Orchard", issuedDaysAgo: 24, lines: [room("Room C mix, two songs", 8, 9_000), tape(1)] },
  { client: "Blue Hour Records", issuedDaysAgo: 59, lines: [room("Room A lockout day", 1, 150_000), engineer(12), tape(3)] },
  { client: "Ines Halloran", issuedDaysAgo: 18, lines: [room("Room B vocal session", 4, 7_500)], void: "Billed to the label instead" },
  { client: "Copper Vale", issuedDaysAgo: 16, lines: [room("Room A drums", 8, 12_000), { description: "Courier for reels", category: "other", quantity: 1, unitPriceCents: 4_500 }], creditLast: "Courier not used" },
];

export async function seedInvoices(tx: Tx) {
  await tx.insert(invoiceSettings).values({ id: 1, invoicePrefix: "WF", creditNotePrefix: "WFC", taxRates: demoTaxRates, paymentInstructions: "Cheques to Wrenfield Sound; bank transfers quoting the invoice number (demo text)." });
  const clients = await tx.select().from(clientAccounts);
  const today = DateTime.now().setZone(zone).startOf("day");
  const counters = new Map<string, number>();
  const next = (series: string, year: number) => {
    const key = `${series}|${year}`;
    const n = (counters.get(key) ?? 0) + 1;
    counters.set(key, n);
    return n;
  };
  for (const p of [...plan].sort((a, b) => b.issuedDaysAgo - a.issuedDaysAgo)) {
    const client = clients.find((c) => c.name === p.client)!;
    const issued = today.minus({ days: p.issuedDaysAgo });
    const issuedOn = issued.toISODate()!;
    const year = issued.year;
    const sequence = next("WF", year);
    const totals = computeInvoice({
      lines: p.lines.map((l) => ({ category: l.category, quantityMilli: l.quantity * 1000, unitPriceMinor: l.unitPriceCents })),
      tax: { rates: demoTaxRates, calculation: "per_line", rounding: "half_up" },
    });
    const [created] = await tx
      .insert(invoices)
      .values({
        status: "issued",
        clientAccountId: client.id,
        series: "WF",
        year,
        sequence,
        number: formatInvoiceNumber("WF", year, sequence),
        currency: "USD",
        issuedOn,
        issuedAt: issued.plus({ hours: 10 }).toJSDate(),
        dueOn: dueDate(issuedOn, 14),
        subtotalMinor: totals.subtotalMinor,
        discountMinor: totals.discountMinor,
        taxMinor: totals.taxMinor,
        totalMinor: totals.totalMinor,
        balanceMinor: totals.totalMinor,
        taxSettings: { rates: demoTaxRates, calculation: "per_line", rounding: "half_up" },
      })
      .$returningId();
    const id = created!.id;
    await tx.insert(invoiceLines).values(
      p.lines.map((l, i) => ({
        invoiceId: id,
        position: i,
        sourceKind: "manual",
        category: l.category,
        description: l.description,
        quantityMilli: l.quantity * 1000,
        unit: l.category === "room" || l.category === "engineer" ? "hour" : "each",
        unitPriceMinor: l.unitPriceCents,
        amountMinor: totals.lines[i]!.amountMinor,
        discountMinor: 0,
        netMinor: totals.lines[i]!.netMinor,
        taxRatePpm: demoTaxRates[l.category],
        taxMinor: totals.lines[i]!.taxMinor,
      })),
    );
    let paid = 0;
    for (const pay of p.payments ?? []) {
      const amount = pay.share === "all" ? totals.totalMinor : Math.floor(totals.totalMinor / 2);
      await tx.insert(invoicePayments).values({ invoiceId: id, method: pay.method, reference: pay.reference ?? null, receivedOn: today.minus({ days: pay.daysAgo }).toISODate()!, amountMinor: amount, appliedMinor: amount });
      paid += amount;
    }
    let credited = 0;
    if (p.creditLast) {
      const line = p.lines.length - 1;
      const lineRows = await tx.select().from(invoiceLines).where(eq(invoiceLines.invoiceId, id));
      const lastRow = lineRows.find((r) => r.position === line)!;
      credited = totals.lines[line]!.netMinor + totals.lines[line]!.taxMinor;
      const cn = next("WFC", today.year);
      await tx.insert(creditNotes).values({
        invoiceId: id,
        series: "WFC",
        year: today.year,
        sequence: cn,
        number: formatInvoiceNumber("WFC", today.year, cn),
        issuedOn: today.minus({ days: 3 }).toISODate()!,
        reason: p.creditLast,
        lines: [{ invoiceLineId: lastRow.id, description: lastRow.description, netMinor: totals.lines[line]!.netMinor, taxMinor: totals.lines[line]!.taxMinor }],
        netMinor: totals.lines[line]!.netMinor,
        taxMinor: totals.lines[line]!.taxMinor,
        totalMinor: credited,
      });
    }
    const balance = totals.totalMinor - paid - credited;
    await tx
      .update(invoices)
      .set({
        paidMinor: paid,
        creditedMinor: credited,
        balanceMinor: p.void ? 0 : balance,
        status: p.void ? "void" : balance === 0 ? "paid" : paid + credited > 0 ? "part_paid" : "issued",
        ...(p.void ? { voidedAt: today.minus({ days: p.issuedDaysAgo - 1 }).toJSDate(), voidReason: p.void } : {}),
      })
      .where(eq(invoices.id, id));
  }
  for (const [key, last] of counters) {
    const [series, year] = key.split("|") as [string, string];
    await tx.insert(documentCounters).values({ series, year: Number(year), lastSequence: last });
  }
}
