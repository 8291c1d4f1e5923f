import { z } from "zod";
import { idParams, optionalText } from "./common.ts";
import { defineRoute } from "./route.ts";
import { priceModes } from "../tape/price.ts";
import { tapeMovementKinds } from "../tape/catalogue.ts";

const staff = ["owner", "manager", "engineer", "bookkeeper"] as const;
const stockKeepers = ["owner", "manager"] as const;

const maxQuantity = 100_000;
const maxCents = 100_000_000;
const positiveId = (what: string) => z.number(`Choose ${what}`).int(`Choose ${what}`).positive(`Choose ${what}`).max(2 ** 53 - 1);
const quantity = z.number("Enter a quantity").int("Use a whole number of reels").min(1, "Enter at least 1").max(maxQuantity, `Enter at most ${maxQuantity}`);
const cents = z.number("Enter an amount in cents").int("Use whole cents").min(0, "Use zero or more").max(maxCents, "That amount is too large");
const reason = z.string("Give a reason").trim().min(1, "Give a reason").max(500, "Use at most 500 characters");

export const tapeWidthsInches = [0.25, 0.5, 1, 2] as const;
export const reelSizesInches = [5, 7, 10.5] as const;

const productFields = {
  sku: z.string("Enter a SKU").trim().min(1, "Enter a SKU").max(40, "Use at most 40 characters").regex(/^[A-Za-z0-9][A-Za-z0-9._-]*$/, "Use letters, digits, dots, dashes and underscores"),
  name: z.string("Enter a name").trim().min(1, "Enter a name").max(120, "Use at most 120 characters"),
  widthInches: z.literal(tapeWidthsInches, "Choose 1/4, 1/2, 1 or 2 inch"),
  lengthFt: z.number("Enter the length in feet").int("Use whole feet").min(50, "Enter at least 50 ft").max(20_000, "Enter at most 20,000 ft"),
  reelInches: z.literal(reelSizesInches, "Choose a 5, 7 or 10½ inch reel"),
  description: optionalText(2000),
  priceMode: z.enum(priceModes, "Choose a fixed price or a markup on cost").optional(),
  fixedPriceCents: cents.nullable().optional(),
  markupBp: z.number("Enter the markup in basis points").int("Use whole basis points").min(0, "Use zero or more").max(100_000, "Keep the markup at 1,000 % or less").nullable().optional(),
  reorderPoint: z.number("Enter a reorder point").int("Use a whole number").min(0, "Use zero or more").max(maxQuantity, `Enter at most ${maxQuantity}`).optional(),
};

export const createTapeProductInput = z.strictObject(productFields);
export type CreateTapeProductInput = z.infer<typeof createTapeProductInput>;
export const updateTapeProductInput = z.strictObject({ ...productFields, active: z.boolean("Say whether it is active") }).partial();
export type UpdateTapeProductInput = z.infer<typeof updateTapeProductInput>;

export const tapeProductDto = z.object({
  id: z.number(),
  sku: z.string(),
  name: z.string(),
  widthInches: z.number(),
  lengthFt: z.number(),
  reelInches: z.number(),
  description: z.string().nullable(),
  priceMode: z.enum(priceModes),
  fixedPriceCents: z.number().nullable(),
  markupBp: z.number().nullable(),
  taxCategory: z.literal("goods"),
  reorderPoint: z.number(),
  active: z.boolean(),
  onHand: z.number(),
  valueCents: z.number(),
  averageCostCents: z.number(),
  /** Today's price of one reel (fixed, or average cost plus markup); null when none is set yet. */
  priceCents: z.number().nullable(),
  marginBp: z.number().nullable(),
  lowStock: z.boolean(),
});
export type TapeProductDto = z.infer<typeof tapeProductDto>;

export const tapeMovementDto = z.object({
  id: z.number(),
  productId: z.number(),
  kind: z.enum(tapeMovementKinds),
  quantity: z.number(),
  unitCostCents: z.number(),
  valueChangeCents: z.number(),
  costOfGoodsCents: z.number().nullable(),
  unitPriceCents: z.number().nullable(),
  amountCents: z.number().nullable(),
  description: z.string(),
  clientAccountId: z.number().nullable(),
  clientName: z.string().nullable(),
  projectId: z.number().nullable(),
  projectName: z.string().nullable(),
  bookingId: z.number().nullable(),
  supplier: z.string().nullable(),
  receivedOn: z.string().nullable(),
  receipt: z.object({ fileName: z.string(), contentType: z.string(), bytes: z.number() }).nullable(),
  reason: z.string().nullable(),
  onHandAfter: z.number(),
  averageCostAfterCents: z.number(),
  createdBy: z.string(),
  createdAt: z.string(),
});
export type TapeMovementDto = z.infer<typeof tapeMovementDto>;

