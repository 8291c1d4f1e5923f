import { readdir } from "node:fs/promises";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import fc from "fast-check";
import { eq } from "drizzle-orm";
import { tapeMovements } from "@takeup/db";
import { createTestApp, type TestApp } from "../../test/harness.ts";
import { demo } from "../../test/demo.ts";
import { queueLowStockAlerts } from "./tape.jobs.ts";
import { deliverQueuedEmails } from "../../lib/outbox.ts";

type Agent = Awaited<ReturnType<TestApp["signIn"]>>;

// A minimal PDF and PNG: file-type recognises them by their first bytes.
const pdf = Buffer.from("%PDF-1.4\n1 0 obj<<>>endobj\ntrailer<<>>\n%%EOF\n");
const png = Buffer.from("89504e470d0a1a0a0000000d4948445200000001000000010806000000", "hex");

let t: TestApp;
let owner: Agent;
let manager: Agent;
let bookkeeper: Agent;
let engineer: Agent;
let client: Agent;
let band: { id: number; projectId: number };
let otherBand: { id: number; projectId: number };
let sku = 0;

async function bandNamed(name: string) {
  const clients = (await owner.get("/api/clients")).body as { id: number; name: string }[];
  const id = clients.find((c) => c.name === name)!.id;
  const projects = (await owner.get(`/api/clients/${id}/projects`)).body as { id: number }[];
  return { id, projectId: projects[0]!.id };
}

async function newProduct(extra: Record<string, unknown> = {}) {
  const response = await owner.post("/api/tape/products").send({ sku: `T-${++sku}`, name: `Test tape ${sku}`, widthInches: 2, lengthFt: 2500, reelInches: 10.5, priceMode: "fixed", fixedPriceCents: 32_000, ...extra });
  expect(response.status).toBe(201);
  return response.body as { id: number };
}

function receiveWith(agent: Agent, productId: number, fields: Record<string, string>, file: { content: Buffer; name: string } | null = { content: pdf, name: "receipt.pdf" }) {
  let req = agent.post(`/api/tape/products/${productId}/receipts`);
  for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
  if (file) req = req.attach("file", file.content, file.name);
  return req;
}
const receipt = (productId: number, quantity: number, unitCostCents: number) =>
  receiveWith(manager, productId, { quantity: String(quantity), unitCostCents: String(unitCostCents), supplier: "Harbour Media Supply", receivedOn: "2026-11-20" });

const product = async (id: number) => ((await manager.get("/api/tape/products")).body as { id: number }[]).find((p) => p.id === id) as Record<string, unknown>;
const uploads = async () => readdir(t.config.uploadsDir!);
const movementCount = async (productId: number) => (await t.db.select().from(tapeMovements).where(eq(tapeMovements.productId, productId))).length;

beforeAll(async () => {
  t = await createTestApp();
  [owner, manager, bookkeeper, engineer, client] = await Promise.all([t.signIn(demo.owner), t.signIn(demo.manager), t.signIn(demo.bookkeeper), t.signIn(demo.engineer), t.signIn(demo.client)]);
  band = await bandNamed("Lantern Static");
  otherBand = await bandNamed("The Quiet Orchard");
});
afterAll(async () => t.close());

