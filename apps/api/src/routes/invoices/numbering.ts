import { and, eq, sql } from "drizzle-orm";
import { documentCounters, type Db, type Tx } from "@takeup/db";

/**
 * Gapless numbers: the counter row of (series, year) is locked FOR UPDATE inside the issuing
 * transaction and bumped there, so a rollback gives the number back and two issues queue.
 * The row is made beforehand in its own statement (INSERT IGNORE), so concurrent first issues
 * of a year do not meet on an insert inside their transactions.
 */
export async function ensureCounter(db: Db, series: string, year: number): Promise<void> {
  await db.insert(documentCounters).ignore().values({ series, year, lastSequence: 0 });
}

export async function takeNextNumber(tx: Tx, series: string, year: number): Promise<number> {
  const [row] = await tx
    .select({ last: documentCounters.lastSequence })
    .from(documentCounters)
    .where(and(eq(documentCounters.series, series), eq(documentCounters.year, year)))
    .for("update");
  if (!row) {
    await tx.insert(documentCounters).values({ series, year, lastSequence: 1 });
    return 1;
  }
  await tx
    .update(documentCounters)
    .set({ lastSequence: sql`${documentCounters.lastSequence} + 1` })
    .where(and(eq(documentCounters.series, series), eq(documentCounters.year, year)));
  return row.last + 1;
}
