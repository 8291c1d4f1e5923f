import fc from "fast-check";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, eq, isNull } from "drizzle-orm";
import { bookings, documentCounters, invoices } from "@takeup/db";
import { createTestApp, type TestApp } from "../../test/harness.ts";
import { demo } from "../../test/demo.ts";
import { demoIds } from "../bookings/test-helpers.ts";
import type { TaxCategory } from "@takeup/domain";
import { pdfText } from "../../../../../tests/support/pdf-text.ts";
import { loadActor } from "../../lib/actor.ts";
import { issueInvoice } from "./invoices.service.ts";
import { sendInvoiceReminders } from "./invoices.jobs.ts";

let t: TestApp;
let ids: Awaited<ReturnType<typeof demoIds>>;
type Agent = Awaited<ReturnType<TestApp["signIn"]>>;
let manager: Agent;
let owner: Agent;
let books: Agent;

const manual = (description: string, unitPriceCents: number, quantity = 1) => ({ description, category: "other" as TaxCategory, quantity, unitPriceCents });

async function draft(agent: Agent, clientAccountId: number, lines = [manual("Mastering, one song", 15_000)]) {
  const res = await agent.post("/api/invoices").send({ clientAccountId, sources: [], manualLines: lines });
  expect(res.status).toBe(201);
  return res.body as { id: number; totalCents: number };
}

async function pdfAsBuffer(agent: Agent, id: number) {
  const res = await agent.get(`/api/invoices/${id}/pdf`).buffer(true).parse((r, cb) => {
    const chunks: Buffer[] = [];
    r.on("data", (c: Buffer) => chunks.push(c));
    r.on("end", () => cb(null, Buffer.concat(chunks)));
  });
  return res;
}

beforeAll(async () => {
  t = await createTestApp();
  ids = await demoIds(t);
  [manager, owner, books] = await Promise.all([t.signIn(demo.manager), t.signIn(demo.owner), t.signIn(demo.bookkeeper)]);
});
afterAll(async () => t?.close());

describe("billing a wrapped session", () => {
  it("lists a client's wrapped sessions as billable, with the quote's own line amounts", async () => {
    const res = await manager.get(`/api/clients/${ids.client("Copper Vale")}/billable`);
    expect(res.status).toBe(200);
    const session = res.body.find((i: { kind: string }) => i.kind === "booking");
    const [booking] = await t.db.select().from(bookings).where(eq(bookings.id, Number(session.id)));
    expect(session.kind).toBe("booking");
    expect(session.lines.map((l: { amountCents: number }) => l.amountCents)).toEqual(booking!.quote.lines.map((l) => l.amountCents));
    expect(session.amountCents).toBe(booking!.quoteTotalCents);
    expect(session.lines.some((l: { category: string }) => l.category === "engineer")).toBe(true);
  });

  it("invoices a session at most once when two managers invoice the same client at the same moment", async () => {
    const client = ids.client("Copper Vale");
    const item = (await manager.get(`/api/clients/${client}/billable`)).body.find((i: { kind: string }) => i.kind === "booking");
    const body = { clientAccountId: client, sources: [{ kind: "booking", id: item.id }] };
    const answers = await Promise.all([0, 1, 2, 3].map((i) => (i % 2 ? owner : manager).post("/api/invoices").send(body)));
    const statuses = answers.map((a) => a.status).sort();
    expect(statuses).toEqual([201, 409, 409, 409]);
    expect(answers.filter((a) => a.status === 409).every((a) => a.body.error.code === "already_invoiced")).toBe(true);
    const made = answers.find((a) => a.status === 201)!.body;
    expect(made.status).toBe("draft");
    expect(made.totalCents).toBe(item.amountCents);
    expect((await t.db.select().from(invoices).where(and(eq(invoices.clientAccountId, client), eq(invoices.status, "draft")))).length).toBe(1);
    expect((await manager.get(`/api/clients/${client}/billable`)).body.filter((i: { kind: string }) => i.kind === "booking")).toEqual([]);
  });

  it("makes the session billable again when its draft is voided", async () => {
    const client = ids.client("Copper Vale");
    const [row] = await t.db.select().from(invoices).where(and(eq(invoices.clientAccountId, client), eq(invoices.status, "draft")));
    expect((await manager.post(`/api/invoices/${row!.id}/void`).send({ reason: "Wrong client" })).status).toBe(200);
    expect((await manager.get(`/api/clients/${client}/billable`)).body.filter((i: { kind: string }) => i.kind === "booking")).toHaveLength(1);
  });
});