describe("tape products", () => {
  it("lets the owner add a product with a price, and shows it to staff but not to clients", async () => {
    const { id } = await newProduct({ reorderPoint: 3 });
    const listed = await product(id);
    expect(listed).toMatchObject({ widthInches: 2, reelInches: 10.5, onHand: 0, priceCents: 32_000, lowStock: true, taxCategory: "goods" });
    expect((await engineer.get("/api/tape/products")).status).toBe(200);
    expect((await client.get("/api/tape/products")).status).toBe(403);
  });

  it("lets a manager add a product but not set its price or markup (403 naming the field)", async () => {
    const refused = await manager.post("/api/tape/products").send({ sku: "M-1", name: "Manager's tape", widthInches: 0.25, lengthFt: 1200, reelInches: 7, markupBp: 2500 });
    expect(refused.status).toBe(403);
    expect(refused.body.error.code).toBe("owner_sets_prices");
    expect(refused.body.error.details[0].field).toBe("markupBp");
    const made = await manager.post("/api/tape/products").send({ sku: "M-1", name: "Manager's tape", widthInches: 0.25, lengthFt: 1200, reelInches: 7 });
    expect(made.status).toBe(201);
    expect(made.body.priceCents).toBeNull();
  });

  it("refuses a second product with the same SKU (409) and a width that is not made (400 naming the field)", async () => {
    await newProduct({ sku: "DUP-1" });
    const again = await owner.post("/api/tape/products").send({ sku: "DUP-1", name: "x", widthInches: 2, lengthFt: 2500, reelInches: 10.5 });
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe("sku_exists");
    const odd = await owner.post("/api/tape/products").send({ sku: "W-3", name: "x", widthInches: 3, lengthFt: 2500, reelInches: 10.5 });
    expect(odd.status).toBe(400);
    expect(odd.body.error.details[0].field).toBe("widthInches");
  });

  it("prices a markup product at average cost plus the owner's markup", async () => {
    const { id } = await newProduct({ priceMode: "markup", fixedPriceCents: null, markupBp: 2500 });
    expect((await receipt(id, 4, 20_000)).status).toBe(201);
    expect(await product(id)).toMatchObject({ averageCostCents: 20_000, priceCents: 25_000, marginBp: 2000 });
  });
});

describe("receiving stock with a receipt upload", () => {
  it("records the receipt, moves on hand and average cost, and serves the file to staff only with its sniffed type", async () => {
    const { id } = await newProduct();
    const first = await receipt(id, 10, 25_000);
    expect(first.status).toBe(201);
    expect(first.body).toMatchObject({ kind: "receipt", quantity: 10, supplier: "Harbour Media Supply", receivedOn: "2026-11-20", onHandAfter: 10, averageCostAfterCents: 25_000 });
    const second = await receiveWith(manager, id, { quantity: "5", unitCostCents: "28000", supplier: "Harbour Media Supply", receivedOn: "2026-11-25" }, { content: png, name: "photo.pdf" });
    expect(second.status).toBe(201);
    expect(second.body.receipt).toEqual({ fileName: "photo.pdf", contentType: "image/png", bytes: png.length });
    expect(await product(id)).toMatchObject({ onHand: 15, averageCostCents: 26_000, valueCents: 390_000 });

    const download = await bookkeeper.get(`/api/tape/movements/${second.body.id}/receipt`).buffer(true).parse((res, done) => {
      const chunks: Buffer[] = [];
      res.on("data", (c: Buffer) => chunks.push(c));
      res.on("end", () => done(null, Buffer.concat(chunks)));
    });
    expect(download.status).toBe(200);
    expect(download.headers["content-type"]).toBe("image/png");
    expect(download.headers["content-disposition"]).toBe("attachment; filename=photo.pdf");
    expect(Buffer.compare(download.body as Buffer, png)).toBe(0);
    expect((await client.get(`/api/tape/movements/${second.body.id}/receipt`)).status).toBe(403);
    expect((await manager.get(`/api/tape/movements/999999/receipt`)).status).toBe(404);
  });

  it("refuses a file that is not PDF, PNG or JPEG by its content whatever its name (400), writing nothing", async () => {
    const { id } = await newProduct();
    const before = await uploads();
    const response = await receiveWith(manager, id, { quantity: "1", unitCostCents: "100", supplier: "S", receivedOn: "2026-11-20" }, { content: Buffer.from("<html>not a receipt</html>"), name: "receipt.pdf" });
    expect(response.status).toBe(400);
    expect(response.body.error.code).toBe("unsupported_file_type");
    expect(response.body.error.details[0].field).toBe("file");
    expect(await uploads()).toEqual(before);
    expect(await movementCount(id)).toBe(0);
  });

  it("refuses a file over 10 MB with 413, writing nothing", async () => {
    const { id } = await newProduct();
    const before = await uploads();
    const big = Buffer.concat([pdf, Buffer.alloc(10 * 1024 * 1024)]);
    const response = await receiveWith(manager, id, { quantity: "1", unitCostCents: "100", supplier: "S", receivedOn: "2026-11-20" }, { content: big, name: "big.pdf" });
    expect(response.status).toBe(413);
    expect(response.body.error.code).toBe("file_too_large");
    expect(await uploads()).toEqual(before);
    expect(await movementCount(id)).toBe(0);
  });

  it("names the field for a bad quantity or a missing file (400) and keeps no file", async () => {
    const { id } = await newProduct();
    const before = await uploads();
    const badQuantity = await receiveWith(manager, id, { quantity: "two", unitCostCents: "100", supplier: "S", receivedOn: "2026-11-20" });
    expect(badQuantity.status).toBe(400);
    expect(badQuantity.body.error.details[0].field).toBe("quantity");
    const noFile = await receiveWith(manager, id, { quantity: "1", unitCostCents: "100", supplier: "S", receivedOn: "2026-11-20" }, null);
    expect(noFile.status).toBe(400);
    expect(noFile.body.error.details[0].field).toBe("file");
    const unknownProduct = await receiveWith(manager, 999_999, { quantity: "1", unitCostCents: "100", supplier: "S", receivedOn: "2026-11-20" });
    expect(unknownProduct.status).toBe(404);
    expect(await uploads()).toEqual(before);
  });

  it("answers malformed multipart forms with a 4xx and leaves no file behind (fast-check, 120 forms)", async () => {
    const { id } = await newProduct();
    const before = await uploads();
    const fieldArb = fc.dictionary(fc.constantFrom("quantity", "unitCostCents", "supplier", "receivedOn", "extra", "file"), fc.oneof(fc.string({ maxLength: 12 }), fc.constantFrom("-1", "1e3", "0", "99999999999999", "2026-02-30", "\ud800", "x".repeat(3000))));
    const fileArb = fc.option(fc.record({ content: fc.constantFrom(pdf, png, Buffer.from("GIF89a"), Buffer.alloc(0)), name: fc.constantFrom("r.pdf", "", "../../etc/passwd", "a\u0000b.png") }));
    const samples = fc.sample(fc.tuple(fieldArb, fileArb), { seed: 11, numRuns: 120 });
    const failures: string[] = [];
    for (const [fields, file] of samples) {
      const response = await receiveWith(manager, id, fields, file && file.content.length > 0 ? file : null);
      if (response.status >= 500) failures.push(`${JSON.stringify(fields)} → ${response.status}`);
    }
    expect(failures).toEqual([]);
    // Only the well-formed ones (if any) were kept, each with its movement.
    expect((await uploads()).length - before.length).toBe(await movementCount(id));
  });
});

