import { char, double, index, int, mysqlEnum, mysqlTable, primaryKey, text, unique, varchar } from "drizzle-orm/mysql-core";
import { careKinds, noiseReductions, reelMovementKinds, reelStatuses } from "@takeup/domain";
import { createdAt, id, refId, updatedAt, utc } from "./columns.ts";
import { user } from "./auth.ts";
import { clientAccounts } from "./people.ts";
import { projects } from "./bookings.ts";
import { equipment } from "./rooms.ts";

/** A reel the studio stores or sold: its label, owner, format and shelf (docs/tape.md, "Vault"). */
export const reels = mysqlTable(
  "reels",
  {
    id: id(),
    /** Our own label id (RL-000042-X), from the reel's id; see packages/domain/src/vault/label-id.ts. */
    labelId: varchar("label_id", { length: 24 }).notNull().unique(),
    clientAccountId: refId("client_account_id")
      .notNull()
      .references(() => clientAccounts.id),
    projectId: refId("project_id").references(() => projects.id),
    /** The tape product it came from, when sold here; no foreign key until the stock tables land. */
    tapeProductId: int("tape_product_id"),
    trackCount: int("track_count").notNull(),
    /** Tape width in thousandths of an inch, as equipment keeps it (2000 = 2 inch). */
    tapeWidthMils: int("tape_width_mils").notNull(),
    speedIps: double("speed_ips").notNull(),
    noiseReduction: mysqlEnum("noise_reduction", noiseReductions).notNull().default("none"),
    /** As written on the box, free text. */
    referenceLevel: varchar("reference_level", { length: 60 }),
    /** Studio-local date (YYYY-MM-DD). */
    recordedOn: char("recorded_on", { length: 10 }),
    contentsNote: text("contents_note"),
    shelf: varchar("shelf", { length: 40 }),
    status: mysqlEnum("status", reelStatuses).notNull().default("in_vault"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("reels_client_idx").on(t.clientAccountId), index("reels_project_idx").on(t.projectId)],
);

/** What is on each track of a reel (1 … its track count). */
export const reelTracks = mysqlTable(
  "reel_tracks",
  {
    reelId: refId("reel_id")
      .notNull()
      .references(() => reels.id),
    trackNo: int("track_no").notNull(),
    contents: varchar("contents", { length: 120 }).notNull(),
  },
  (t) => [primaryKey({ columns: [t.reelId, t.trackNo] })],
);

/** The songs on a reel, in order, with where each starts (seconds from the head) and the takes kept. */
export const reelSongs = mysqlTable(
  "reel_songs",
  {
    id: id(),
    reelId: refId("reel_id")
      .notNull()
      .references(() => reels.id),
    position: int("position").notNull(),
    title: varchar("title", { length: 120 }).notNull(),
    startSeconds: int("start_seconds").notNull(),
    keptTakes: varchar("kept_takes", { length: 120 }),
  },
  (t) => [index("reel_songs_reel_idx").on(t.reelId, t.position)],
);

/** A reel leaving or coming back: never edited, a mistake is followed by another movement. */
export const reelMovements = mysqlTable(
  "reel_movements",
  {
    id: id(),
    reelId: refId("reel_id")
      .notNull()
      .references(() => reels.id),
    kind: mysqlEnum("kind", reelMovementKinds).notNull(),
    /** Who took it, brought it back or collected it. */
    person: varchar("person", { length: 120 }).notNull(),
    reason: varchar("reason", { length: 200 }),
    /** For a check-out: the studio-local date it is due back. */
    dueBack: char("due_back", { length: 10 }),
    recordedByUserId: varchar("recorded_by_user_id", { length: 36 }).references(() => user.id),
    at: utc("at").notNull(),
    createdAt: createdAt(),
  },
  (t) => [index("reel_movements_reel_idx").on(t.reelId, t.at)],
);

/** One month's storage fee for one reel: invoicing bills these rows by id. Once per reel-month. */
export const storageCharges = mysqlTable(
  "storage_charges",
  {
    id: id(),
    clientAccountId: refId("client_account_id")
      .notNull()
      .references(() => clientAccounts.id),
    reelId: refId("reel_id")
      .notNull()
      .references(() => reels.id),
    month: char("month", { length: 7 }).notNull(),
    amountCents: int("amount_cents").notNull(),
    createdAt: createdAt(),
  },
  (t) => [unique("storage_charges_reel_month").on(t.reelId, t.month), index("storage_charges_client_idx").on(t.clientAccountId, t.month)],
);

/** The notice that storage fees are coming, claimed once per reel (the unique key keeps two runs apart). */
export const storageNotices = mysqlTable("storage_notices", {
  id: id(),
  reelId: refId("reel_id")
    .notNull()
    .unique()
    .references(() => reels.id),
  clientAccountId: refId("client_account_id")
    .notNull()
    .references(() => clientAccounts.id),
  feeStart: char("fee_start", { length: 10 }).notNull(),
  createdAt: createdAt(),
});

/** A recorder's care log: alignment, head cleaning and demagnetising, repair. */
export const recorderCareEvents = mysqlTable(
  "recorder_care_events",
  {
    id: id(),
    equipmentId: refId("equipment_id")
      .notNull()
      .references(() => equipment.id),
    kind: mysqlEnum("kind", careKinds).notNull(),
    /** Studio-local date; the event counts from the start of that day. */
    doneOn: char("done_on", { length: 10 }).notNull(),
    doneBy: varchar("done_by", { length: 120 }).notNull(),
    notes: text("notes"),
    recordedByUserId: varchar("recorded_by_user_id", { length: 36 }).references(() => user.id),
    createdAt: createdAt(),
  },
  (t) => [index("recorder_care_equipment_idx").on(t.equipmentId, t.doneOn)],
);

export type Reel = typeof reels.$inferSelect;
export type ReelMovement = typeof reelMovements.$inferSelect;
export type RecorderCareEvent = typeof recorderCareEvents.$inferSelect;