/** The text fields of a receipt's multipart form (each arrives as a string). */
const wholeFromText = (what: string, min: number, max: number) =>
  z
    .string(`Enter ${what}`)
    .trim()
    .regex(/^\d{1,12}$/, `Enter ${what} as a whole number`)
    .transform(Number)
    .pipe(z.number().min(min, `Enter at least ${min}`).max(max, `Enter at most ${max}`));
export const tapeReceiptFields = z.strictObject({
  quantity: wholeFromText("the quantity", 1, maxQuantity),
  unitCostCents: wholeFromText("the unit cost in cents", 0, maxCents),
  supplier: z.string("Name the supplier").trim().min(1, "Name the supplier").max(120, "Use at most 120 characters"),
  receivedOn: z.iso.date("Use a date as YYYY-MM-DD").refine((d) => d >= "2000-01-01", "Use a date from 2000 on"),
});
export type TapeReceiptFields = z.infer<typeof tapeReceiptFields>;

export const tapeSaleInput = z.strictObject({
  quantity,
  clientAccountId: positiveId("a client"),
  projectId: positiveId("a project").optional(),
  bookingId: positiveId("a booking").optional(),
  unitPriceCents: cents.optional(),
});
export type TapeSaleInput = z.infer<typeof tapeSaleInput>;

export const tapeReturnInput = z.strictObject({
  quantity,
  clientAccountId: positiveId("a client"),
  projectId: positiveId("a project").optional(),
  bookingId: positiveId("a booking").optional(),
  reason: reason.optional(),
});
export type TapeReturnInput = z.infer<typeof tapeReturnInput>;

export const tapeAdjustmentInput = z.strictObject({
  quantity: z.number("Enter the change").int("Use a whole number of reels").min(-maxQuantity).max(maxQuantity).refine((n) => n !== 0, "Enter a change other than zero"),
  reason,
});
export type TapeAdjustmentInput = z.infer<typeof tapeAdjustmentInput>;

export const tapeWriteOffInput = z.strictObject({ quantity, reason });
export type TapeWriteOffInput = z.infer<typeof tapeWriteOffInput>;

export const tapeCountInput = z.strictObject({
  lines: z
    .array(z.strictObject({ productId: positiveId("a product"), counted: z.number("Enter the count").int("Use a whole number").min(0, "Use zero or more").max(maxQuantity) }), "List the counted products")
    .min(1, "Count at least one product")
    .max(500, "Count at most 500 products at once"),
  reason,
});
export type TapeCountInput = z.infer<typeof tapeCountInput>;
export const tapeCountDto = z.object({ adjustments: z.array(tapeMovementDto) });

const minutes = z.number("Enter the minutes").positive("Enter minutes above zero").max(600, "Keep a song under 600 minutes");
export const tapePlanInput = z.strictObject({
  songs: z
    .array(
      z.strictObject({
        title: optionalText(120),
        minutes,
        takes: z.number("Enter the takes").int("Use a whole number of takes").min(0, "Use zero or more").max(50, "Keep at most 50 takes"),
      }),
      "List the songs",
    )
    .min(1, "Add at least one song")
    .max(1000, "Plan at most 1,000 songs"),
  speedIps: z.number("Choose a speed").positive("Choose a speed above zero").max(120, "Choose a speed up to 120 in/s"),
  reelLengthFt: z.number("Enter the reel length").int("Use whole feet").min(50, "Enter at least 50 ft").max(20_000, "Enter at most 20,000 ft"),
  allowanceMinutes: z.number("Enter the allowance").min(0, "Use zero or more").max(30, "Use at most 30 minutes").optional(),
  /** The recorder whose other speeds the alternatives use. */
  recorderId: positiveId("a recorder").optional(),
  /** The product to price the plan with. */
  productId: positiveId("a product").optional(),
});
export type TapePlanInput = z.infer<typeof tapePlanInput>;

