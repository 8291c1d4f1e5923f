import { and, asc, desc, eq, gte, inArray, lte, sql, type SQL } from "drizzle-orm";
import {
  clientAccounts,
  clientContacts,
  clientCredits,
  clientUsers,
  user,
  invoiceEmails,
  invoiceLines,
  invoicedSources,
  invoices,
  isDuplicateKeyError,
  type Db,
  type DbOrTx,
  type Invoice,
  type InvoiceSettings,
  type Tx,
} from "@takeup/db";
import {
  ageReceivables,
  ageingBucketOf,
  computeInvoice,
  daysPastDue,
  dueDate,
  formatInvoiceNumber,
  InvoiceRuleError,
  invoiceBalance,
  paidStatus,
  type AgeingDto,
  type BillableItemDto,
  type CreateInvoiceInput,
  type Discount,
  type DiscountInput,
  type InvoiceDetailDto,
  type InvoiceSummaryDto,
  type StudioDto,
  type TaxRates,
  type UpdateDraftInput,
} from "@takeup/domain";
import { conflict, HttpError, notFound } from "../../lib/http-error.ts";
import { writeAudit } from "../../lib/audit.ts";
import type { Actor } from "../../lib/actor.ts";
import { loadStudio } from "../studio/studio.service.ts";
import { loadInvoiceSettings } from "./invoice-settings.ts";
import { loadInvoiceDetail, studioDate, toSummaryDto } from "./invoice-dto.ts";
import { ensureCounter, takeNextNumber } from "./numbering.ts";
import { billableSources } from "./sources/registry.ts";
import { manualLines } from "./sources/manual.ts";
import type { LoadedSource } from "./sources/types.ts";

export const toDiscount = (d: DiscountInput | null | undefined): Discount | null =>
  !d ? null : d.kind === "amount" ? { kind: "amount", amountMinor: d.amountCents } : { kind: "percent", bp: d.bp };

const zeroRates: TaxRates = { room: 0, engineer: 0, tape_goods: 0, storage: 0, other: 0 };

/** A deposit is a prepayment: its invoice carries no tax, which falls on the final invoice. */
export const taxSettingsFor = (invoice: Pick<Invoice, "kind" | "taxSettings">, settings: InvoiceSettings) => {
  if (invoice.taxSettings) return invoice.taxSettings as { rates: TaxRates; calculation: InvoiceSettings["taxCalculation"]; rounding: InvoiceSettings["taxRounding"] };
  return { rates: invoice.kind === "deposit" ? zeroRates : settings.taxRates, calculation: settings.taxCalculation, rounding: settings.taxRounding };
};

export const today = (studio: StudioDto, now = new Date()) => studioDate(now, studio.timeZone);

const sourceConflict = (kind: string, id: string) =>
  new HttpError(409, "already_invoiced", `That ${kind.replace("_", " ")} (${id}) is already on another invoice`, [{ field: "sources", rule: "invoiced_once", message: `${kind} ${id} is already invoiced` }]);

/** Recomputes a draft's (or an issuing invoice's) lines and totals and writes them. */
export async function recompute(tx: Tx, invoiceId: number, settings: InvoiceSettings) {
  const [invoice] = await tx.select().from(invoices).where(eq(invoices.id, invoiceId));
  const lines = await tx.select().from(invoiceLines).where(eq(invoiceLines.invoiceId, invoiceId)).orderBy(asc(invoiceLines.position));
  const tax = taxSettingsFor(invoice!, settings);
  let totals;
  try {
    totals = computeInvoice({
      lines: lines.map((l) => ({ category: l.category, quantityMilli: l.quantityMilli, unitPriceMinor: l.unitPriceMinor, fixedAmountMinor: l.fixedAmountMinor ?? undefined, discount: l.discount })),
      invoiceDiscount: invoice!.invoiceDiscount,
      tax,
    });
  } catch (error) {
    if (error instanceof InvoiceRuleError) throw new HttpError(400, "invalid_input", error.message, [{ field: error.field, rule: "discount", message: error.message }]);
    throw error;
  }
  for (const [i, line] of lines.entries()) {
    const c = totals.lines[i]!;
    await tx
      .update(invoiceLines)
      .set({ amountMinor: c.amountMinor, discountMinor: c.discountMinor, netMinor: c.netMinor, taxMinor: c.taxMinor, taxRatePpm: tax.rates[line.category] })
      .where(eq(invoiceLines.id, line.id));
  }
  const depositAppliedMinor = Math.min(invoice!.depositAppliedMinor, totals.totalMinor);
  const row = {
    subtotalMinor: totals.subtotalMinor,
    discountMinor: totals.discountMinor,
    taxMinor: totals.taxMinor,
    totalMinor: totals.totalMinor,
    depositAppliedMinor,
  };
  const balanceMinor = invoiceBalance({ ...row, creditAppliedMinor: invoice!.creditAppliedMinor, paymentsMinor: invoice!.paidMinor, creditNotesMinor: invoice!.creditedMinor });
  await tx.update(invoices).set({ ...row, balanceMinor }).where(eq(invoices.id, invoiceId));
  return { ...row, balanceMinor };
}

