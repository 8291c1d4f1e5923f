import type { BillableSourceKind } from "@takeup/domain";
import { bookingSource } from "./booking.ts";
import { storageSource } from "./storage.ts";
import { tapeSaleSource } from "./tape-sale.ts";
import type { BillableSource } from "./types.ts";

/** Every kind of billable thing the studio can invoice, one provider each. */
export const billableSources: Partial<Record<BillableSourceKind, BillableSource>> = {
  booking: bookingSource,
  tape_sale: tapeSaleSource,
  storage: storageSource,
};
