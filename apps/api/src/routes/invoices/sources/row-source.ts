import type { BillableItemDto, BillableSourceKind, DraftLine } from "@takeup/domain";
import type { DbOrTx, Tx } from "@takeup/db";
import { HttpError } from "../../../lib/http-error.ts";
import type { BillableSource, LoadedSource } from "./types.ts";

/** One already-priced row another capability recorded for billing (a tape sale, a storage month). */
export type PricedRow = { id: number; clientAccountId: number; date: Date; groupLabel: string; line: DraftLine & { fixedAmountMinor: number } };

/**
 * A billable kind whose items are single rows priced when they were recorded: each becomes one
 * line with its recorded amount unchanged. `rows` reads the rows (all of a client's unbilled ones,
 * or the chosen ids, locked, inside the invoicing transaction).
 */
export function rowSource(
  kind: BillableSourceKind,
  noun: string,
  rows: (db: DbOrTx, where: { clientAccountId: number; unbilled: true } | { ids: number[]; lock: Tx }) => Promise<PricedRow[]>,
): BillableSource {
  const loaded = (row: PricedRow): LoadedSource => ({ sourceId: String(row.id), groupLabel: row.groupLabel, lines: [row.line] });
  return {
    kind,
    async listUnbilled(db, clientAccountId) {
      return (await rows(db, { clientAccountId, unbilled: true })).map(
        (row): BillableItemDto => ({
          kind,
          id: String(row.id),
          date: row.date.toISOString(),
          description: row.groupLabel,
          amountCents: row.line.fixedAmountMinor,
          lines: [{ description: row.line.description, explanation: row.line.explanation, category: row.line.category, amountCents: row.line.fixedAmountMinor }],
        }),
      );
    },
    async loadForInvoice(tx, clientAccountId, ids) {
      const numeric = ids.map((ref) => ({ ...ref, n: /^\d{1,15}$/.test(ref.id) ? Number(ref.id) : -1 }));
      const found = await rows(tx, { ids: numeric.map((r) => r.n).filter((n) => n > 0), lock: tx });
      return numeric.map((ref) => {
        const row = found.find((r) => r.id === ref.n);
        if (!row || row.clientAccountId !== clientAccountId) {
          throw new HttpError(404, "not_found", `${noun} ${ref.id} is not one of this client's`, [{ field: `sources.${ref.index}.id`, rule: "exists", message: `No such ${noun.toLowerCase()} for this client` }]);
        }
        return loaded(row);
      });
    },
  };
}