async function insertLines(tx: Tx, invoiceId: number, startPosition: number, sourceKind: string, source: LoadedSource | null, lines: ReturnType<typeof manualLines> | LoadedSource["lines"]) {
  if (lines.length === 0) return startPosition;
  await tx.insert(invoiceLines).values(
    lines.map((l, i) => ({
      invoiceId,
      position: startPosition + i,
      sourceKind,
      sourceId: source?.sourceId ?? null,
      groupLabel: source?.groupLabel ?? null,
      category: l.category,
      description: l.description.slice(0, 300),
      explanation: l.explanation ? l.explanation.slice(0, 500) : null,
      quantityMilli: l.quantityMilli,
      unit: l.unit,
      unitPriceMinor: l.unitPriceMinor,
      fixedAmountMinor: l.fixedAmountMinor ?? null,
      discount: "discount" in l ? toDiscount(l.discount as DiscountInput | null) : null,
      amountMinor: 0,
      netMinor: 0,
    })),
  );
  return startPosition + lines.length;
}

async function lockClient(tx: Tx, clientAccountId: number) {
  const [client] = await tx.select().from(clientAccounts).where(eq(clientAccounts.id, clientAccountId)).for("update");
  return client;
}

/** Takes the (kind, id) keys; a duplicate means another live invoice has the thing. */
async function claimSources(tx: Tx, invoiceId: number, keys: { kind: string; id: string }[]) {
  const sorted = [...keys].sort((a, b) => (a.kind + a.id < b.kind + b.id ? -1 : 1));
  for (const key of sorted) {
    try {
      await tx.insert(invoicedSources).values({ sourceKind: key.kind, sourceId: key.id, invoiceId });
    } catch (error) {
      if (isDuplicateKeyError(error)) throw sourceConflict(key.kind, key.id);
      throw error;
    }
  }
}

export async function createDraft(db: Db, actor: Actor, input: CreateInvoiceInput): Promise<InvoiceDetailDto> {
  const studio = await loadStudio(db);
  const settings = await loadInvoiceSettings(db);
  const seen = new Set<string>();
  input.sources.forEach((s, index) => {
    const key = `${s.kind}:${s.id}`;
    if (seen.has(key)) throw new HttpError(400, "invalid_input", "The same item is listed twice", [{ field: `sources.${index}`, rule: "unique", message: "Listed twice" }]);
    seen.add(key);
    if (!billableSources[s.kind]) {
      throw new HttpError(400, "invalid_input", `${s.kind} items cannot be invoiced yet`, [{ field: `sources.${index}.kind`, rule: "billable_kind", message: "Not a billable kind yet" }]);
    }
  });
  if (input.sources.length === 0 && (input.manualLines?.length ?? 0) === 0) {
    throw new HttpError(400, "invalid_input", "Choose at least one item or add a manual line", [{ field: "sources", rule: "not_empty", message: "Nothing to invoice" }]);
  }
  const id = await db.transaction(async (tx) => {
    const client = await lockClient(tx, input.clientAccountId);
    if (!client) throw new HttpError(404, "not_found", "That client account was not found", [{ field: "clientAccountId", rule: "exists", message: "No such client" }]);
    const [created] = await tx
      .insert(invoices)
      .values({ clientAccountId: client.id, currency: studio.currency, invoiceDiscount: toDiscount(input.invoiceDiscount), notes: input.notes || null, createdByUserId: actor.userId })
      .$returningId();
    const invoiceId = created!.id;
    await claimSources(tx, invoiceId, input.sources.map((s) => ({ kind: s.kind, id: s.id })));
    let position = 0;
    let deposit = 0;
    const byKind = new Map<string, { id: string; index: number }[]>();
    input.sources.forEach((s, index) => byKind.set(s.kind, [...(byKind.get(s.kind) ?? []), { id: s.id, index }]));
    for (const [kind, refs] of byKind) {
      const loaded = await billableSources[kind as keyof typeof billableSources]!.loadForInvoice(tx, client.id, refs, { settings, studio });
      for (const source of loaded) {
        position = await insertLines(tx, invoiceId, position, kind, source, source.lines);
        if (source.deduction) {
          await claimSources(tx, invoiceId, [source.deduction.key]);
          deposit += source.deduction.amountMinor;
        }
      }
    }
    await insertLines(tx, invoiceId, position, "manual", null, manualLines(input.manualLines ?? []));
    if (deposit > 0) await tx.update(invoices).set({ depositAppliedMinor: deposit }).where(eq(invoices.id, invoiceId));
    await recompute(tx, invoiceId, settings);
    const after = await loadInvoiceDetail(tx, invoiceId, today(studio));
    await writeAudit(tx, actor, "invoice.drafted", { type: "invoice", id: invoiceId }, { after });
    return invoiceId;
  });
  return loadInvoiceDetail(db, id, today(studio));
}

