import { z } from "zod";
import { bookingActions, bookingStatuses } from "../bookings/status.ts";
import { engineerGrades, roomColours } from "../rooms/catalogue.ts";
import { idParams, optionalText } from "./common.ts";
import { defineRoute } from "./route.ts";

const instant = z.iso.datetime({ offset: true, message: "Use an ISO date and time with an offset, e.g. 2026-12-07T10:00:00-06:00" });
const engineerIds = z.array(z.string().min(1).max(36)).max(6, "At most six engineers on one booking");
const equipmentIds = z.array(z.number().int().positive()).max(20, "At most twenty pieces of equipment");

export const quoteLineDto = z.object({
  kind: z.enum(["room_hourly", "room_day", "minimum_top_up", "after_hours_premium", "weekend_premium", "engineer"]),
  label: z.string(),
  quantity: z.number(),
  unit: z.enum(["hour", "day"]),
  unitAmountCents: z.number(),
  amountCents: z.number(),
  minutes: z.number(),
  date: z.string().optional(),
  engineerId: z.string().optional(),
  explanation: z.string(),
});

export const quoteDto = z.object({
  rateCardId: z.string(),
  rateCardLabel: z.string(),
  currency: z.string(),
  timeZone: z.string(),
  elapsedMinutes: z.number(),
  billableMinutes: z.number(),
  lines: z.array(quoteLineDto),
  totalCents: z.number(),
  lockout: z.boolean().optional(),
});

export const quoteInput = z.strictObject({
  roomId: z.number().int().positive(),
  startsAt: instant,
  endsAt: instant,
  engineerIds: engineerIds.optional(),
  equipmentIds: equipmentIds.optional(),
  /** Whole studio days around the clock, each at one day's price (docs/pricing.md, lockouts). */
  lockout: z.boolean().optional(),
});
export type QuoteInput = z.infer<typeof quoteInput>;

export const conflictDto = z.object({
  resource: z.enum(["room", "engineer", "equipment"]),
  name: z.string(),
  bookingId: z.number(),
  status: z.enum(bookingStatuses),
  startsAt: z.string(),
  endsAt: z.string(),
  /** Left out when the one asking is a client: other clients' names are not theirs to see. */
  clientName: z.string().nullable(),
});
export type ConflictDto = z.infer<typeof conflictDto>;

export const quoteResultDto = z.object({
  roomId: z.number(),
  rateCardVersionId: z.number(),
  quote: quoteDto,
  depositRequiredCents: z.number(),
  /** What is already in the way; empty when the slot is free. */
  conflicts: z.array(conflictDto),
  /** True when every conflict is a hold, so a second hold may queue behind it. */
  canQueueBehindHold: z.boolean(),
});
export type QuoteResultDto = z.infer<typeof quoteResultDto>;

export const createBookingInput = z.strictObject({
  roomId: z.number().int().positive(),
  clientAccountId: z.number().int().positive(),
  projectId: z.number().int().positive().nullable().optional(),
  startsAt: instant,
  endsAt: instant,
  engineerIds: engineerIds.optional(),
  equipmentIds: equipmentIds.optional(),
  title: optionalText(120),
  notes: optionalText(2000),
  /** "hold" pencils the slot (it lapses unless confirmed); "confirmed" books it outright. */
  status: z.enum(["hold", "confirmed"]).default("hold"),
  /** Queue as a second hold behind a first hold on the same slot. */
  queueBehindHold: z.boolean().optional(),
  /** Whole studio days around the clock, each at one day's price: the span is widened to whole days. */
  lockout: z.boolean().optional(),
});
export type CreateBookingInput = z.input<typeof createBookingInput>;
/** The parsed request, with defaults applied (status). */
export type CreateBookingCommand = z.output<typeof createBookingInput>;

export const updateBookingInput = z.strictObject({
  startsAt: instant.optional(),
  endsAt: instant.optional(),
  engineerIds: engineerIds.optional(),
  equipmentIds: equipmentIds.optional(),
  projectId: z.number().int().positive().nullable().optional(),
  title: optionalText(120),
  notes: optionalText(2000),
});
export type UpdateBookingInput = z.infer<typeof updateBookingInput>;

export const bookingRequestInput = z.strictObject({
  roomId: z.number().int().positive(),
  startsAt: instant,
  endsAt: instant,
  projectId: z.number().int().positive().nullable().optional(),
  notes: optionalText(2000),
});
export type BookingRequestInput = z.infer<typeof bookingRequestInput>;

export const bookingsQuery = z.strictObject({
  from: instant,
  to: instant,
  roomId: z.coerce.number().int().positive().optional(),
  engineerId: z.string().min(1).max(36).optional(),
  clientAccountId: z.coerce.number().int().positive().optional(),
  status: z.enum(bookingStatuses).optional(),
});
export type BookingsQuery = z.infer<typeof bookingsQuery>;

export const confirmBookingInput = z.strictObject({ depositReceived: z.boolean().optional() });
export const cancelBookingInput = z.strictObject({ reason: optionalText(200) });

export const cancellationPreviewDto = z.object({
  feeCents: z.number(),
  noticeMinutes: z.number(),
  explanation: z.string(),
});
export type CancellationPreviewDto = z.infer<typeof cancellationPreviewDto>;

