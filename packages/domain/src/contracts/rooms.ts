import { z } from "zod";
import { engineerGrades, equipmentKinds, roomColours, tapeWidthsMils } from "../rooms/catalogue.ts";
import { idParams, optionalText } from "./common.ts";
import { defineRoute } from "./route.ts";

const cents = (what: string) => z.number().int(`${what} is in whole cents`).min(0).max(100_000_000);
const minuteOfDay = z.number().int().min(0).max(1440);

export const rateCardVersionDto = z.object({
  id: z.number(),
  roomId: z.number(),
  version: z.number(),
  effectiveFrom: z.string(),
  hourlyRateCents: z.number(),
  dayRateCents: z.number(),
  dayCoversMinutes: z.number(),
  minimumBillableMinutes: z.number(),
  billingIncrementMinutes: z.number(),
  afterHoursStartMinute: z.number(),
  afterHoursEndMinute: z.number(),
  afterHoursPremiumBp: z.number(),
  weekendPremiumBp: z.number(),
  /** Null: a lockout day costs the day rate. */
  lockoutDayRateCents: z.number().nullable(),
  lockoutWeekendPremium: z.boolean(),
  note: z.string().nullable(),
  createdAt: z.string(),
});
export type RateCardVersionDto = z.infer<typeof rateCardVersionDto>;

export const createRateCardVersionInput = z.strictObject({
  /** When the new prices apply from; bookings starting earlier keep the older version. Defaults to now. */
  effectiveFrom: z.iso.datetime({ offset: true, message: "Use an ISO date and time" }).optional(),
  hourlyRateCents: cents("The hourly rate"),
  dayRateCents: cents("The day rate"),
  dayCoversMinutes: z.number().int().min(60, "A day covers at least an hour").max(1440),
  minimumBillableMinutes: z.number().int().min(0).max(1440),
  billingIncrementMinutes: z.number().int().min(1).max(240),
  afterHoursStartMinute: minuteOfDay,
  afterHoursEndMinute: minuteOfDay,
  afterHoursPremiumBp: z.number().int().min(0).max(20000),
  weekendPremiumBp: z.number().int().min(0).max(20000),
  /** What one lockout day costs; null or absent: the day rate. */
  lockoutDayRateCents: z.number().int("The lockout day rate is in whole cents").min(1, "The lockout day rate is above zero, or left empty").max(100_000_000).nullable().optional(),
  /** Whether a lockout day on a Saturday or Sunday carries the weekend premium. Default false. */
  lockoutWeekendPremium: z.boolean().optional(),
  note: optionalText(200),
});
export type CreateRateCardVersionInput = z.infer<typeof createRateCardVersionInput>;

export const roomDto = z.object({
  id: z.number(),
  name: z.string(),
  description: z.string().nullable(),
  capacity: z.number(),
  colour: z.enum(roomColours),
  turnoverMinutes: z.number(),
  position: z.number(),
  active: z.boolean(),
  /** The version in force now, or null when the room has no prices yet. */
  currentRateCard: rateCardVersionDto.nullable(),
});
export type RoomDto = z.infer<typeof roomDto>;

const roomFields = {
  name: z.string().trim().min(1, "Enter the room's name").max(60, "Use at most 60 characters"),
  description: optionalText(1000),
  capacity: z.number().int().min(1).max(500),
  colour: z.enum(roomColours, "Choose one of the room colours"),
  turnoverMinutes: z.number().int().min(0).max(240, "Keep turnover under four hours"),
};
export const createRoomInput = z.strictObject(roomFields);
export type CreateRoomInput = z.infer<typeof createRoomInput>;
export const updateRoomInput = createRoomInput.partial().extend({ active: z.boolean().optional(), position: z.number().int().min(0).max(1000).optional() });
export type UpdateRoomInput = z.infer<typeof updateRoomInput>;

export const equipmentDto = z.object({
  id: z.number(),
  name: z.string(),
  kind: z.enum(equipmentKinds),
  homeRoomId: z.number().nullable(),
  homeRoomName: z.string().nullable(),
  trackCount: z.number().nullable(),
  tapeWidthMils: z.number().nullable(),
  speedsIps: z.array(z.number()),
  notes: z.string().nullable(),
  active: z.boolean(),
});
export type EquipmentDto = z.infer<typeof equipmentDto>;

const equipmentFields = {
  name: z.string().trim().min(1, "Enter a name").max(120),
  kind: z.enum(equipmentKinds, "Choose a kind of equipment"),
  homeRoomId: z.number().int().positive().nullable().optional(),
  trackCount: z.number().int().min(1).max(64).nullable().optional(),
  tapeWidthMils: z
    .number()
    .int()
    .refine((v) => (tapeWidthsMils as readonly number[]).includes(v), "Use 250, 500, 1000 or 2000 (thousandths of an inch)")
    .nullable()
    .optional(),
  /** Tape speeds in inches per second, e.g. 7.5, 15, 30. */
  speedsIps: z.array(z.number().positive().max(120)).max(6).optional(),
  notes: optionalText(1000),
};
export const createEquipmentInput = z.strictObject(equipmentFields);
export type CreateEquipmentInput = z.infer<typeof createEquipmentInput>;
export const updateEquipmentInput = createEquipmentInput.partial().extend({ active: z.boolean().optional() });
export type UpdateEquipmentInput = z.infer<typeof updateEquipmentInput>;