describe("issuing", () => {
  it("gives 50 concurrent issues 50 consecutive numbers, none shared or skipped", async () => {
    // A client with no e-mail address, so only the numbering is timed here.
    const made = await manager.post("/api/clients").send({ name: "Numbering Check", kind: "band" });
    const client = made.body.id as number;
    const drafts = [];
    for (let i = 0; i < 50; i++) drafts.push(await draft(manager, client, [manual(`Edit ${i}`, 1000 + i)]));
    const answers = await Promise.all(drafts.map((d, i) => (i % 2 ? owner : manager).post(`/api/invoices/${d.id}/issue`)));
    expect(answers.map((a) => a.status)).toEqual(drafts.map(() => 200));
    const sequences = answers.map((a) => Number(a.body.number.split("-").at(-1))).sort((a, b) => a - b);
    const first = sequences[0]!;
    expect(sequences).toEqual(Array.from({ length: 50 }, (_, i) => first + i));
  }, 180_000);

  it("leaves no invoice and no used number when the issue is aborted after taking its number", async () => {
    const d = await draft(manager, ids.client("Ines Halloran"));
    const actor = (await loadActor(t.db, (await manager.get("/api/me")).body.id))!;
    const [before] = await t.db.select().from(documentCounters);
    let taken = "";
    await expect(
      issueInvoice(t.db, actor, d.id, {
        afterNumber: async (number) => {
          taken = number;
          throw new Error("process killed");
        },
      }),
    ).rejects.toThrow("process killed");
    const [after] = await t.db.select().from(documentCounters);
    expect(after!.lastSequence).toBe(before!.lastSequence);
    const [row] = await t.db.select().from(invoices).where(eq(invoices.id, d.id));
    expect(row).toMatchObject({ status: "draft", number: null });
    const issued = await manager.post(`/api/invoices/${d.id}/issue`);
    expect(issued.body.number).toBe(taken);
  });

  it("refuses to change or issue again an issued invoice (invoice_not_draft)", async () => {
    const d = await draft(manager, ids.client("Ines Halloran"));
    await manager.post(`/api/invoices/${d.id}/issue`).expect(200);
    const edit = await manager.patch(`/api/invoices/${d.id}`).send({ notes: "changed" });
    expect(edit.status).toBe(409);
    expect(edit.body.error.code).toBe("invoice_not_draft");
    expect((await manager.post(`/api/invoices/${d.id}/issue`)).body.error.code).toBe("invoice_not_draft");
  });

  it("e-mails the issued invoice to the client's billing address with its PDF, which reads back the number, totals and tax", async () => {
    await owner.patch("/api/invoice-settings").send({ taxRates: { room: 0, engineer: 0, tape_goods: 62_500, storage: 0, other: 0 } }).expect(200);
    const client = ids.client("Lantern Static");
    const d = await draft(manager, client, [manual("Room time, half day", 42_500), { description: "Reel of 2-inch tape", category: "tape_goods", quantity: 2, unitPriceCents: 32_000 }]);
    const issued = await manager.post(`/api/invoices/${d.id}/issue`);
    expect(issued.status).toBe(200);
    // [D] 2 × $320.00 tape at 6.25% (a demo rate) = $40.00 tax; room time untaxed.
    expect(issued.body).toMatchObject({ status: "issued", subtotalCents: 106_500, taxCents: 4000, totalCents: 110_500, balanceCents: 110_500 });
    const mail = t.mailTo("band@lanternstatic.test").find((m) => m.subject.includes(issued.body.number));
    expect(mail?.attachments).toEqual([expect.objectContaining({ filename: `${issued.body.number}.pdf`, contentType: "application/pdf" })]);
    expect(issued.body.emails).toEqual([expect.objectContaining({ step: "issued", status: "sent" })]);
    const pdf = await pdfAsBuffer(manager, d.id);
    expect(pdf.headers["content-type"]).toBe("application/pdf");
    const text = await pdfText(pdf.body as Buffer);
    expect(text).toContain(issued.body.number);
    expect(text).toContain("$1,105.00");
    expect(text).toContain("Tax Tape and media sold 6.25% on $640.00");
    expect(text).toContain("$40.00");
    await owner.patch("/api/invoice-settings").send({ taxRates: { room: 0, engineer: 0, tape_goods: 0, storage: 0, other: 0 } }).expect(200);
  });
});

