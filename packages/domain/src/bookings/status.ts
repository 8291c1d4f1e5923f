import { nearBookedTime } from "../shared/date-window.ts";

/** Booking states of the product brief. */
export const bookingStatuses = ["hold", "confirmed", "in_session", "wrapped", "cancelled"] as const;
export type BookingStatus = (typeof bookingStatuses)[number];

export const bookingStatusLabels: Record<BookingStatus, string> = {
  hold: "Hold",
  confirmed: "Confirmed",
  in_session: "In session",
  wrapped: "Wrapped",
  cancelled: "Cancelled",
};

export const bookingActions = ["confirm", "start", "wrap", "cancel", "release"] as const;
export type BookingAction = (typeof bookingActions)[number];

const transitions: Record<BookingAction, { from: readonly BookingStatus[]; to: BookingStatus }> = {
  confirm: { from: ["hold"], to: "confirmed" },
  start: { from: ["confirmed"], to: "in_session" },
  wrap: { from: ["in_session"], to: "wrapped" },
  cancel: { from: ["confirmed"], to: "cancelled" },
  // Releasing a hold frees the slot with no fee; the next hold in the queue moves up.
  release: { from: ["hold"], to: "cancelled" },
};

/** The state an action leads to, or null when the action does not apply to the current state. */
export function nextStatus(current: BookingStatus, action: BookingAction): BookingStatus | null {
  const rule = transitions[action];
  return rule.from.includes(current) ? rule.to : null;
}

/** What a booking is, beyond its state, that decides which actions it allows now. */
export type BookingActionContext = { queuedBehindId: number | null; startsAt: Date; endsAt: Date; now: Date };

/**
 * The actions a booking allows: those its state leads on from and, given the booking, none that
 * would be refused — a second hold is not confirmed until it moves up, and a session is started
 * only near its booked time (docs/date-window.md).
 */
export function allowedActions(current: BookingStatus, booking?: BookingActionContext): BookingAction[] {
  return bookingActions.filter((action) => {
    if (nextStatus(current, action) === null) return false;
    if (!booking) return true;
    if (action === "confirm" && booking.queuedBehindId) return false;
    if (action === "start" && !nearBookedTime(booking.startsAt, booking.endsAt, booking.now)) return false;
    return true;
  });
}

/** What is in the way of a slot, as far as queueing is concerned. */
export type SlotClash = { resource: "room" | "engineer" | "equipment"; status: BookingStatus; bookingId: number };

/**
 * A second hold may queue behind a first one only when everything in the way is the room held
 * by holds (never a confirmed booking, an engineer or equipment); the first hold it waits
 * behind, or null when it may not queue.
 */
export function holdToQueueBehind(clashes: readonly SlotClash[]): number | null {
  if (clashes.length === 0 || !clashes.every((c) => c.resource === "room" && c.status === "hold")) return null;
  const firstHolds = new Set(clashes.map((c) => c.bookingId));
  return firstHolds.size === 1 ? clashes[0]!.bookingId : null;
}

/** Whether a second hold may queue behind what is in the way (the quote offers it). */
export const mayQueueBehindHold = (clashes: readonly SlotClash[]): boolean =>
  clashes.length > 0 && clashes.every((c) => c.resource === "room" && c.status === "hold");
