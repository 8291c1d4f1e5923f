import { mkdirSync, writeFileSync } from "node:fs";
import path from "node:path";
import { randomBytes } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { emptyStock, issue, receive, restock, salePriceCents, type StockState } from "@takeup/domain";
import type { Tx } from "../client.ts";
import { clientAccounts, projects, tapeMovements, tapeProducts, user } from "../schema/index.ts";

/** The four demo tape products of the brief, with invented SKUs, costs and prices. */
const demoProducts = [
  { sku: "WS-T2-2500", name: "2-inch tape, 2500 ft", widthInches: "2", lengthFt: 2500, reelInches: "10.5", priceMode: "fixed", fixedPriceCents: 32_000, markupBp: null, reorderPoint: 6 },
  { sku: "WS-T12-2500", name: "1/2-inch tape, 2500 ft", widthInches: "0.5", lengthFt: 2500, reelInches: "10.5", priceMode: "markup", fixedPriceCents: null, markupBp: 3000, reorderPoint: 4 },
  { sku: "WS-T14-2500", name: "1/4-inch tape, 2500 ft", widthInches: "0.25", lengthFt: 2500, reelInches: "10.5", priceMode: "fixed", fixedPriceCents: 6_000, markupBp: null, reorderPoint: 4 },
  { sku: "WS-T14-1200", name: "1/4-inch tape, 1200 ft", widthInches: "0.25", lengthFt: 1200, reelInches: "7", priceMode: "markup", fixedPriceCents: null, markupBp: 3500, reorderPoint: 3 },
] as const;

type Step =
  | { kind: "receipt"; sku: string; daysAgo: number; quantity: number; unitCostCents: number }
  | { kind: "sale"; sku: string; daysAgo: number; quantity: number; client: string; project?: string }
  | { kind: "adjustment"; sku: string; daysAgo: number; quantity: number; reason: string };

const supplier = "Northgate Media Supply";
const steps: Step[] = [
  { kind: "receipt", sku: "WS-T2-2500", daysAgo: 40, quantity: 12, unitCostCents: 24_500 },
  { kind: "receipt", sku: "WS-T12-2500", daysAgo: 40, quantity: 8, unitCostCents: 9_500 },
  { kind: "receipt", sku: "WS-T14-2500", daysAgo: 40, quantity: 10, unitCostCents: 4_400 },
  { kind: "receipt", sku: "WS-T14-1200", daysAgo: 40, quantity: 6, unitCostCents: 2_400 },
  { kind: "sale", sku: "WS-T2-2500", daysAgo: 12, quantity: 4, client: "Copper Vale", project: "Low Country" },
  { kind: "sale", sku: "WS-T12-2500", daysAgo: 12, quantity: 5, client: "Copper Vale", project: "Low Country" },
  { kind: "receipt", sku: "WS-T2-2500", daysAgo: 9, quantity: 6, unitCostCents: 26_000 },
  { kind: "sale", sku: "WS-T14-2500", daysAgo: 6, quantity: 2, client: "Ines Halloran" },
  { kind: "sale", sku: "WS-T2-2500", daysAgo: 3, quantity: 5, client: "Lantern Static", project: "Harbour Lights" },
  { kind: "adjustment", sku: "WS-T14-2500", daysAgo: 2, quantity: -1, reason: "Count: one reel found with a crushed flange" },
  { kind: "sale", sku: "WS-T14-1200", daysAgo: 1, quantity: 2, client: "The Quiet Orchard" },
];

/** A one-page PDF (Helvetica, plain text) small enough to build by hand: the demo's supplier receipts. */
export function tinyPdf(lines: string[]): Buffer {
  const escape = (s: string) => s.replace(/[\\()]/g, (c) => `\\${c}`);
  const text = lines.map((line, i) => `BT /F1 12 Tf 72 ${760 - i * 18} Td (${escape(line)}) Tj ET`).join("\n");
  const objects = [
    "<< /Type /Catalog /Pages 2 0 R >>",
    "<< /Type /Pages /Kids [3 0 R] /Count 1 >>",
    "<< /Type /Page /Parent 2 0 R /MediaBox [0 0 612 792] /Contents 4 0 R /Resources << /Font << /F1 5 0 R >> >> >>",
    `<< /Length ${Buffer.byteLength(text, "latin1")} >>\nstream\n${text}\nendstream`,
    "<< /Type /Font /Subtype /Type1 /BaseFont /Helvetica >>",
  ];
  let body = "%PDF-1.4\n";
  const offsets: number[] = [];
  objects.forEach((object, i) => {
    offsets.push(Buffer.byteLength(body, "latin1"));
    body += `${i + 1} 0 obj\n${object}\nendobj\n`;
  });
  const xref = Buffer.byteLength(body, "latin1");
  body += `xref\n0 ${objects.length + 1}\n0000000000 65535 f \n${offsets.map((o) => `${String(o).padStart(10, "0")} 00000 n \n`).join("")}`;
  body += `trailer\n<< /Size ${objects.length + 1} /Root 1 0 R >>\nstartxref\n${xref}\n%%EOF\n`;
  return Buffer.from(body, "latin1");
}

