import { useEffect, useMemo, useRef, useState, type KeyboardEvent, type MouseEvent, type PointerEvent } from "react";
import { roomColourHex } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { ErrorState } from "../../../components/ui/states.tsx";
import { Spinner } from "../../../components/ui/spinner.tsx";
import { cx } from "../../../lib/cx.ts";
import {
  addDays,
  formatDayLong,
  formatDayShort,
  formatTimeRange,
  minuteToTime,
  startOfStudioWeek,
  studioDaysRange,
  studioToday,
} from "../../../lib/studio-time.ts";
import { useBookings } from "../api/get-bookings.ts";
import { blockStyle, spokenStatus, statusText } from "./booking-status.tsx";
import {
  calendarColumns,
  countBeforeMinute,
  dayViewStartMinute,
  layoutSegments,
  slotMinutes,
  slotsPerDay,
  type CalendarRoom,
  type Segment,
} from "./calendar-layout.ts";

export type CalendarView = "day" | "week";

/** A stretch of free time picked on the grid, in studio-local terms. */
export type SlotSelection = { roomId: number; date: string; start: string; end: string };

type BookingCalendarProps = {
  /** The rooms to show as columns, already in calendar order. */
  rooms: CalendarRoom[];
  timeZone: string;
  workweekStartDay: number;
  view: CalendarView;
  /** The studio-local day shown (day view) or a day in the week shown (week view). */
  date: string;
  onNavigate: (next: { view: CalendarView; date: string }) => void;
  /** Leave out for read-only calendars: empty time then does nothing. */
  onSelectSlot?: (slot: SlotSelection) => void;
  onOpenBooking: (bookingId: number) => void;
};

const slotHeight = 14;
const defaultLengthMinutes = 60;

type Cursor = { column: number; slot: number };
type Drag = { column: number; from: number; to: number };