describe("selling, returning and counting stock", () => {
  it("follows the OpenStax moving-average example through the API (Principles of Accounting Vol. 1, §10.3 [S]): 7,253 / 8,902 / 4,087", async () => {
    const { id } = await newProduct();
    const sell = (quantity: number, unitPriceCents: number) => manager.post(`/api/tape/products/${id}/sales`).send({ quantity, clientAccountId: band.id, projectId: band.projectId, unitPriceCents });
    expect((await receipt(id, 150, 2100)).status).toBe(201);
    const jul5 = await sell(120, 3600);
    expect((await receipt(id, 225, 2700)).body.averageCostAfterCents).toBe(2629);
    const jul15 = await sell(180, 3900);
    const jul25 = await receipt(id, 210, 3300);
    expect(jul25.body.averageCostAfterCents).toBe(3124);
    const cogs = jul5.body.costOfGoodsCents + jul15.body.costOfGoodsCents;
    const sales = jul5.body.amountCents + jul15.body.amountCents;
    expect(Math.round(cogs / 100)).toBe(7253);
    expect(Math.round(((await product(id)).valueCents as number) / 100)).toBe(8902);
    expect(Math.round((sales - cogs) / 100)).toBe(4087);
    expect(jul15.body).toMatchObject({ kind: "sale", quantity: -180, unitPriceCents: 3900, amountCents: 702_000, costOfGoodsCents: 473_294, clientAccountId: band.id, projectId: band.projectId, clientName: "Lantern Static" });
  });

  it("defaults the sale price from the product and keeps what invoicing needs on the sale", async () => {
    const { id } = await newProduct();
    await receipt(id, 3, 25_000);
    const sale = await manager.post(`/api/tape/products/${id}/sales`).send({ quantity: 2, clientAccountId: band.id, projectId: band.projectId });
    expect(sale.status).toBe(201);
    expect(sale.body).toMatchObject({ unitPriceCents: 32_000, amountCents: 64_000, costOfGoodsCents: 50_000, onHandAfter: 1 });
    expect(sale.body.description).toContain("Test tape");
  });

  it("refuses a sale beyond stock with 409 insufficient_stock saying how many are left, and changes nothing", async () => {
    const { id } = await newProduct();
    await receipt(id, 2, 25_000);
    const response = await manager.post(`/api/tape/products/${id}/sales`).send({ quantity: 3, clientAccountId: band.id });
    expect(response.status).toBe(409);
    expect(response.body.error.code).toBe("insufficient_stock");
    expect(response.body.error.message).toContain("only 2 are left");
    expect(await product(id)).toMatchObject({ onHand: 2 });
    expect(await movementCount(id)).toBe(1);
  });

  it("lets exactly one of two concurrent sales of the last reels succeed", async () => {
    const { id } = await newProduct();
    await receipt(id, 2, 25_000);
    const [a, b] = await Promise.all([
      manager.post(`/api/tape/products/${id}/sales`).send({ quantity: 2, clientAccountId: band.id }),
      owner.post(`/api/tape/products/${id}/sales`).send({ quantity: 2, clientAccountId: otherBand.id }),
    ]);
    expect([a.status, b.status].sort()).toEqual([201, 409]);
    expect(await product(id)).toMatchObject({ onHand: 0, valueCents: 0 });
  });

  it("refuses a project or booking of another client (400 naming the field)", async () => {
    const { id } = await newProduct();
    await receipt(id, 2, 25_000);
    const response = await manager.post(`/api/tape/products/${id}/sales`).send({ quantity: 1, clientAccountId: band.id, projectId: otherBand.projectId });
    expect(response.status).toBe(400);
    expect(response.body.error.details[0]).toMatchObject({ field: "projectId", rule: "belongs_to_client" });
    const unknownBooking = await manager.post(`/api/tape/products/${id}/sales`).send({ quantity: 1, clientAccountId: band.id, bookingId: 999_999 });
    expect(unknownBooking.body.error.details[0].field).toBe("bookingId");
  });

  it("takes returns back at the average, adjusts and writes off with reasons, and lists the history newest first", async () => {
    const { id } = await newProduct();
    await receipt(id, 4, 25_000);
    await manager.post(`/api/tape/products/${id}/sales`).send({ quantity: 2, clientAccountId: band.id });
    const back = await manager.post(`/api/tape/products/${id}/returns`).send({ quantity: 1, clientAccountId: band.id, reason: "Unopened" });
    expect(back.body).toMatchObject({ kind: "return", quantity: 1, valueChangeCents: 25_000, onHandAfter: 3 });
    const adjust = await manager.post(`/api/tape/products/${id}/adjustments`).send({ quantity: -1, reason: "Found a split box" });
    expect(adjust.body).toMatchObject({ kind: "adjustment", quantity: -1, onHandAfter: 2 });
    const noReason = await manager.post(`/api/tape/products/${id}/write-offs`).send({ quantity: 1 });
    expect(noReason.status).toBe(400);
    expect(noReason.body.error.details[0].field).toBe("reason");
    const writeOff = await manager.post(`/api/tape/products/${id}/write-offs`).send({ quantity: 1, reason: "Crushed reel" });
    expect(writeOff.body).toMatchObject({ kind: "write_off", quantity: -1, onHandAfter: 1 });
    const tooMany = await manager.post(`/api/tape/products/${id}/write-offs`).send({ quantity: 5, reason: "x" });
    expect(tooMany.status).toBe(409);
    const history = (await bookkeeper.get(`/api/tape/products/${id}/movements`)).body as { kind: string }[];
    expect(history.map((m) => m.kind)).toEqual(["write_off", "adjustment", "return", "sale", "receipt"]);
  });

  it("posts a count sheet as one adjustment per difference, all or nothing", async () => {
    const a = await newProduct();
    const b = await newProduct();
    const c = await newProduct();
    await receipt(a.id, 5, 1000);
    await receipt(b.id, 5, 1000);
    const sheet = await manager.post("/api/tape/counts").send({ reason: "Month-end count", lines: [{ productId: a.id, counted: 4 }, { productId: b.id, counted: 5 }, { productId: c.id, counted: 2 }] });
    expect(sheet.status).toBe(201);
    expect(sheet.body.adjustments.map((m: { productId: number; quantity: number }) => [m.productId, m.quantity])).toEqual([[a.id, -1], [c.id, 2]]);
    const failing = await manager.post("/api/tape/counts").send({ reason: "Again", lines: [{ productId: a.id, counted: 1 }, { productId: 999_999, counted: 1 }] });
    expect(failing.status).toBe(404);
    expect(failing.body.error.details[0].field).toBe("lines.1.productId");
    expect(await product(a.id)).toMatchObject({ onHand: 4 });
  });

  it("records each movement in the audit log", async () => {
    const { id } = await newProduct();
    const r = await receipt(id, 1, 100);
    const audit = (await owner.get("/api/audit-events").query({ entityType: "tape_movement" })).body as unknown;
    expect(JSON.stringify(audit)).toContain(`"entityId":"${r.body.id}"`);
  });
});