describe("payments and credit notes", () => {
  it("makes a cheque for part of the balance part_paid, sends a receipt, and refuses an overpayment with 409", async () => {
    const d = await draft(manager, ids.client("Lantern Static"), [manual("Mix, two songs", 50_000)]);
    await manager.post(`/api/invoices/${d.id}/issue`).expect(200);
    const paid = await books.post(`/api/invoices/${d.id}/payments`).send({ method: "cheque", amountCents: 20_000, receivedOn: "2026-03-02", reference: "1042" });
    expect(paid.status).toBe(201);
    expect(paid.body).toMatchObject({ status: "part_paid", balanceCents: 30_000, paidCents: 20_000 });
    expect(paid.body.emails.map((e: { step: string }) => e.step)).toContain(`receipt:${paid.body.payments[0].id}`);
    const over = await books.post(`/api/invoices/${d.id}/payments`).send({ method: "cash", amountCents: 30_001, receivedOn: "2026-03-03" });
    expect(over.status).toBe(409);
    expect(over.body.error.code).toBe("overpayment");
  });

  it("keeps an accepted overpayment as client credit and uses it on the client's next invoice", async () => {
    const client = ids.client("The Quiet Orchard");
    const d = await draft(manager, client, [manual("Rehearsal", 10_000)]);
    await manager.post(`/api/invoices/${d.id}/issue`).expect(200);
    const paid = await books.post(`/api/invoices/${d.id}/payments`).send({ method: "bank_transfer", amountCents: 12_500, receivedOn: "2026-03-02", reference: "TR-88", overpaymentToCredit: true });
    expect(paid.body).toMatchObject({ status: "paid", balanceCents: 0 });
    expect(paid.body.payments[0]).toMatchObject({ appliedCents: 10_000, creditCents: 2500 });
    const next = await draft(manager, client, [manual("Rehearsal", 10_000)]);
    const issued = await manager.post(`/api/invoices/${next.id}/issue`);
    expect(issued.body).toMatchObject({ creditAppliedCents: 2500, balanceCents: 7500, status: "part_paid" });
  });

  it("reverses a bounced cheque with a reason, keeping the payment on record", async () => {
    const d = await draft(manager, ids.client("Lantern Static"), [manual("Overdubs", 30_000)]);
    await manager.post(`/api/invoices/${d.id}/issue`).expect(200);
    const paid = await books.post(`/api/invoices/${d.id}/payments`).send({ method: "cheque", amountCents: 30_000, receivedOn: "2026-03-02", reference: "1043" });
    expect(paid.body.status).toBe("paid");
    const reversed = await books.post(`/api/invoices/${d.id}/payments/${paid.body.payments[0].id}/reversal`).send({ reason: "Cheque bounced" });
    expect(reversed.body).toMatchObject({ status: "issued", balanceCents: 30_000, paidCents: 0 });
    expect(reversed.body.payments[0]).toMatchObject({ reversalReason: "Cheque bounced", reversedAt: expect.any(String) });
  });

  it("corrects a line with a credit note in its own series, and a whole-invoice credit note brings the balance to zero", async () => {
    const d = await draft(manager, ids.client("Lantern Static"), [manual("Mix", 40_000), manual("Courier", 2_500)]);
    const issued = (await manager.post(`/api/invoices/${d.id}/issue`)).body;
    const courier = issued.lines.find((l: { description: string }) => l.description === "Courier");
    const byLine = await manager.post(`/api/invoices/${d.id}/credit-notes`).send({ reason: "Courier not used", lineIds: [courier.id] });
    expect(byLine.status).toBe(201);
    expect(byLine.body.creditNotes[0].number).toMatch(/^[A-Z0-9]+-\d{4}-\d{4}$/);
    expect(byLine.body.creditNotes[0].number.split("-")[0]).not.toBe(issued.number.split("-")[0]);
    expect(byLine.body.balanceCents).toBe(40_000);
    const whole = await manager.post(`/api/invoices/${d.id}/credit-notes`).send({ reason: "Session cancelled" });
    expect(whole.body.balanceCents).toBe(0);
    expect((await manager.post(`/api/invoices/${d.id}/credit-notes`).send({ reason: "again" })).body.error.code).toBe("already_credited");
  });
});

