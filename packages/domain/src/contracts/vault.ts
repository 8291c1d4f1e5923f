import { z } from "zod";
import { careKinds } from "../vault/recorder-care.ts";
import { noiseReductions, reelMovementKinds, reelStatuses } from "../vault/catalogue.ts";
import { idParams, optionalText, personName } from "./common.ts";
import { defineRoute } from "./route.ts";

const localDate = z.iso.date("Use a date as YYYY-MM-DD");
const id = z.number().int().positive().max(2 ** 53 - 1);

/** Tape widths in thousandths of an inch (1/4, 1/2, 1 and 2 inch), as equipment keeps them. */
export const reelWidthsMils = [250, 500, 1000, 2000] as const;
export const reelSpeedsIps = [3.75, 7.5, 15, 30] as const;

const reelFields = {
  clientAccountId: id,
  projectId: id.nullable().optional(),
  /** The tape product it came from, when sold here. */
  tapeProductId: z.number().int().positive().max(2 ** 31 - 1).nullable().optional(),
  trackCount: z.number().int().min(1, "A reel has at least one track").max(48, "Use at most 48 tracks"),
  tapeWidthMils: z.union(reelWidthsMils.map((w) => z.literal(w)), "Choose 1/4, 1/2, 1 or 2 inch (250, 500, 1000 or 2000)"),
  speedIps: z.union(reelSpeedsIps.map((s) => z.literal(s)), "Choose 3.75, 7.5, 15 or 30 in/s"),
  noiseReduction: z.enum(noiseReductions, "Choose none or encoded").optional(),
  referenceLevel: optionalText(60),
  recordedOn: localDate.nullable().optional(),
  contentsNote: optionalText(2000),
  shelf: optionalText(40),
};

export const createReelInput = z.strictObject(reelFields);
export type CreateReelInput = z.infer<typeof createReelInput>;
export const updateReelInput = z.strictObject(reelFields).partial();
export type UpdateReelInput = z.infer<typeof updateReelInput>;

/** mm:ss from the head of the reel (minutes may run past 59: a long reel at low speed). */
export const reelPosition = z.string().trim().regex(/^\d{1,3}:[0-5]\d$/, "Use minutes and seconds from the head, as mm:ss");

export const trackSheetInput = z.strictObject({
  tracks: z
    .array(z.strictObject({ trackNo: z.number().int().min(1).max(48), contents: z.string().trim().max(120, "Use at most 120 characters") }))
    .max(48, "Use at most 48 tracks")
    .optional(),
  songs: z
    .array(
      z.strictObject({
        title: z.string().trim().min(1, "Enter the song's title").max(120, "Use at most 120 characters"),
        start: reelPosition,
        keptTakes: optionalText(120),
      }),
    )
    .max(40, "Keep to 40 songs on a reel")
    .optional(),
});
export type TrackSheetInput = z.infer<typeof trackSheetInput>;

export const checkOutInput = z.strictObject({
  person: personName,
  reason: z.string().trim().min(1, "Say why it is leaving the vault").max(200, "Use at most 200 characters"),
  dueBack: localDate,
});
export type CheckOutInput = z.infer<typeof checkOutInput>;
export const checkInInput = z.strictObject({ person: personName });
export type CheckInInput = z.infer<typeof checkInInput>;
export const releaseInput = z.strictObject({ person: personName, reason: optionalText(200) });
export type ReleaseInput = z.infer<typeof releaseInput>;

export const reelListQuery = z.strictObject({
  clientAccountId: z.coerce.number().int().positive().max(2 ** 53 - 1).optional(),
  status: z.enum(reelStatuses).optional(),
  q: z.string().max(120).optional(),
});
export const reelScanQuery = z.strictObject({ label: z.string().min(1, "Enter or scan a label id").max(40) });

export const reelSummaryDto = z.object({
  id: z.number(),
  labelId: z.string(),
  clientAccountId: z.number(),
  clientName: z.string(),
  projectId: z.number().nullable(),
  projectName: z.string().nullable(),
  tapeProductId: z.number().nullable(),
  trackCount: z.number(),
  tapeWidthMils: z.number(),
  speedIps: z.number(),
  noiseReduction: z.enum(noiseReductions),
  referenceLevel: z.string().nullable(),
  recordedOn: z.string().nullable(),
  contentsNote: z.string().nullable(),
  shelf: z.string().nullable(),
  status: z.enum(reelStatuses),
  /** For a reel that is checked out: when it is due back. */
  dueBack: z.string().nullable(),
});
export type ReelSummaryDto = z.infer<typeof reelSummaryDto>;

export const reelMovementDto = z.object({
  id: z.number(),
  kind: z.enum(reelMovementKinds),
  person: z.string(),
  reason: z.string().nullable(),
  dueBack: z.string().nullable(),
  at: z.string(),
  recordedBy: z.string().nullable(),
});
export type ReelMovementDto = z.infer<typeof reelMovementDto>;

export const reelDetailDto = reelSummaryDto.extend({
  tracks: z.array(z.object({ trackNo: z.number(), contents: z.string() })),
  songs: z.array(z.object({ title: z.string(), start: z.string(), keptTakes: z.string().nullable() })),
  movements: z.array(reelMovementDto),
  /** The first day storage fees apply, from the project's last session and the free period. */
  feesFrom: z.string().nullable(),
  storageCharges: z.array(z.object({ id: z.number(), month: z.string(), amountCents: z.number() })),
  /** Whether the caller may change the track sheet (the manager, or an engineer on the project's sessions). */
  canEditTrackSheet: z.boolean(),
});
export type ReelDetailDto = z.infer<typeof reelDetailDto>;