export function BookingCalendar({ rooms, timeZone, workweekStartDay, view, date, onNavigate, onSelectSlot, onOpenBooking }: BookingCalendarProps) {
  const [showNight, setShowNight] = useState(false);
  const [showCancelled, setShowCancelled] = useState(false);
  const today = studioToday(timeZone);

  const days = useMemo(() => {
    if (view === "day") return [date];
    const first = startOfStudioWeek(date, workweekStartDay);
    return Array.from({ length: 7 }, (_, i) => addDays(first, i));
  }, [view, date, workweekStartDay]);
  const range = studioDaysRange(days[0] ?? date, days.length, timeZone);
  const bookings = useBookings(range, { keepPrevious: true });

  const fromMinute = showNight ? 0 : dayViewStartMinute;
  const firstSlot = fromMinute / slotMinutes;
  const slotCount = slotsPerDay - firstSlot;
  const columns = useMemo(() => calendarColumns(days, rooms), [days, rooms]);

  const visible = useMemo(
    () => (bookings.data ?? []).filter((b) => showCancelled || b.status !== "cancelled"),
    [bookings.data, showCancelled],
  );
  const segments = useMemo(() => layoutSegments(visible, columns, timeZone, fromMinute), [visible, columns, timeZone, fromMinute]);
  const hiddenAtNight = useMemo(
    () => (showNight ? 0 : countBeforeMinute(visible, days, new Set(rooms.map((r) => r.id)), timeZone, dayViewStartMinute)),
    [showNight, visible, days, rooms, timeZone],
  );

  // Where each block starts, and which cells a block lies over (those open the booking, not a quote).
  const { startingAt, coveredBy } = useMemo(() => {
    const starting = new Map<string, Segment[]>();
    const covered = new Map<string, number>();
    for (const segment of segments) {
      const first = Math.floor(segment.startMinute / slotMinutes);
      const last = Math.ceil(segment.endMinute / slotMinutes) - 1;
      const key = `${segment.column}:${first}`;
      starting.set(key, [...(starting.get(key) ?? []), segment]);
      for (let slot = first; slot <= last; slot++) {
        const cell = `${segment.column}:${slot}`;
        if (!covered.has(cell)) covered.set(cell, segment.booking.id);
      }
    }
    return { startingAt: starting, coveredBy: covered };
  }, [segments]);

  const [cursor, setCursor] = useState<Cursor>(() => ({ column: 0, slot: 10 * 4 }));
  const [drag, setDrag] = useState<Drag | null>(null);
  const gridRef = useRef<HTMLDivElement>(null);
  const column = Math.min(cursor.column, Math.max(columns.length - 1, 0));
  const cursorSlot = Math.max(cursor.slot, firstSlot);

  const cellLabel = (columnIndex: number, slot: number) => {
    const col = columns[columnIndex];
    return col ? `${col.room.name} ${formatDayShort(col.date)} ${minuteToTime(slot * slotMinutes)}` : "";
  };

  // Every cell is focusable from script; focusing one makes it the cursor (see onFocus).
  const focusCell = (next: Cursor) => {
    setCursor(next);
    gridRef.current?.querySelector<HTMLElement>(`[data-column="${next.column}"][data-slot="${next.slot}"]`)?.focus();
  };
  const lastPointer = useRef<string>("mouse");

  const select = (columnIndex: number, fromSlot: number, toSlot: number) => {
    const col = columns[columnIndex];
    if (!col || !onSelectSlot) return;
    const first = Math.min(fromSlot, toSlot);
    const last = Math.max(fromSlot, toSlot);
    const startMinute = first * slotMinutes;
    const endMinute = last > first ? (last + 1) * slotMinutes : Math.min(startMinute + defaultLengthMinutes, 1440);
    onSelectSlot({ roomId: col.room.id, date: col.date, start: minuteToTime(startMinute), end: minuteToTime(endMinute) });
  };

  const activate = (columnIndex: number, slot: number) => {
    const covering = coveredBy.get(`${columnIndex}:${slot}`);
    if (covering !== undefined) onOpenBooking(covering);
    else select(columnIndex, slot, slot);
  };

  const onKeyDown = (event: KeyboardEvent<HTMLDivElement>) => {
    const cell = (event.target as HTMLElement).closest<HTMLElement>("[data-slot]");
    if (!cell || cell !== event.target) return;
    const current = { column: Number(cell.dataset.column), slot: Number(cell.dataset.slot) };
    const lastColumn = columns.length - 1;
    const lastSlot = slotsPerDay - 1;
    const moves: Record<string, Cursor> = {
      ArrowUp: { ...current, slot: Math.max(firstSlot, current.slot - 1) },
      ArrowDown: { ...current, slot: Math.min(lastSlot, current.slot + 1) },
      ArrowLeft: { ...current, column: Math.max(0, current.column - 1) },
      ArrowRight: { ...current, column: Math.min(lastColumn, current.column + 1) },
      PageUp: { ...current, slot: Math.max(firstSlot, current.slot - 4) },
      PageDown: { ...current, slot: Math.min(lastSlot, current.slot + 4) },
      Home: event.ctrlKey ? { column: 0, slot: firstSlot } : { ...current, column: 0 },
      End: event.ctrlKey ? { column: lastColumn, slot: lastSlot } : { ...current, column: lastColumn },
    };
    const move = moves[event.key];
    if (move) {
      event.preventDefault();
      focusCell(move);
      return;
    }
    if (event.key === "Enter" || event.key === " ") {
      event.preventDefault();
      activate(current.column, current.slot);
    }
  };

  const cellFrom = (event: PointerEvent<HTMLDivElement>) => (event.target as HTMLElement).closest<HTMLElement>("[data-slot]");

  const onPointerDown = (event: PointerEvent<HTMLDivElement>) => {
    lastPointer.current = event.pointerType;
    if (!onSelectSlot || event.button !== 0) return;
    const cell = cellFrom(event);
    if (!cell || (event.target as HTMLElement).closest("button")) return;
    const columnIndex = Number(cell.dataset.column);
    const slot = Number(cell.dataset.slot);
    if (coveredBy.has(`${columnIndex}:${slot}`)) return;
    // Touch scrolls the calendar; only a mouse or pen drags out a stretch of time.
    if (event.pointerType === "touch") return;
    event.preventDefault();
    setCursor({ column: columnIndex, slot });
    setDrag({ column: columnIndex, from: slot, to: slot });
  };

  const onPointerOver = (event: PointerEvent<HTMLDivElement>) => {
    if (!drag) return;
    const cell = cellFrom(event);
    if (!cell || Number(cell.dataset.column) !== drag.column) return;
    const slot = Number(cell.dataset.slot);
    // A drag stops at the next booking rather than running over it.
    const step = slot >= drag.from ? 1 : -1;
    let reach = drag.from;
    while (reach !== slot && !coveredBy.has(`${drag.column}:${reach + step}`)) reach += step;
    if (reach !== drag.to) setDrag({ ...drag, to: reach });
  };

  useEffect(() => {
    if (!drag) return;
    const finish = () => {
      setDrag(null);
      select(drag.column, drag.from, drag.to);
    };
    window.addEventListener("pointerup", finish);
    return () => window.removeEventListener("pointerup", finish);
  });

  const onClick = (event: MouseEvent<HTMLDivElement>) => {
    // Taps on touch screens, where no drag started.
    if (lastPointer.current !== "touch" || !onSelectSlot) return;
    const cell = (event.target as HTMLElement).closest<HTMLElement>("[data-slot]");
    if (!cell || (event.target as HTMLElement).closest("button")) return;
    activate(Number(cell.dataset.column), Number(cell.dataset.slot));
  };

  const week = view === "week";
  const title = week ? weekTitle(days) : formatDayLong(date);
  const step = week ? 7 : 1;
  const columnBasis = week ? "basis-10" : "basis-28 sm:basis-40";

  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <div className="flex flex-wrap items-center gap-2">
          <div className="flex gap-1">
            <Button variant="secondary" size="sm" onClick={() => onNavigate({ view, date: addDays(date, -step) })}>
              Previous
            </Button>
            <Button variant="secondary" size="sm" onClick={() => onNavigate({ view, date: today })} aria-current={days.includes(today) ? "date" : undefined}>
              Today
            </Button>
            <Button variant="secondary" size="sm" onClick={() => onNavigate({ view, date: addDays(date, step) })}>
              Next
            </Button>
          </div>
          <h2 className="text-base font-semibold" aria-live="polite">
            {title}
          </h2>
        </div>
        <div className="flex flex-wrap items-center gap-3">
          <div role="group" aria-label="View" className="inline-flex rounded-md border border-line-strong bg-card p-0.5">
            {(["day", "week"] as const).map((option) => (
              <button
                key={option}
                type="button"
                aria-pressed={view === option}
                onClick={() => onNavigate({ view: option, date })}
                className={cx(
                  "h-7 rounded px-3 text-sm font-semibold",
                  view === option ? "bg-ink text-paper" : "text-ink hover:bg-paper-deep",
                )}
              >
                {option === "day" ? "Day" : "Week"}
              </button>
            ))}
          </div>
          <label className="flex items-center gap-1.5 text-sm">
            <input type="checkbox" className="size-4 accent-rust" checked={showNight} onChange={(e) => setShowNight(e.target.checked)} />
            Night hours
          </label>
          <label className="flex items-center gap-1.5 text-sm">
            <input type="checkbox" className="size-4 accent-rust" checked={showCancelled} onChange={(e) => setShowCancelled(e.target.checked)} />
            Cancelled
          </label>
        </div>
      </div>

      <Legend />

      {bookings.isError ? <ErrorState error={bookings.error} onRetry={() => void bookings.refetch()} title="The bookings could not be loaded" /> : null}
      {hiddenAtNight > 0 ? (
        <p className="text-sm text-muted">
          {hiddenAtNight === 1 ? "1 booking is" : `${hiddenAtNight} bookings are`} before 08:00.{" "}
          <button type="button" className="font-semibold text-rust-deep underline-offset-2 hover:underline" onClick={() => setShowNight(true)}>
            Show the night hours
          </button>
        </p>
      ) : null}

      <div className="relative max-h-[calc(100dvh-15rem)] min-h-80 overflow-auto rounded-lg border border-line bg-card">
        {bookings.isFetching ? (
          <span className="absolute top-2 right-2 z-50 rounded bg-card/90 px-1.5 py-0.5 text-xs text-muted" role="status">
            <Spinner label="Loading bookings" />
          </span>
        ) : null}
        <div
          ref={gridRef}
          role="grid"
          aria-label="Bookings calendar"
          aria-readonly={onSelectSlot ? undefined : true}
          aria-rowcount={slotCount + (week ? 2 : 1)}
          aria-colcount={columns.length + 1}
          className={cx("min-w-max select-none text-xs", drag && "cursor-ns-resize")}
          onKeyDown={onKeyDown}
          onPointerDown={onPointerDown}
          onPointerOver={onPointerOver}
          onClick={onClick}
        >
          <div role="rowgroup" className="sticky top-0 z-30 border-b border-line-strong bg-card">
            {week ? (
              <div role="row" className="flex">
                <div role="columnheader" className="sticky left-0 z-10 w-14 shrink-0 bg-card" aria-label="Day" />
                {days.map((day) => (
                  <div
                    key={day}
                    role="columnheader"
                    aria-colspan={rooms.length}
                    className={cx("flex shrink-0 grow items-center justify-center border-l border-line-strong py-1", day === today && "bg-rust-wash")}
                    style={{ flexBasis: `${rooms.length * 2.5}rem` }}
                  >
                    <button
                      type="button"
                      className="rounded px-1 font-semibold hover:underline"
                      onClick={() => onNavigate({ view: "day", date: day })}
                      aria-label={`Show ${formatDayLong(day)}`}
                    >
                      {formatDayShort(day)}
                    </button>
                  </div>
                ))}
              </div>
            ) : null}
            <div role="row" className="flex">
              <div role="columnheader" className="sticky left-0 z-10 w-14 shrink-0 bg-card px-1.5 py-1 text-muted">
                Time
              </div>
              {columns.map((col) => (
                <div
                  key={col.index}
                  role="columnheader"
                  className={cx(
                    "flex min-w-0 shrink-0 grow items-center gap-1 border-l py-1",
                    columnBasis,
                    week ? "justify-center px-0.5" : "px-2",
                    week && col.room === rooms[0] ? "border-line-strong" : "border-line",
                  )}
                  title={`${col.room.name}, ${formatDayShort(col.date)}`}
                >
                  <span aria-hidden="true" className="size-2.5 shrink-0 rounded-sm" style={{ backgroundColor: roomColourHex[col.room.colour] }} />
                  <span className={cx("truncate font-semibold", week && "text-[0.6875rem]")}>{week ? shortRoomName(col.room.name) : col.room.name}</span>
                  {week ? <span className="sr-only">{`${col.room.name}, ${formatDayShort(col.date)}`}</span> : null}
                </div>
              ))}
            </div>
          </div>

          <div role="rowgroup">
            {Array.from({ length: slotCount }, (_, i) => {
              const slot = firstSlot + i;
              const minute = slot * slotMinutes;
              const onHour = minute % 60 === 0;
              return (
                <div key={slot} role="row" className="flex" style={{ height: slotHeight }}>
                  <div
                    role="rowheader"
                    className={cx(
                      "sticky left-0 z-20 w-14 shrink-0 bg-card pr-1.5 text-right leading-none tabular-nums text-muted",
                      onHour && "border-t border-line",
                    )}
                  >
                    <span className={onHour ? "relative top-0.5" : "sr-only"}>{minuteToTime(minute)}</span>
                  </div>
                  {columns.map((col) => {
                    const key = `${col.index}:${slot}`;
                    const isCursor = col.index === column && slot === cursorSlot;
                    const dragged = drag && drag.column === col.index && slot >= Math.min(drag.from, drag.to) && slot <= Math.max(drag.from, drag.to);
                    const starting = startingAt.get(key);
                    return (
                      <div
                        key={col.index}
                        role="gridcell"
                        aria-label={cellLabel(col.index, slot)}
                        aria-selected={dragged ? true : undefined}
                        tabIndex={isCursor ? 0 : -1}
                        data-column={col.index}
                        data-slot={slot}
                        onFocus={() => {
                          if (!isCursor) setCursor({ column: col.index, slot });
                        }}
                        className={cx(
                          "relative shrink-0 grow border-l",
                          columnBasis,
                          week && col.room === rooms[0] ? "border-l-line-strong" : "border-l-line",
                          onHour ? "border-t border-t-line" : minute % 30 === 0 ? "border-t border-t-line/50 border-dashed" : "",
                          week && col.date === today && "bg-rust-wash/25",
                          dragged && "bg-rust-wash",
                          onSelectSlot && !coveredBy.has(key) && "hover:bg-paper-deep/70 cursor-cell",
                          "focus-visible:z-[5] focus-visible:outline-offset-[-2px]",
                        )}
                      >
                        {starting?.map((segment) => (
                          <BookingBlock
                            key={segment.booking.id}
                            segment={segment}
                            timeZone={timeZone}
                            slotStartMinute={minute}
                            compact={week}
                            onOpen={() => onOpenBooking(segment.booking.id)}
                          />
                        ))}
                      </div>
                    );
                  })}
                </div>
              );
            })}
          </div>
        </div>
      </div>
      <p className="text-xs text-muted">
        Times are studio time ({timeZone}).{" "}
        {onSelectSlot
          ? "Click or drag across free time to quote a booking. With the keyboard: arrow keys move through the grid, Enter starts a quote, Tab reaches the bookings."
          : "Arrow keys move through the grid; Enter opens a booking."}
      </p>
    </div>
  );
}

