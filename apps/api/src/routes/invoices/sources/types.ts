import type { DbOrTx, InvoiceSettings, Tx } from "@takeup/db";
import type { BillableItemDto, BillableSourceKind, DraftLine, StudioDto } from "@takeup/domain";

export type SourceContext = { settings: InvoiceSettings; studio: StudioDto };

/** One billed thing's lines, as they go on a draft. */
export type LoadedSource = {
  sourceId: string;
  /** Shown above the thing's lines on the invoice and its PDF. */
  groupLabel: string;
  lines: DraftLine[];
  /** Something already paid for this thing (a booking's paid deposit) that the invoice deducts. */
  deduction?: { key: { kind: string; id: string }; amountMinor: number; label: string };
};

/**
 * A kind of billable thing. Adding a kind is one file implementing this and one line in
 * registry.ts (and its tax category in the domain's `defaultCategoryOfSource`).
 */
export interface BillableSource {
  kind: BillableSourceKind;
  /** A client's items of this kind not on a live invoice, oldest first. */
  listUnbilled(db: DbOrTx, clientAccountId: number, ctx: SourceContext): Promise<BillableItemDto[]>;
  /**
   * Inside the invoicing transaction: lock and load the chosen items, refusing (HttpError, naming
   * the field `sources.<index>.id`) anything that is not this client's or cannot be billed yet.
   * The caller takes each item's (kind, id) key in invoiced_sources in the same transaction.
   */
  loadForInvoice(tx: Tx, clientAccountId: number, ids: { id: string; index: number }[], ctx: SourceContext): Promise<LoadedSource[]>;
}