export const careEventInput = z.strictObject({
  kind: z.enum(careKinds, "Choose alignment, cleaning or repair"),
  doneOn: localDate,
  doneBy: personName,
  notes: optionalText(2000),
});
export type CareEventInput = z.infer<typeof careEventInput>;

export const recorderDto = z.object({
  id: z.number(),
  name: z.string(),
  roomName: z.string().nullable(),
  trackCount: z.number().nullable(),
  tapeWidthMils: z.number().nullable(),
  runningHours: z.number(),
  care: z.array(z.object({ kind: z.enum(careKinds), lastOn: z.string().nullable(), hoursSince: z.number(), intervalHours: z.number().nullable(), due: z.boolean() })),
  /** Confirmed sessions ahead that would take it past its alignment interval. */
  alignmentWarnings: z.array(z.object({ bookingId: z.number(), title: z.string().nullable(), startsAt: z.string(), hoursAtEnd: z.number() })),
  log: z.array(z.object({ id: z.number(), kind: z.enum(careKinds), doneOn: z.string(), doneBy: z.string(), notes: z.string().nullable() })),
});
export type RecorderDto = z.infer<typeof recorderDto>;

export const vaultSettingsDto = z.object({
  storageFreeDays: z.number(),
  storageMonthlyFeeCents: z.number(),
  alignmentIntervalHours: z.number(),
  cleaningIntervalHours: z.number(),
});
export type VaultSettingsDto = z.infer<typeof vaultSettingsDto>;
export const updateVaultSettingsInput = z
  .strictObject({
    storageFreeDays: z.number().int().min(0).max(3650, "Keep the free period under ten years"),
    storageMonthlyFeeCents: z.number().int().min(0).max(1_000_000, "Keep the fee under 10,000.00"),
    alignmentIntervalHours: z.number().int().min(1, "An interval is at least an hour").max(10_000),
    cleaningIntervalHours: z.number().int().min(1, "An interval is at least an hour").max(10_000),
  })
  .partial();
export type UpdateVaultSettingsInput = z.infer<typeof updateVaultSettingsInput>;

const staff = ["owner", "manager", "engineer"] as const;
const managers = ["owner", "manager"] as const;

/** The vault's routes: reels, their track sheets and movements (docs/tape.md, "Vault"). */
export const reelRoutes = {
  list: defineRoute({
    method: "get",
    path: "/api/reels",
    summary: "Reels the studio keeps or sold (a client sees only its own)",
    access: ["owner", "manager", "engineer", "bookkeeper", "client"],
    query: reelListQuery,
    response: z.array(reelSummaryDto),
  }),
  scan: defineRoute({
    method: "get",
    path: "/api/reels/scan",
    summary: "Find a reel by its label id, typed or read from the label's QR code",
    access: staff,
    query: reelScanQuery,
    response: reelSummaryDto,
  }),
  create: defineRoute({ method: "post", path: "/api/reels", summary: "Add a reel to the vault; it gets its label id", access: managers, body: createReelInput, status: 201, response: reelDetailDto }),
  get: defineRoute({
    method: "get",
    path: "/api/reels/:id",
    summary: "One reel with its track sheet and movements (404 for another client's)",
    access: ["owner", "manager", "engineer", "bookkeeper", "client"],
    params: idParams,
    response: reelDetailDto,
  }),
  label: defineRoute({
    method: "get",
    path: "/api/reels/:id/label.pdf",
    summary: "The printable box label and track sheet, with a QR code of the label id",
    access: ["owner", "manager", "engineer", "client"],
    params: idParams,
    response: "file",
  }),
  update: defineRoute({ method: "patch", path: "/api/reels/:id", summary: "Change a reel's details or shelf", access: managers, params: idParams, body: updateReelInput, response: reelDetailDto }),
  trackSheet: defineRoute({
    method: "patch",
    path: "/api/reels/:id/track-sheet",
    summary: "Fill in the track sheet; tracks and songs, when sent, replace the lists (engineers: reels of their own sessions)",
    access: staff,
    params: idParams,
    // An empty PATCH changes nothing (and still answers 404 for a reel that is not the caller's).
    body: trackSheetInput.default({}),
    response: reelDetailDto,
  }),
  checkOut: defineRoute({ method: "post", path: "/api/reels/:id/check-out", summary: "A reel leaves the vault for a while", access: staff, params: idParams, body: checkOutInput, response: reelDetailDto }),
  checkIn: defineRoute({ method: "post", path: "/api/reels/:id/check-in", summary: "A reel comes back to the vault", access: staff, params: idParams, body: checkInInput, response: reelDetailDto }),
  release: defineRoute({ method: "post", path: "/api/reels/:id/release", summary: "Hand a reel to its owner for good, with who collected it", access: managers, params: idParams, body: releaseInput, response: reelDetailDto }),
};

export const recorderRoutes = {
  list: defineRoute({ method: "get", path: "/api/recorders", summary: "Tape recorders with running hours, care due and sessions that would pass the alignment interval", access: staff, response: z.array(recorderDto) }),
  logCare: defineRoute({ method: "post", path: "/api/recorders/:id/care-events", summary: "Log an alignment, head cleaning or repair", access: staff, params: idParams, body: careEventInput, status: 201, response: recorderDto }),
};

export const vaultSettingsRoutes = {
  get: defineRoute({ method: "get", path: "/api/vault-settings", summary: "Storage fee and recorder care settings", access: ["owner", "manager", "bookkeeper"], response: vaultSettingsDto }),
  update: defineRoute({ method: "patch", path: "/api/vault-settings", summary: "Change the storage fee and recorder care settings", access: ["owner"], body: updateVaultSettingsInput, response: vaultSettingsDto }),
};
