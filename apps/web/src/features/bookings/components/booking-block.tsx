import { formatTimeRange } from "../../../lib/studio-time.ts";
import { blockStyle, spokenStatus, statusText } from "./booking-status.tsx";
import { slotMinutes, type Segment } from "./calendar-layout.ts";

/** The height of one quarter-hour row, in pixels. */
export const slotHeight = 14;

/** One booking drawn over the grid cell where it starts. */
export function BookingBlock({
  segment,
  timeZone,
  slotStartMinute,
  compact,
  onOpen,
}: {
  segment: Segment;
  timeZone: string;
  slotStartMinute: number;
  compact: boolean;
  onOpen: () => void;
}) {
  const { booking } = segment;
  const top = ((segment.startMinute - slotStartMinute) / slotMinutes) * slotHeight;
  const height = Math.max(((segment.endMinute - segment.startMinute) / slotMinutes) * slotHeight - 2, slotHeight - 2);
  const times = formatTimeRange(booking.startsAt, booking.endsAt, timeZone);
  const width = 100 / segment.lanes;
  return (
    <button
      type="button"
      data-status={booking.status}
      aria-label={`${booking.client.name} — ${spokenStatus(booking)}, ${booking.room.name} ${times}`}
      onClick={onOpen}
      className="absolute z-10 flex flex-col items-stretch justify-start overflow-hidden rounded-[3px] px-1 py-0.5 text-left leading-tight text-ink shadow-xs hover:brightness-95 focus-visible:z-20"
      style={{
        top: top + 1,
        height,
        left: `calc(${segment.lane * width}% + 1px)`,
        width: `calc(${width}% - 3px)`,
        ...blockStyle(booking, booking.room.colour),
      }}
    >
      <span className="block truncate font-semibold">{booking.client.name}</span>
      {height > 26 ? (
        <span className="block truncate">
          {compact ? statusText(booking) : `${statusText(booking)} · ${times}`}
        </span>
      ) : null}
      {!compact && height > 40 && booking.title ? <span className="block truncate text-muted">{booking.title}</span> : null}
    </button>
  );
}