describe("the demo studio's tape", () => {
  it("holds the four demo products with stock, a receipt PDF to download, and the 1/2-inch tape flagged for reorder", async () => {
    const products = (await manager.get("/api/tape/products")).body as { sku: string; id: number; onHand: number; lowStock: boolean }[];
    const demoSkus = products.filter((p) => p.sku.startsWith("WS-"));
    expect(demoSkus.map((p) => p.sku).sort()).toEqual(["WS-T12-2500", "WS-T14-1200", "WS-T14-2500", "WS-T2-2500"]);
    const half = demoSkus.find((p) => p.sku === "WS-T12-2500")!;
    expect(half).toMatchObject({ onHand: 3, lowStock: true });
    const history = (await manager.get(`/api/tape/products/${half.id}/movements`)).body as { id: number; kind: string }[];
    const receiptRow = history.find((m) => m.kind === "receipt")!;
    const file = await manager.get(`/api/tape/movements/${receiptRow.id}/receipt`);
    expect(file.status).toBe(200);
    expect(file.headers["content-type"]).toBe("application/pdf");
  });
});

describe("low-stock e-mail to managers", () => {
  it("queues and sends one e-mail per crossing below the reorder point, even when two runs race, and again only after a new crossing", async () => {
    const { id } = await newProduct({ reorderPoint: 2, sku: "LOW-1" });
    await receipt(id, 3, 1000);
    await queueLowStockAlerts(t.db); // other tests' products that are already low
    await manager.post(`/api/tape/products/${id}/sales`).send({ quantity: 2, clientAccountId: band.id });
    const counts = await Promise.all([queueLowStockAlerts(t.db), queueLowStockAlerts(t.db)]);
    expect(counts.sort()).toEqual([0, 1]);
    expect(await queueLowStockAlerts(t.db)).toBe(0);
    await deliverQueuedEmails(t.db, t.mailer);
    const alerts = () => t.mailTo(demo.manager).filter((m) => m.subject.includes("LOW-1") || m.text.includes("LOW-1"));
    expect(alerts()).toHaveLength(1);
    expect(alerts()[0]!.text).toContain("down to 1 on hand");
    await receipt(id, 5, 1000);
    expect(await queueLowStockAlerts(t.db)).toBe(0);
    await manager.post(`/api/tape/products/${id}/adjustments`).send({ quantity: -5, reason: "Recount" });
    expect(await queueLowStockAlerts(t.db)).toBe(1);
    await deliverQueuedEmails(t.db, t.mailer);
    expect(alerts()).toHaveLength(2);
  });
});