describe("deposits", () => {
  it("issues a hold's deposit invoice, and paying it in full confirms the hold; the final invoice deducts it", async () => {
    const [hold] = await t.db.select().from(bookings).where(and(eq(bookings.status, "hold"), isNull(bookings.queuedBehindId)));
    const deposit = await manager.post(`/api/bookings/${hold!.id}/deposit-invoice`);
    expect(deposit.status).toBe(201);
    expect(deposit.body).toMatchObject({ kind: "deposit", status: "issued", totalCents: hold!.depositRequiredCents, taxCents: 0, dueAt: deposit.body.issuedAt.slice(0, 10) });
    expect((await manager.post(`/api/bookings/${hold!.id}/deposit-invoice`)).body.error.code).toBe("already_invoiced");
    const paid = await books.post(`/api/invoices/${deposit.body.id}/payments`).send({ method: "bank_transfer", amountCents: hold!.depositRequiredCents, receivedOn: "2026-03-02", reference: "DEP-1" });
    expect(paid.body.status).toBe("paid");
    const [after] = await t.db.select().from(bookings).where(eq(bookings.id, hold!.id));
    expect(after).toMatchObject({ status: "confirmed", holdExpiresAt: null, depositReceivedAt: expect.any(Date) });

    // Wrap it (straight in the database: the session times are the seed's) and invoice it.
    await t.db.update(bookings).set({ status: "wrapped" }).where(eq(bookings.id, hold!.id));
    const final = await manager.post("/api/invoices").send({ clientAccountId: hold!.clientAccountId, sources: [{ kind: "booking", id: String(hold!.id) }] });
    expect(final.status).toBe(201);
    expect(final.body.depositAppliedCents).toBe(hold!.depositRequiredCents);
    expect(final.body.balanceCents).toBe(final.body.totalCents - hold!.depositRequiredCents);
  });
});

describe("who sees what", () => {
  it("shows a client only its own issued invoices, 404 for anyone else's or a draft", async () => {
    const client = await t.signIn(demo.client);
    const list = await client.get("/api/invoices");
    expect(list.status).toBe(200);
    expect(list.body.length).toBeGreaterThan(0);
    expect(list.body.every((i: { clientAccountId: number; status: string }) => i.clientAccountId === ids.client("Lantern Static") && i.status !== "draft")).toBe(true);
    const others = (await manager.get(`/api/invoices?clientAccountId=${ids.client("Ines Halloran")}`)).body;
    expect((await client.get(`/api/invoices/${others[0].id}`)).status).toBe(404);
    expect((await client.get(`/api/invoices/${others[0].id}/pdf`)).status).toBe(404);
    const ownDraft = await draft(manager, ids.client("Lantern Static"));
    expect((await client.get(`/api/invoices/${ownDraft.id}`)).status).toBe(404);
    const own = list.body[0];
    const pdf = await pdfAsBuffer(client, own.id);
    expect(pdf.status).toBe(200);
    expect(await pdfText(pdf.body as Buffer)).toContain(own.number);
  });
});

describe("bad input", () => {
  it("answers 400 naming the field", async () => {
    const cases: [string, object, string][] = [
      ["/api/invoices", { clientAccountId: ids.client("Lantern Static"), sources: [{ kind: "gift", id: "1" }] }, "sources.0.kind"],
      ["/api/invoices", { clientAccountId: ids.client("Lantern Static"), sources: [], manualLines: [{ description: "x", category: "other", quantity: 1.2345, unitPriceCents: 1 }] }, "manualLines.0.quantity"],
      ["/api/invoices", { clientAccountId: ids.client("Lantern Static"), sources: [], manualLines: [{ ...manual("x", 100), discount: { kind: "amount", amountCents: 101 } }] }, "lines.0.discount"],
      ["/api/invoices", { clientAccountId: ids.client("Lantern Static"), sources: [] }, "sources"],
    ];
    for (const [path, body, field] of cases) {
      const res = await manager.post(path).send(body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(res.body.error.details.map((d: { field: string }) => d.field)).toContain(field);
    }
    const d = await draft(manager, ids.client("Lantern Static"));
    const bad = await books.post(`/api/invoices/${d.id}/payments`).send({ method: "card", amountCents: 10, receivedOn: "2026-13-01" });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details.map((x: { field: string }) => x.field)).toEqual(expect.arrayContaining(["method", "receivedOn"]));
  });
});