async function lockInvoice(tx: Tx, id: number) {
  const [row] = await tx.select().from(invoices).where(eq(invoices.id, id)).for("update");
  if (!row) throw notFound("That invoice");
  return row;
}

const notDraft = (row: Invoice) => conflict("invoice_not_draft", `Invoice ${row.number ?? row.id} is ${row.status.replace("_", " ")}; only a draft can be changed (correct an issued invoice with a credit note)`);

export async function updateDraft(db: Db, actor: Actor, id: number, input: UpdateDraftInput): Promise<InvoiceDetailDto> {
  const studio = await loadStudio(db);
  const settings = await loadInvoiceSettings(db);
  await db.transaction(async (tx) => {
    const row = await lockInvoice(tx, id);
    if (row.status !== "draft") throw notDraft(row);
    const before = await loadInvoiceDetail(tx, id, today(studio));
    const lines = await tx.select().from(invoiceLines).where(eq(invoiceLines.invoiceId, id));
    const own = new Set(lines.map((l) => l.id));
    const check = (ids: number[], field: string) =>
      ids.forEach((lineId, i) => {
        if (!own.has(lineId)) throw new HttpError(400, "invalid_input", `Line ${lineId} is not on this invoice`, [{ field: `${field}.${i}`, rule: "on_invoice", message: "Not on this invoice" }]);
      });
    check(input.removeLineIds ?? [], "removeLineIds");
    check((input.lineDiscounts ?? []).map((d) => d.lineId), "lineDiscounts");
    if (input.removeLineIds?.length) {
      await tx.delete(invoiceLines).where(and(eq(invoiceLines.invoiceId, id), inArray(invoiceLines.id, input.removeLineIds)));
    }
    if (input.manualLines) {
      await tx.delete(invoiceLines).where(and(eq(invoiceLines.invoiceId, id), eq(invoiceLines.sourceKind, "manual")));
    }
    // A source with no line left on the draft is billable again.
    const left = await tx.select({ kind: invoiceLines.sourceKind, id: invoiceLines.sourceId }).from(invoiceLines).where(eq(invoiceLines.invoiceId, id));
    const still = new Set(left.map((l) => `${l.kind}:${l.id}`));
    const claimed = await tx.select().from(invoicedSources).where(eq(invoicedSources.invoiceId, id));
    for (const c of claimed) {
      if (c.sourceKind === "deposit_applied") continue;
      if (!still.has(`${c.sourceKind}:${c.sourceId}`)) {
        await tx.delete(invoicedSources).where(and(eq(invoicedSources.sourceKind, c.sourceKind), eq(invoicedSources.sourceId, c.sourceId)));
      }
    }
    for (const d of input.lineDiscounts ?? []) {
      await tx.update(invoiceLines).set({ discount: toDiscount(d.discount) }).where(eq(invoiceLines.id, d.lineId));
    }
    if (input.manualLines) {
      const [last] = await tx.select({ p: sql<number>`coalesce(max(${invoiceLines.position}), -1)` }).from(invoiceLines).where(eq(invoiceLines.invoiceId, id));
      await insertLines(tx, id, Number(last!.p) + 1, "manual", null, manualLines(input.manualLines));
    }
    const changes: Partial<Invoice> = {};
    if (input.invoiceDiscount !== undefined) changes.invoiceDiscount = toDiscount(input.invoiceDiscount);
    if (input.notes !== undefined) changes.notes = input.notes || null;
    if (Object.keys(changes).length) await tx.update(invoices).set(changes).where(eq(invoices.id, id));
    await recompute(tx, id, settings);
    await writeAudit(tx, actor, "invoice.draft_updated", { type: "invoice", id }, { before, after: await loadInvoiceDetail(tx, id, today(studio)) });
  });
  return loadInvoiceDetail(db, id, today(studio));
}

