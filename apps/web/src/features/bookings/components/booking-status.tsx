import type { CSSProperties } from "react";
import { bookingStatusLabels, roomColourHex, type BookingDto, type RoomColour } from "@takeup/domain";
import { cx } from "../../../lib/cx.ts";

type StatusLike = Pick<BookingDto, "status" | "queuedBehindId">;

export const isSecondHold = (booking: StatusLike) => booking.status === "hold" && booking.queuedBehindId !== null;

/** "Hold", "2nd hold", "Confirmed", … as the studio reads them. */
export const statusText = (booking: StatusLike) => (isSecondHold(booking) ? "2nd hold" : bookingStatusLabels[booking.status]);

/** The status as said aloud: every hold starts with "Hold", so a second hold is "Hold (2nd hold)". */
export const spokenStatus = (booking: StatusLike) => (isSecondHold(booking) ? "Hold (2nd hold)" : bookingStatusLabels[booking.status]);

const badgeStyles: Record<BookingDto["status"], string> = {
  hold: "border-dashed border-ink/50 bg-card text-ink",
  confirmed: "border-ink/25 bg-paper-deep text-ink",
  in_session: "border-rust bg-rust text-white",
  wrapped: "border-line bg-card text-muted",
  cancelled: "border-line bg-card text-muted line-through",
};

export function BookingStatusBadge({ booking }: { booking: StatusLike }) {
  return (
    <span
      className={cx(
        "inline-flex items-center rounded-full border px-2 py-0.5 text-xs font-semibold whitespace-nowrap",
        badgeStyles[booking.status],
        isSecondHold(booking) && "border-dotted",
      )}
    >
      {statusText(booking)}
    </span>
  );
}

const alpha = (hex: string, a: number) =>
  `${hex}${Math.round(a * 255)
    .toString(16)
    .padStart(2, "0")}`;

/**
 * How a booking looks on the calendar, tinted with its room's colour. Holds are hatched with a
 * dashed outline (a second hold dotted), so a pencilled slot never passes for a firm one.
 */
export function blockStyle(booking: StatusLike, colour: RoomColour): CSSProperties {
  const hex = roomColourHex[colour];
  switch (booking.status) {
    case "hold":
      return {
        backgroundImage: `repeating-linear-gradient(135deg, ${alpha(hex, 0.22)} 0 5px, ${alpha(hex, 0.06)} 5px 10px)`,
        backgroundColor: "#fcfaf5",
        borderColor: hex,
        borderStyle: isSecondHold(booking) ? "dotted" : "dashed",
        borderWidth: "1.5px",
      };
    case "confirmed":
      return { backgroundColor: alpha(hex, 0.2), borderColor: hex, borderStyle: "solid", borderWidth: "1px 1px 1px 4px" };
    case "in_session":
      return { backgroundColor: alpha(hex, 0.42), borderColor: hex, borderStyle: "solid", borderWidth: "1px 1px 1px 4px" };
    case "wrapped":
      return { backgroundColor: alpha(hex, 0.08), borderColor: alpha(hex, 0.5), borderStyle: "solid", borderWidth: "1px 1px 1px 4px", color: "#5b554c" };
    case "cancelled":
      return { backgroundColor: "#eee7d9", borderColor: "#cfc6b3", borderStyle: "solid", borderWidth: "1px", color: "#5b554c", textDecoration: "line-through" };
  }
}