describe("ageing and reminders", () => {
  it("buckets open balances by days past due as of the chosen date", async () => {
    const d = await draft(manager, ids.client("Ines Halloran"), [manual("Old session", 7_000)]);
    const issued = (await manager.post(`/api/invoices/${d.id}/issue`)).body;
    const due = issued.dueAt as string;
    const plus = (days: number) => new Date(Date.parse(`${due}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);
    const at45 = await books.get(`/api/receivables/ageing?asOf=${plus(45)}`);
    expect(at45.status).toBe(200);
    expect(at45.body.invoices.find((i: { id: number }) => i.id === d.id).bucket).toBe("days_31_60");
    const t = at45.body.totals;
    expect(t.current + t.days_1_30 + t.days_31_60 + t.days_61_90 + t.over_90).toBe(t.totalMinor);
    expect((await books.get(`/api/receivables/ageing?asOf=${plus(10)}`)).body.invoices.find((i: { id: number }) => i.id === d.id).bucket).toBe("days_1_30");
  });

  it("sends each reminder step once per invoice, even when two runs race", async () => {
    const d = await draft(manager, ids.client("Copper Vale"), [manual("Tape transfer", 9_000)]);
    const issued = (await manager.post(`/api/invoices/${d.id}/issue`)).body;
    const later = new Date(Date.parse(`${issued.dueAt}T18:00:00Z`) + 8 * 86_400_000);
    await Promise.all([sendInvoiceReminders(t.db, t.mailer, later), sendInvoiceReminders(t.db, t.mailer, later)]);
    await sendInvoiceReminders(t.db, t.mailer, later);
    const reminders = t.mailTo("hello@coppervale.test").filter((m) => m.subject.includes(`Reminder: invoice ${issued.number}`));
    expect(reminders).toHaveLength(1);
    const detail = (await manager.get(`/api/invoices/${d.id}`)).body;
    expect(detail.emails.map((e: { step: string }) => e.step)).toEqual(["issued", "reminder:7"]);
  });
});

describe("malformed payloads", () => {
  it("never answer 5xx on the invoice routes that write", async () => {
    const d = await draft(manager, ids.client("Lantern Static"));
    const junk = fc.oneof(
      fc.constant(null),
      fc.boolean(),
      fc.integer({ min: -(2 ** 53), max: 2 ** 53 }),
      fc.double(),
      fc.string({ maxLength: 80 }),
      fc.constantFrom("2026-02-30", "9999-99-99", "\ud800", "1e309", "-0", "NaN", ""),
      fc.array(fc.anything({ maxDepth: 1 }), { maxLength: 3 }),
      fc.dictionary(fc.string({ maxLength: 8 }), fc.anything({ maxDepth: 1 }), { maxKeys: 3 }),
    );
    const body = (fields: string[]) => fc.dictionary(fc.constantFrom(...fields), junk, { maxKeys: fields.length });
    const routes: [string, "post" | "patch", fc.Arbitrary<Record<string, unknown>>][] = [
      ["/api/invoices", "post", body(["clientAccountId", "sources", "manualLines", "invoiceDiscount", "notes"])],
      [`/api/invoices/${d.id}`, "patch", body(["manualLines", "removeLineIds", "lineDiscounts", "invoiceDiscount", "notes"])],
      [`/api/invoices/${d.id}/payments`, "post", body(["method", "amountCents", "receivedOn", "reference", "overpaymentToCredit"])],
      [`/api/invoices/${d.id}/credit-notes`, "post", body(["reason", "lineIds"])],
      [`/api/invoices/${d.id}/void`, "post", body(["reason"])],
      ["/api/invoice-settings", "patch", body(["invoicePrefix", "termsDays", "taxRates", "taxCalculation", "reminderDays"])],
    ];
    for (const [path, method, arb] of routes) {
      await fc.assert(
        fc.asyncProperty(arb, async (payload) => {
          const res = await owner[method](path).send(payload);
          expect(res.status, `${method} ${path} ${JSON.stringify(payload)}`).toBeLessThan(500);
        }),
        { numRuns: 25, seed: 20261202 },
      );
    }
  }, 120_000);
});
