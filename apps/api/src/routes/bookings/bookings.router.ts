import { bookingRoutes } from "@takeup/domain";
import { ApiRouter } from "../../lib/api-router.ts";
import type { Deps } from "../../deps.ts";
import { createBooking, getBooking, listBookings, previewQuote, updateBooking } from "./bookings.service.ts";
import { previewCancellation, transitionBooking } from "./transitions.ts";

export function quotesRouter({ db }: Deps) {
  return new ApiRouter("/api/quotes", "Bookings").handle(bookingRoutes.quote, ({ actor, body }) => previewQuote(db, actor, body));
}

export function bookingRequestsRouter({ db }: Deps) {
  return new ApiRouter("/api/booking-requests", "Bookings").handle(bookingRoutes.request, ({ actor, body }) =>
    createBooking(db, actor, { ...body, clientAccountId: actor.clientAccountId!, status: "hold", requestedByClient: true }),
  );
}

export function bookingsRouter(deps: Deps) {
  const { db } = deps;
  return new ApiRouter("/api/bookings", "Bookings")
    .handle(bookingRoutes.list, ({ actor, query }) => listBookings(db, actor, query))
    .handle(bookingRoutes.create, ({ actor, body }) => createBooking(db, actor, body))
    .handle(bookingRoutes.get, ({ actor, params }) => getBooking(db, actor, params.id))
    .handle(bookingRoutes.update, ({ actor, params, body }) => updateBooking(db, actor, params.id, body))
    .handle(bookingRoutes.confirm, ({ actor, params, body }) => transitionBooking(deps, actor, params.id, "confirm", body))
    .handle(bookingRoutes.cancellationPreview, ({ params }) => previewCancellation(deps, params.id))
    .handle(bookingRoutes.cancel, ({ actor, params, body }) => transitionBooking(deps, actor, params.id, "cancel", body))
    .handle(bookingRoutes.start, ({ actor, params }) => transitionBooking(deps, actor, params.id, "start"))
    .handle(bookingRoutes.wrap, ({ actor, params }) => transitionBooking(deps, actor, params.id, "wrap"))
    .handle(bookingRoutes.release, ({ actor, params }) => transitionBooking(deps, actor, params.id, "release"));
}
