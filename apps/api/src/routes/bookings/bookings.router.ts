import { z } from "zod";
import {
  bookingDto,
  bookingRequestInput,
  bookingsQuery,
  cancelBookingInput,
  cancellationPreviewDto,
  confirmBookingInput,
  createBookingInput,
  idParams,
  quoteInput,
  quoteResultDto,
  updateBookingInput,
  type BookingAction,
} from "@takeup/domain";
import { ApiRouter } from "../../lib/api-router.ts";
import type { Deps } from "../../deps.ts";
import { createBooking, getBooking, listBookings, previewQuote, updateBooking } from "./bookings.service.ts";
import { previewCancellation, transitionBooking } from "./transitions.ts";

export function quotesRouter({ db }: Deps) {
  return new ApiRouter("/api/quotes", "Bookings").route({
    method: "post",
    path: "/",
    summary: "Price a booking and list what is in the way; nothing is stored",
    access: ["owner", "manager", "client"],
    body: quoteInput,
    response: quoteResultDto,
    handler: ({ actor, body }) => previewQuote(db, actor, body),
  });
}

export function bookingRequestsRouter({ db }: Deps) {
  return new ApiRouter("/api/booking-requests", "Bookings").route({
    method: "post",
    path: "/",
    summary: "A client asks for a session: it arrives as a hold for the studio manager",
    access: ["client"],
    body: bookingRequestInput,
    status: 201,
    response: bookingDto,
    handler: ({ actor, body }) =>
      createBooking(db, actor, { ...body, clientAccountId: actor.clientAccountId!, status: "hold", requestedByClient: true }),
  });
}

const simpleTransitions: { action: BookingAction; path: string; summary: string; access: ("owner" | "manager" | "engineer")[] }[] = [
  { action: "start", path: "/:id/start", summary: "The session has begun", access: ["owner", "manager", "engineer"] },
  { action: "wrap", path: "/:id/wrap", summary: "The session is over (wrapped)", access: ["owner", "manager", "engineer"] },
  { action: "release", path: "/:id/release", summary: "Release a hold; the next second hold moves up", access: ["owner", "manager"] },
];

export function bookingsRouter(deps: Deps) {
  const { db } = deps;
  const router = new ApiRouter("/api/bookings", "Bookings")
    .route({
      method: "get",
      path: "/",
      summary: "Bookings overlapping a window (at most 62 days); engineers see their own, clients their account's",
      access: ["owner", "manager", "bookkeeper", "engineer", "client"],
      query: bookingsQuery,
      response: z.array(bookingDto),
      handler: ({ actor, query }) => listBookings(db, actor, query),
    })
    .route({
      method: "post",
      path: "/",
      summary: "Pencil a hold or book outright (409 booking_conflict when anything clashes)",
      access: ["owner", "manager"],
      body: createBookingInput,
      status: 201,
      response: bookingDto,
      handler: ({ actor, body }) => createBooking(db, actor, body),
    })
    .route({
      method: "get",
      path: "/:id",
      summary: "One booking with its quote",
      access: ["owner", "manager", "bookkeeper", "engineer", "client"],
      params: idParams,
      response: bookingDto,
      handler: ({ actor, params }) => getBooking(db, actor, params.id),
    })
    .route({
      method: "patch",
      path: "/:id",
      summary: "Move a booking or change its engineers and equipment (priced on its own rate-card version)",
      access: ["owner", "manager"],
      params: idParams,
      body: updateBookingInput,
      response: bookingDto,
      handler: ({ actor, params, body }) => updateBooking(db, actor, params.id, body),
    })
    .route({
      method: "post",
      path: "/:id/confirm",
      summary: "Confirm a hold (against its deposit); second holds behind it are dropped",
      access: ["owner", "manager"],
      params: idParams,
      body: confirmBookingInput,
      response: bookingDto,
      handler: ({ actor, params, body }) => transitionBooking(deps, actor, params.id, "confirm", body),
    })
    .route({
      method: "get",
      path: "/:id/cancellation-preview",
      summary: "The fee cancelling now would cost, by notice given",
      access: ["owner", "manager"],
      params: idParams,
      response: cancellationPreviewDto,
      handler: ({ params }) => previewCancellation(deps, params.id),
    })
    .route({
      method: "post",
      path: "/:id/cancel",
      summary: "Cancel a confirmed booking, charging the fee for the notice given",
      access: ["owner", "manager"],
      params: idParams,
      body: cancelBookingInput,
      response: bookingDto,
      handler: ({ actor, params, body }) => transitionBooking(deps, actor, params.id, "cancel", body),
    });
  for (const t of simpleTransitions) {
    router.route({
      method: "post",
      path: t.path,
      summary: t.summary,
      access: t.access,
      params: idParams,
      response: bookingDto,
      handler: ({ actor, params }) => transitionBooking(deps, actor, params.id, t.action),
    });
  }
  return router;
}