export const engineerRateDto = z.object({
  id: z.number(),
  grade: z.enum(engineerGrades),
  staffUserId: z.string().nullable(),
  staffName: z.string().nullable(),
  hourlyRateCents: z.number(),
  effectiveFrom: z.string(),
});
export type EngineerRateDto = z.infer<typeof engineerRateDto>;

export const createEngineerRateInput = z.strictObject({
  grade: z.enum(engineerGrades, "Choose engineer or assistant"),
  /** Set to bill one engineer at their own rate; leave out for the grade's rate. */
  staffUserId: z.string().min(1).max(36).optional(),
  hourlyRateCents: cents("The rate"),
  effectiveFrom: z.iso.datetime({ offset: true, message: "Use an ISO date and time" }).optional(),
});
export type CreateEngineerRateInput = z.infer<typeof createEngineerRateInput>;
/** Replaces a mistaken amount or start; bookings already quoted keep their quotes. */
export const correctEngineerRateInput = z.strictObject({
  hourlyRateCents: cents("The rate").optional(),
  effectiveFrom: z.iso.datetime({ offset: true, message: "Use an ISO date and time" }).optional(),
  reason: z.string().trim().min(3, "Say why the rate is corrected").max(500, "Use at most 500 characters"),
});
export type CorrectEngineerRateInput = z.infer<typeof correctEngineerRateInput>;

export const engineerDto = z.object({
  userId: z.string(),
  name: z.string(),
  grade: z.enum(engineerGrades),
});
export type EngineerDto = z.infer<typeof engineerDto>;

export const equipmentRoutes = {
  list: defineRoute({
    method: "get",
    path: "/api/equipment",
    summary: "All equipment, with the room each piece lives in",
    access: ["owner", "manager", "engineer"],
    response: z.array(equipmentDto),
  }),
  create: defineRoute({
    method: "post",
    path: "/api/equipment",
    summary: "Add a piece of equipment",
    access: ["owner"],
    body: createEquipmentInput,
    status: 201,
    response: equipmentDto,
  }),
  update: defineRoute({
    method: "patch",
    path: "/api/equipment/:id",
    summary: "Change a piece of equipment, or move it to another room",
    access: ["owner"],
    params: idParams,
    body: updateEquipmentInput,
    response: equipmentDto,
  }),
};

export const roomRoutes = {
  list: defineRoute({
    method: "get",
    path: "/api/rooms",
    summary: "Every room, with the rate card in force now",
    access: "signed-in",
    response: z.array(roomDto),
  }),
  create: defineRoute({
    method: "post",
    path: "/api/rooms",
    summary: "Add a room",
    access: ["owner"],
    body: createRoomInput,
    status: 201,
    response: roomDto,
  }),
  update: defineRoute({
    method: "patch",
    path: "/api/rooms/:id",
    summary: "Change a room (name, colour, turnover, order, active)",
    access: ["owner"],
    params: idParams,
    body: updateRoomInput,
    response: roomDto,
  }),
  rateCards: defineRoute({
    method: "get",
    path: "/api/rooms/:id/rate-cards",
    summary: "A room's rate-card versions, newest first",
    access: ["owner", "manager", "bookkeeper"],
    params: idParams,
    response: z.array(rateCardVersionDto),
  }),
  addRateCard: defineRoute({
    method: "post",
    path: "/api/rooms/:id/rate-cards",
    summary: "Add a new rate-card version; bookings keep the version they were quoted on",
    access: ["owner"],
    params: idParams,
    body: createRateCardVersionInput,
    status: 201,
    response: rateCardVersionDto,
  }),
};

/** Engineer rates billed to clients, and the engineers who can be booked. */
export const engineerRateRoutes = {
  list: defineRoute({
    method: "get",
    path: "/api/engineer-rates",
    summary: "Engineer rates billed to clients (per grade or per engineer), newest first",
    access: ["owner", "manager", "bookkeeper"],
    response: z.array(engineerRateDto),
  }),
  create: defineRoute({
    method: "post",
    path: "/api/engineer-rates",
    summary: "Set a new engineer rate from a date; earlier bookings keep their quotes",
    access: ["owner"],
    body: createEngineerRateInput,
    status: 201,
    response: engineerRateDto,
  }),
  correct: defineRoute({
    method: "patch",
    path: "/api/engineer-rates/:id",
    summary: "Correct an engineer rate's amount or start, with a reason (audited); bookings already quoted keep their quotes",
    access: ["owner"],
    params: idParams,
    body: correctEngineerRateInput,
    response: engineerRateDto,
  }),
  engineers: defineRoute({
    method: "get",
    path: "/api/engineers",
    summary: "Active engineers who can be assigned to bookings, with their grade",
    access: ["owner", "manager"],
    response: z.array(engineerDto),
  }),
};