const day = 86_400_000;
const isoDay = (d: Date) => d.toISOString().slice(0, 10);

/**
 * Tape stock for the demo studio: receipts with small PDF receipts (written to `uploadsDir` when
 * given; without one the rows are kept and their files are simply absent), sales to the demo
 * clients and one count adjustment. On hand and average cost are worked out by the domain's rules.
 */
export async function seedTape(tx: Tx, now: Date, uploadsDir?: string) {
  const [manager] = await tx.select({ id: user.id }).from(user).where(eq(user.email, "manager@wrenfield.test"));
  const products = new Map<string, { id: number; name: string; state: StockState; rule: (typeof demoProducts)[number] }>();
  for (const p of demoProducts) {
    const [created] = await tx.insert(tapeProducts).values({ ...p, description: `Studio-grade ${p.name} on a ${p.reelInches}-inch reel` }).$returningId();
    products.set(p.sku, { id: created!.id, name: p.name, state: emptyStock, rule: p });
  }
  if (uploadsDir) mkdirSync(uploadsDir, { recursive: true });
  const clients = await tx.select().from(clientAccounts);
  for (const step of steps) {
    const product = products.get(step.sku)!;
    const at = new Date(now.getTime() - step.daysAgo * day);
    const base = { productId: product.id, createdByUserId: manager!.id, createdAt: at };
    if (step.kind === "receipt") {
      const state = receive(product.state, step.quantity, step.unitCostCents);
      const storedName = `${randomBytes(18).toString("base64url")}.upload`;
      const pdf = tinyPdf([supplier, `Delivery note, ${isoDay(at)}`, `${step.quantity} x ${product.name} (${step.sku})`, `Unit cost ${(step.unitCostCents / 100).toFixed(2)}`, "Demo document for Wrenfield Sound"]);
      if (uploadsDir) writeFileSync(path.join(uploadsDir, storedName), pdf);
      await tx.insert(tapeMovements).values({
        ...base,
        kind: "receipt",
        quantity: step.quantity,
        unitCostCents: step.unitCostCents,
        valueChangeCents: step.quantity * step.unitCostCents,
        description: `${product.name} (${step.sku})`,
        supplier,
        receivedOn: isoDay(at),
        receiptOriginalName: `${step.sku.toLowerCase()}-${isoDay(at)}.pdf`,
        receiptStoredName: storedName,
        receiptContentType: "application/pdf",
        receiptBytes: pdf.length,
        onHandAfter: state.onHand,
        averageCostAfterCents: state.averageCostCents,
      });
      product.state = state;
    } else if (step.kind === "sale") {
      const client = clients.find((c) => c.name === step.client)!;
      const [project] = step.project ? await tx.select({ id: projects.id }).from(projects).where(and(eq(projects.clientAccountId, client.id), eq(projects.name, step.project))) : [];
      const unit = salePriceCents({ mode: product.rule.priceMode, fixedPriceCents: product.rule.fixedPriceCents, markupBp: product.rule.markupBp }, product.state.averageCostCents)!;
      const out = issue(product.state, step.quantity);
      await tx.insert(tapeMovements).values({
        ...base,
        kind: "sale",
        quantity: -step.quantity,
        unitCostCents: Math.round(out.costOfGoodsCents / step.quantity),
        valueChangeCents: -out.costOfGoodsCents,
        costOfGoodsCents: out.costOfGoodsCents,
        unitPriceCents: unit,
        amountCents: unit * step.quantity,
        description: `Tape: ${product.name} (${step.sku})`,
        clientAccountId: client.id,
        projectId: project?.id ?? null,
        onHandAfter: out.state.onHand,
        averageCostAfterCents: out.state.averageCostCents,
      });
      product.state = out.state;
    } else {
      const moved = step.quantity > 0 ? restock(product.state, step.quantity) : (({ state, costOfGoodsCents }) => ({ state, costCents: -costOfGoodsCents }))(issue(product.state, -step.quantity));
      await tx.insert(tapeMovements).values({
        ...base,
        kind: "adjustment",
        quantity: step.quantity,
        unitCostCents: Math.round(Math.abs(moved.costCents) / Math.abs(step.quantity)),
        valueChangeCents: moved.costCents,
        description: `${product.name} (${step.sku})`,
        reason: step.reason,
        onHandAfter: moved.state.onHand,
        averageCostAfterCents: moved.state.averageCostCents,
      });
      product.state = moved.state;
    }
  }
  for (const product of products.values()) {
    const low = product.state.onHand < product.rule.reorderPoint;
    await tx
      .update(tapeProducts)
      .set({ onHand: product.state.onHand, valueCents: product.state.valueCents, averageCostCents: product.state.averageCostCents, lowStockSince: low ? now : null })
      .where(eq(tapeProducts.id, product.id));
  }
}