/** Who receives an invoice: the account's billing e-mail, else its primary contact's, else its first active user's. */
export async function billingRecipient(db: DbOrTx, clientAccountId: number): Promise<string | null> {
  const [account] = await db.select({ email: clientAccounts.email }).from(clientAccounts).where(eq(clientAccounts.id, clientAccountId));
  if (account?.email) return account.email;
  const [contact] = await db
    .select({ email: clientContacts.email })
    .from(clientContacts)
    .where(and(eq(clientContacts.clientAccountId, clientAccountId), sql`${clientContacts.email} is not null and ${clientContacts.email} <> ''`))
    .orderBy(desc(clientContacts.isPrimary), asc(clientContacts.position))
    .limit(1);
  if (contact?.email) return contact.email;
  const [member] = await db
    .select({ email: user.email })
    .from(clientUsers)
    .innerJoin(user, eq(user.id, clientUsers.userId))
    .where(and(eq(clientUsers.clientAccountId, clientAccountId), eq(clientUsers.active, true)))
    .orderBy(asc(user.name))
    .limit(1);
  return member?.email ?? null;
}

export type IssueHooks = {
  /** Runs inside the issuing transaction right after the number is taken (tests abort here). */
  afterNumber?: (number: string) => Promise<void>;
};

/** Issues a draft in one transaction: credit used, gapless number, due date, the e-mail claimed. */
export async function issueInTx(tx: Tx, actor: Actor | null, id: number, studio: StudioDto, settings: InvoiceSettings, now: Date, hooks: IssueHooks = {}) {
  const row = await lockInvoice(tx, id);
  if (row.status !== "draft") throw notDraft(row);
  const [lineCount] = await tx.select({ n: sql<number>`count(*)` }).from(invoiceLines).where(eq(invoiceLines.invoiceId, id));
  if (Number(lineCount!.n) === 0) throw new HttpError(409, "invoice_empty", "An invoice needs at least one line before it is issued");
  await lockClient(tx, row.clientAccountId);
  // Freeze the tax settings the invoice is issued under.
  const tax = taxSettingsFor(row, settings);
  await tx.update(invoices).set({ taxSettings: tax }).where(eq(invoices.id, id));
  const totals = await recompute(tx, id, settings);
  // Client credit (earlier overpayments) is used first.
  const [credit] = await tx.select({ sum: sql<number>`coalesce(sum(${clientCredits.amountMinor}), 0)` }).from(clientCredits).where(eq(clientCredits.clientAccountId, row.clientAccountId));
  const creditApplied = row.kind === "deposit" ? 0 : Math.max(0, Math.min(Number(credit!.sum), totals.balanceMinor));
  if (creditApplied > 0) {
    await tx.insert(clientCredits).values({ clientAccountId: row.clientAccountId, amountMinor: -creditApplied, invoiceId: id, note: "Used on an invoice" });
  }
  const issuedOn = studioDate(now, studio.timeZone);
  const year = Number(issuedOn.slice(0, 4));
  const series = settings.invoicePrefix;
  const sequence = await takeNextNumber(tx, series, year);
  const number = formatInvoiceNumber(series, year, sequence);
  await hooks.afterNumber?.(number);
  const due = totals.totalMinor - totals.depositAppliedMinor;
  const balanceMinor = totals.balanceMinor - creditApplied;
  await tx
    .update(invoices)
    .set({
      status: paidStatus(due, creditApplied),
      series,
      year,
      sequence,
      number,
      issuedOn,
      issuedAt: now,
      dueOn: dueDate(issuedOn, row.kind === "deposit" ? settings.depositTermsDays : settings.termsDays),
      creditAppliedMinor: creditApplied,
      balanceMinor,
    })
    .where(eq(invoices.id, id));
  const to = await billingRecipient(tx, row.clientAccountId);
  if (to) await tx.insert(invoiceEmails).values({ invoiceId: id, step: "issued", toAddress: to });
  const after = await loadInvoiceDetail(tx, id, issuedOn);
  await writeAudit(tx, actor, "invoice.issued", { type: "invoice", id }, { after });
  return after;
}

export async function issueInvoice(db: Db, actor: Actor, id: number, hooks: IssueHooks = {}): Promise<InvoiceDetailDto> {
  const studio = await loadStudio(db);
  const settings = await loadInvoiceSettings(db);
  const now = new Date();
  await ensureCounter(db, settings.invoicePrefix, Number(studioDate(now, studio.timeZone).slice(0, 4)));
  return db.transaction((tx) => issueInTx(tx, actor, id, studio, settings, now, hooks));
}