export const bookingDto = z.object({
  id: z.number(),
  room: z.object({ id: z.number(), name: z.string(), colour: z.enum(roomColours) }),
  client: z.object({ id: z.number(), name: z.string() }),
  project: z.object({ id: z.number(), name: z.string() }).nullable(),
  startsAt: z.string(),
  endsAt: z.string(),
  status: z.enum(bookingStatuses),
  /** Whole studio days around the clock (startsAt and endsAt are the days' local midnights). */
  lockout: z.boolean(),
  holdExpiresAt: z.string().nullable(),
  /** For a second hold: the first hold it waits behind. */
  queuedBehindId: z.number().nullable(),
  engineers: z.array(z.object({ userId: z.string(), name: z.string(), grade: z.enum(engineerGrades) })),
  equipment: z.array(z.object({ id: z.number(), name: z.string() })),
  title: z.string().nullable(),
  notes: z.string().nullable(),
  rateCardVersionId: z.number(),
  quote: quoteDto,
  quoteTotalCents: z.number(),
  depositRequiredCents: z.number(),
  depositReceivedAt: z.string().nullable(),
  requestedByClient: z.boolean(),
  cancelledAt: z.string().nullable(),
  cancellationReason: z.string().nullable(),
  cancellationFeeCents: z.number().nullable(),
  allowedActions: z.array(z.enum(bookingActions)),
  createdAt: z.string(),
});
export type BookingDto = z.infer<typeof bookingDto>;

export const projectDto = z.object({ id: z.number(), clientAccountId: z.number(), name: z.string(), notes: z.string().nullable(), active: z.boolean() });
export type ProjectDto = z.infer<typeof projectDto>;
export const createProjectInput = z.strictObject({
  name: z.string().trim().min(1, "Enter the project's name").max(120),
  notes: optionalText(2000),
});
export type CreateProjectInput = z.infer<typeof createProjectInput>;

export const calendarFeedDto = z.object({
  id: z.number(),
  kind: z.enum(["room", "engineer"]),
  roomId: z.number().nullable(),
  staffUserId: z.string().nullable(),
  name: z.string(),
  createdAt: z.string(),
  revokedAt: z.string().nullable(),
  /** Shown once, when the feed is created: only a hash of the token is kept. */
  url: z.string().nullable(),
});
export type CalendarFeedDto = z.infer<typeof calendarFeedDto>;
export const createCalendarFeedInput = z
  .strictObject({ roomId: z.number().int().positive().optional(), staffUserId: z.string().min(1).max(36).optional() })
  .refine((v) => (v.roomId === undefined) !== (v.staffUserId === undefined), { message: "Give either a room or an engineer" });

const bookers = ["owner", "manager"] as const;
const everyoneWhoSeesBookings = ["owner", "manager", "bookkeeper", "engineer", "client"] as const;
const whoRunsSessions = ["owner", "manager", "engineer"] as const;

/** Quotes, client requests and bookings, declared once for the API and the web. */
export const bookingRoutes = {
  quote: defineRoute({
    method: "post",
    path: "/api/quotes",
    summary: "Price a booking and list what is in the way; nothing is stored",
    access: ["owner", "manager", "client"],
    body: quoteInput,
    response: quoteResultDto,
  }),
  request: defineRoute({
    method: "post",
    path: "/api/booking-requests",
    summary: "A client asks for a session: it arrives as a hold for the studio manager",
    access: ["client"],
    body: bookingRequestInput,
    status: 201,
    response: bookingDto,
  }),
  list: defineRoute({
    method: "get",
    path: "/api/bookings",
    summary: "Bookings overlapping a window (at most 62 days); engineers see their own, clients their account's",
    access: everyoneWhoSeesBookings,
    query: bookingsQuery,
    response: z.array(bookingDto),
  }),
  create: defineRoute({
    method: "post",
    path: "/api/bookings",
    summary: "Pencil a hold or book outright (409 booking_conflict when anything clashes)",
    access: bookers,
    body: createBookingInput,
    status: 201,
    response: bookingDto,
  }),
  get: defineRoute({
    method: "get",
    path: "/api/bookings/:id",
    summary: "One booking with its quote",
    access: everyoneWhoSeesBookings,
    params: idParams,
    response: bookingDto,
  }),
  update: defineRoute({
    method: "patch",
    path: "/api/bookings/:id",
    summary: "Move a booking or change its engineers and equipment (priced on its own rate-card version)",
    access: bookers,
    params: idParams,
    body: updateBookingInput,
    response: bookingDto,
  }),
  confirm: defineRoute({
    method: "post",
    path: "/api/bookings/:id/confirm",
    summary: "Confirm a hold (against its deposit); second holds behind it are dropped",
    access: bookers,
    params: idParams,
    body: confirmBookingInput,
    response: bookingDto,
  }),
  cancellationPreview: defineRoute({
    method: "get",
    path: "/api/bookings/:id/cancellation-preview",
    summary: "The fee cancelling now would cost, by notice given",
    access: bookers,
    params: idParams,
    response: cancellationPreviewDto,
  }),
  cancel: defineRoute({
    method: "post",
    path: "/api/bookings/:id/cancel",
    summary: "Cancel a confirmed booking, charging the fee for the notice given",
    access: bookers,
    params: idParams,
    body: cancelBookingInput,
    response: bookingDto,
  }),
  start: defineRoute({
    method: "post",
    path: "/api/bookings/:id/start",
    summary: "The session has begun",
    access: whoRunsSessions,
    params: idParams,
    response: bookingDto,
  }),
  wrap: defineRoute({
    method: "post",
    path: "/api/bookings/:id/wrap",
    summary: "The session is over (wrapped)",
    access: whoRunsSessions,
    params: idParams,
    response: bookingDto,
  }),
  release: defineRoute({
    method: "post",
    path: "/api/bookings/:id/release",
    summary: "Release a hold; the next second hold moves up",
    access: bookers,
    params: idParams,
    response: bookingDto,
  }),
};