describe("malformed payloads on every tape write", () => {
  it("answers 1,000 generated malformed payloads per mutating tape route without a 5xx (fast-check, fixed seed)", async () => {
    const { id } = await newProduct();
    await receipt(id, 5, 1000);
    const junk = fc.oneof(
      fc.anything({ maxDepth: 2 }),
      fc.constantFrom(null, -1, 0, 1.5, 2 ** 53, 1e308, "", "\ud800", "x".repeat(600), [], {}),
      fc.integer({ min: -5, max: 200_000 }),
      fc.string({ maxLength: 20 }),
    );
    const shaped = (keys: string[]) => fc.dictionary(fc.constantFrom(...keys, "extra"), junk, { maxKeys: keys.length + 1 });
    const routes: [string, string[]][] = [
      ["/api/tape/products", ["sku", "name", "widthInches", "lengthFt", "reelInches", "priceMode", "fixedPriceCents", "markupBp", "reorderPoint"]],
      [`/api/tape/products/${id}/sales`, ["quantity", "clientAccountId", "projectId", "bookingId", "unitPriceCents"]],
      [`/api/tape/products/${id}/returns`, ["quantity", "clientAccountId", "projectId", "bookingId", "reason"]],
      [`/api/tape/products/${id}/adjustments`, ["quantity", "reason"]],
      [`/api/tape/products/${id}/write-offs`, ["quantity", "reason"]],
      ["/api/tape/counts", ["lines", "reason"]],
      ["/api/tape/plan", ["songs", "speedIps", "reelLengthFt", "allowanceMinutes", "recorderId", "productId"]],
      [`/api/tape/products/${id}`, ["sku", "name", "active", "reorderPoint", "markupBp"]],
      [`/api/tape/products/${id}/receipts`, ["quantity", "unitCostCents", "supplier", "receivedOn"]],
    ];
    const failures: string[] = [];
    let sent = 0;
    for (const [index, [path, keys]] of routes.entries()) {
      const payloads = fc.sample(fc.oneof({ arbitrary: shaped(keys), weight: 4 }, { arbitrary: junk, weight: 1 }), { seed: 20261202 + index, numRuns: 1000 });
      const method = path === `/api/tape/products/${id}` ? "patch" : "post";
      for (let i = 0; i < payloads.length; i += 10) {
        await Promise.all(
          payloads.slice(i, i + 10).map(async (payload) => {
            const response = await owner[method](path).set("content-type", "application/json").send(JSON.stringify(payload) ?? "null");
            sent++;
            if (response.status >= 500) failures.push(`${method.toUpperCase()} ${path} ${JSON.stringify(payload)?.slice(0, 160)} → ${response.status} ${JSON.stringify(response.body).slice(0, 160)}`);
          }),
        );
      }
    }
    expect(sent).toBe(routes.length * 1000);
    expect(failures).toEqual([]);
  }, 600_000);
});