export async function voidInvoice(db: Db, actor: Actor, id: number, reason: string): Promise<InvoiceDetailDto> {
  const studio = await loadStudio(db);
  await db.transaction(async (tx) => {
    const row = await lockInvoice(tx, id);
    if (row.status === "void") throw conflict("invoice_void", "That invoice is already void");
    if (row.paidMinor > 0) {
      throw conflict("invoice_has_payments", "An invoice with payments cannot be voided; reverse the payments or issue a credit note");
    }
    if (row.creditedMinor > 0) throw conflict("invoice_has_credit_notes", "An invoice with a credit note cannot be voided");
    const before = await loadInvoiceDetail(tx, id, today(studio));
    await tx.delete(invoicedSources).where(eq(invoicedSources.invoiceId, id));
    if (row.creditAppliedMinor > 0) {
      await tx.insert(clientCredits).values({ clientAccountId: row.clientAccountId, amountMinor: row.creditAppliedMinor, invoiceId: id, note: "Returned from a voided invoice" });
    }
    await tx.update(invoices).set({ status: "void", voidedAt: new Date(), voidReason: reason, balanceMinor: 0 }).where(eq(invoices.id, id));
    await writeAudit(tx, actor, "invoice.voided", { type: "invoice", id }, { before, after: await loadInvoiceDetail(tx, id, today(studio)) });
  });
  return loadInvoiceDetail(db, id, today(studio));
}

export async function listInvoices(db: Db, actor: Actor, query: { status?: Invoice["status"]; clientAccountId?: number; from?: string; to?: string }): Promise<InvoiceSummaryDto[]> {
  const studio = await loadStudio(db);
  const where: SQL[] = [];
  if (actor.role === "client") {
    where.push(eq(invoices.clientAccountId, actor.clientAccountId ?? -1), sql`${invoices.status} <> 'draft'`);
  }
  if (query.clientAccountId) where.push(eq(invoices.clientAccountId, query.clientAccountId));
  if (query.status) where.push(eq(invoices.status, query.status));
  if (query.from) where.push(gte(invoices.issuedOn, query.from));
  if (query.to) where.push(lte(invoices.issuedOn, query.to));
  const rows = await db
    .select({ invoice: invoices, clientName: clientAccounts.name })
    .from(invoices)
    .innerJoin(clientAccounts, eq(clientAccounts.id, invoices.clientAccountId))
    .where(and(...where))
    .orderBy(sql`${invoices.number} is null desc`, desc(invoices.year), desc(invoices.sequence), desc(invoices.id))
    .limit(2000);
  const t = today(studio);
  return rows.map((r) => toSummaryDto(r.invoice, r.clientName, t));
}

export async function listBillable(db: Db, clientAccountId: number): Promise<BillableItemDto[]> {
  const [client] = await db.select({ id: clientAccounts.id }).from(clientAccounts).where(eq(clientAccounts.id, clientAccountId));
  if (!client) throw notFound("That client account");
  const ctx = { settings: await loadInvoiceSettings(db), studio: await loadStudio(db) };
  const lists = await Promise.all(Object.values(billableSources).map((source) => source.listUnbilled(db, clientAccountId, ctx)));
  return lists.flat().sort((a, b) => (a.date < b.date ? -1 : a.date > b.date ? 1 : 0));
}

export async function receivablesAgeing(db: Db, asOf: string): Promise<AgeingDto> {
  const studio = await loadStudio(db);
  const rows = await db
    .select({ invoice: invoices, clientName: clientAccounts.name })
    .from(invoices)
    .innerJoin(clientAccounts, eq(clientAccounts.id, invoices.clientAccountId))
    .where(and(inArray(invoices.status, ["issued", "part_paid"]), lte(invoices.issuedOn, asOf)))
    .orderBy(asc(invoices.dueOn));
  const open = rows.filter((r) => r.invoice.balanceMinor !== 0 && r.invoice.dueOn);
  const totals = ageReceivables(open.map((r) => ({ dueOn: r.invoice.dueOn!, balanceMinor: r.invoice.balanceMinor })), asOf);
  return {
    asOf,
    currency: studio.currency,
    totals,
    invoices: open.map((r) => ({ ...toSummaryDto(r.invoice, r.clientName, asOf), bucket: ageingBucketOf(daysPastDue(r.invoice.dueOn!, asOf)) })),
  };
}
