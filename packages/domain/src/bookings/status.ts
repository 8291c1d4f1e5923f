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

export const allowedActions = (current: BookingStatus): BookingAction[] =>
  bookingActions.filter((action) => nextStatus(current, action) !== null);