export const tapePlanDto = z.object({
  reelMinutes: z.number(),
  minutesPerReel: z.number(),
  totalMinutes: z.number(),
  reelsNeeded: z.number(),
  reels: z.array(z.object({ songs: z.array(z.object({ title: z.string(), takes: z.number() })), minutesUsed: z.number() })),
  alternatives: z.array(z.object({ speedIps: z.number(), minutesPerReel: z.number(), reelsNeeded: z.number().nullable(), note: z.string() })),
  unitPriceCents: z.number().nullable(),
  totalPriceCents: z.number().nullable(),
});
export type TapePlanDto = z.infer<typeof tapePlanDto>;

/** Tape stock and the planner, declared once for the API and the web. */
export const tapeRoutes = {
  listProducts: defineRoute({
    method: "get",
    path: "/api/tape/products",
    summary: "Tape products with on hand, average cost, price and a low-stock flag",
    access: staff,
    response: z.array(tapeProductDto),
  }),
  createProduct: defineRoute({
    method: "post",
    path: "/api/tape/products",
    summary: "Add a tape product (prices and markup are the owner's to set)",
    access: stockKeepers,
    body: createTapeProductInput,
    status: 201,
    response: tapeProductDto,
  }),
  updateProduct: defineRoute({
    method: "patch",
    path: "/api/tape/products/:id",
    summary: "Change a tape product (prices and markup are the owner's to set)",
    access: stockKeepers,
    params: idParams,
    body: updateTapeProductInput,
    response: tapeProductDto,
  }),
  movements: defineRoute({
    method: "get",
    path: "/api/tape/products/:id/movements",
    summary: "A product's stock movements, newest first",
    access: ["owner", "manager", "bookkeeper"],
    params: idParams,
    response: z.array(tapeMovementDto),
  }),
  receive: defineRoute({
    method: "post",
    path: "/api/tape/products/:id/receipts",
    summary: "Receive stock with the supplier's receipt (multipart: quantity, unitCostCents, supplier, receivedOn, file: PDF, PNG or JPEG up to 10 MB)",
    access: stockKeepers,
    params: idParams,
    status: 201,
    response: tapeMovementDto,
  }),
  sell: defineRoute({
    method: "post",
    path: "/api/tape/products/:id/sales",
    summary: "Sell reels to a client's project or booking (409 insufficient_stock beyond what is on hand)",
    access: stockKeepers,
    params: idParams,
    body: tapeSaleInput,
    status: 201,
    response: tapeMovementDto,
  }),
  returnStock: defineRoute({
    method: "post",
    path: "/api/tape/products/:id/returns",
    summary: "Take reels back from a client at the average cost",
    access: stockKeepers,
    params: idParams,
    body: tapeReturnInput,
    status: 201,
    response: tapeMovementDto,
  }),
  adjust: defineRoute({
    method: "post",
    path: "/api/tape/products/:id/adjustments",
    summary: "Correct on hand by a signed quantity, with a reason",
    access: stockKeepers,
    params: idParams,
    body: tapeAdjustmentInput,
    status: 201,
    response: tapeMovementDto,
  }),
  writeOff: defineRoute({
    method: "post",
    path: "/api/tape/products/:id/write-offs",
    summary: "Write damaged reels off, with a reason",
    access: stockKeepers,
    params: idParams,
    body: tapeWriteOffInput,
    status: 201,
    response: tapeMovementDto,
  }),
  count: defineRoute({
    method: "post",
    path: "/api/tape/counts",
    summary: "Post a count sheet: one adjustment per product whose count differs, all in one go",
    access: stockKeepers,
    body: tapeCountInput,
    status: 201,
    response: tapeCountDto,
  }),
  receipt: defineRoute({
    method: "get",
    path: "/api/tape/movements/:id/receipt",
    summary: "Download the receipt attached to a stock receipt",
    access: staff,
    params: idParams,
    response: "file",
  }),
  plan: defineRoute({
    method: "post",
    path: "/api/tape/plan",
    summary: "Plan the reels a project needs (nothing is stored)",
    access: staff,
    body: tapePlanInput,
    response: tapePlanDto,
  }),
};