function BookingBlock({
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

function Legend() {
  const sample = "#4a5d73";
  const items = [
    { label: "Hold", style: { borderStyle: "dashed", borderWidth: "1.5px", borderColor: sample, backgroundImage: `repeating-linear-gradient(135deg, ${sample}38 0 3px, transparent 3px 6px)` } },
    { label: "2nd hold", style: { borderStyle: "dotted", borderWidth: "1.5px", borderColor: sample, backgroundImage: `repeating-linear-gradient(135deg, ${sample}38 0 3px, transparent 3px 6px)` } },
    { label: "Confirmed", style: { borderStyle: "solid", borderWidth: "1px 1px 1px 4px", borderColor: sample, backgroundColor: `${sample}33` } },
    { label: "In session", style: { borderStyle: "solid", borderWidth: "1px 1px 1px 4px", borderColor: sample, backgroundColor: `${sample}6b` } },
    { label: "Wrapped", style: { borderStyle: "solid", borderWidth: "1px 1px 1px 4px", borderColor: `${sample}80`, backgroundColor: `${sample}14` } },
  ] as const;
  return (
    <ul aria-label="Key" className="flex flex-wrap gap-x-4 gap-y-1 text-xs text-muted">
      {items.map((item) => (
        <li key={item.label} className="flex items-center gap-1.5">
          <span aria-hidden="true" className="inline-block h-3 w-5 rounded-[2px]" style={item.style} />
          {item.label}
        </li>
      ))}
    </ul>
  );
}

/** "Room A" → "A" for the narrow week columns; other names keep their first word. */
function shortRoomName(name: string): string {
  const match = /^room\s+(.+)$/i.exec(name);
  return match?.[1] ?? name.split(/\s+/)[0] ?? name;
}

function weekTitle(days: string[]): string {
  const first = days[0];
  const last = days[days.length - 1];
  if (!first || !last) return "";
  return `${formatDayShort(first)} – ${formatDayShort(last)} ${last.slice(0, 4)}`;
}
