import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, type TestApp } from "../../test/harness.ts";
import { demo } from "../../test/demo.ts";
import { demoIds } from "../bookings/test-helpers.ts";
import { recordStorageCharges } from "../vault/vault.jobs.ts";

let t: TestApp;
let ids: Awaited<ReturnType<typeof demoIds>>;
let manager: Awaited<ReturnType<TestApp["signIn"]>>;

beforeAll(async () => {
  t = await createTestApp();
  ids = await demoIds(t);
  manager = await t.signIn(demo.manager);
  await recordStorageCharges(t.db);
});
afterAll(async () => t?.close());

type Item = { kind: string; id: string; amountCents: number; lines: { category: string; amountCents: number }[] };
const billable = async (clientAccountId: number): Promise<Item[]> => (await manager.get(`/api/clients/${clientAccountId}/billable`)).body;

describe("billing tape sold and vault storage", () => {
  it("lists a tape sale at the amount recorded with it and invoices it once", async () => {
    const client = ids.client("Copper Vale");
    const [product] = (await manager.get("/api/tape/products")).body.filter((p: { onHand: number; priceCents: number }) => p.onHand >= 2 && p.priceCents > 0);
    const sale = await manager.post(`/api/tape/products/${product.id}/sales`).send({ quantity: 2, clientAccountId: client });
    expect(sale.status).toBe(201);

    const item = (await billable(client)).find((i) => i.kind === "tape_sale" && i.amountCents === 2 * product.priceCents);
    expect(item).toBeDefined();
    expect(item!.lines).toEqual([expect.objectContaining({ category: "tape_goods", amountCents: 2 * product.priceCents })]);

    const body = { clientAccountId: client, sources: [{ kind: "tape_sale", id: item!.id }] };
    const [first, second] = await Promise.all([manager.post("/api/invoices").send(body), manager.post("/api/invoices").send(body)]);
    expect([first.status, second.status].sort()).toEqual([201, 409]);
    expect([first, second].find((r) => r.status === 409)!.body.error.code).toBe("already_invoiced");
    expect((await billable(client)).some((i) => i.kind === "tape_sale" && i.id === item!.id)).toBe(false);
  });

  it("lists each recorded storage month of a client's reels and bills it in the storage category", async () => {
    const clients = (await manager.get("/api/clients")).body as { id: number }[];
    let found: { client: number; item: Item } | undefined;
    for (const c of clients) {
      const item = (await billable(c.id)).find((i) => i.kind === "storage");
      if (item) {
        found = { client: c.id, item };
        break;
      }
    }
    expect(found).toBeDefined();
    const created = await manager.post("/api/invoices").send({ clientAccountId: found!.client, sources: [{ kind: "storage", id: found!.item.id }] });
    expect(created.status).toBe(201);
    const invoice = (await manager.get(`/api/invoices/${created.body.id}`)).body;
    expect(invoice.lines).toEqual([expect.objectContaining({ category: "storage", amountCents: found!.item.amountCents })]);
  });

  it("refuses another client's tape sale with 404 naming the source", async () => {
    const [product] = (await manager.get("/api/tape/products")).body.filter((p: { onHand: number; priceCents: number }) => p.onHand >= 1 && p.priceCents > 0);
    await manager.post(`/api/tape/products/${product.id}/sales`).send({ quantity: 1, clientAccountId: ids.client("Blue Hour Records") });
    const theirs = (await billable(ids.client("Blue Hour Records"))).find((i) => i.kind === "tape_sale")!;
    const res = await manager.post("/api/invoices").send({ clientAccountId: ids.client("Copper Vale"), sources: [{ kind: "tape_sale", id: theirs.id }] });
    expect(res.status).toBe(404);
    expect(res.body.error.details[0].field).toBe("sources.0.id");
  });
});