describe("the tape planner", () => {
  it("plans reels for any staff role and prices them at today's price", async () => {
    const { id } = await newProduct();
    const response = await engineer.post("/api/tape/plan").send({ songs: [{ title: "Opener", minutes: 4, takes: 3 }, { minutes: 6.5, takes: 2 }], speedIps: 15, reelLengthFt: 2500, productId: id });
    expect(response.status).toBe(200);
    expect(response.body).toMatchObject({ minutesPerReel: 32.33, reelsNeeded: 1, unitPriceCents: 32_000, totalPriceCents: 32_000 });
    expect(response.body.alternatives.map((a: { speedIps: number }) => a.speedIps)).toEqual([7.5, 30]);
    expect((await client.post("/api/tape/plan").send({ songs: [{ minutes: 1, takes: 1 }], speedIps: 15, reelLengthFt: 2500 })).status).toBe(403);
  });

  it("refuses a take longer than a reel with 400 naming the song", async () => {
    const response = await manager.post("/api/tape/plan").send({ songs: [{ title: "Ok", minutes: 3, takes: 1 }, { title: "Side-long Suite", minutes: 40, takes: 1 }], speedIps: 15, reelLengthFt: 2500 });
    expect(response.status).toBe(400);
    expect(response.body.error.message).toContain("Side-long Suite");
    expect(response.body.error.details[0].field).toBe("songs.1.minutes");
  });
});
