import { eq } from "drizzle-orm";
import { invoiceSettings, type Db, type DbOrTx, type InvoiceSettings } from "@takeup/db";
import type { InvoiceSettingsDto, UpdateInvoiceSettingsInput } from "@takeup/domain";
import { writeAudit } from "../../lib/audit.ts";
import type { Actor } from "../../lib/actor.ts";

/** The single settings row, made with its defaults the first time anyone reads it. */
export async function loadInvoiceSettings(db: DbOrTx): Promise<InvoiceSettings> {
  const [row] = await db.select().from(invoiceSettings).where(eq(invoiceSettings.id, 1));
  if (row) return row;
  await db.insert(invoiceSettings).ignore().values({ id: 1 });
  const [made] = await db.select().from(invoiceSettings).where(eq(invoiceSettings.id, 1));
  return made!;
}

export function toSettingsDto(s: InvoiceSettings): InvoiceSettingsDto {
  return {
    invoicePrefix: s.invoicePrefix,
    creditNotePrefix: s.creditNotePrefix,
    termsDays: s.termsDays,
    depositTermsDays: s.depositTermsDays,
    taxRates: s.taxRates,
    taxCalculation: s.taxCalculation,
    taxRounding: s.taxRounding,
    paperSize: s.paperSize,
    billingBasis: s.billingBasis,
    reminderDays: s.reminderDays,
    taxNumber: s.taxNumber,
    paymentInstructions: s.paymentInstructions,
  };
}

export async function updateInvoiceSettings(db: Db, actor: Actor, input: UpdateInvoiceSettingsInput): Promise<InvoiceSettingsDto> {
  await loadInvoiceSettings(db);
  return db.transaction(async (tx) => {
    const [before] = await tx.select().from(invoiceSettings).where(eq(invoiceSettings.id, 1)).for("update");
    const changes = Object.fromEntries(Object.entries(input).filter(([, v]) => v !== undefined));
    if (input.reminderDays) changes.reminderDays = [...new Set(input.reminderDays)].sort((a, b) => a - b);
    if (Object.keys(changes).length > 0) await tx.update(invoiceSettings).set(changes).where(eq(invoiceSettings.id, 1));
    const after = toSettingsDto((await loadInvoiceSettings(tx))!);
    await writeAudit(tx, actor, "invoice_settings.updated", { type: "invoice_settings", id: 1 }, { before: toSettingsDto(before!), after });
    return after;
  });
}
