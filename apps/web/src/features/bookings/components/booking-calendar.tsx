import { useMemo, useState } from "react";
import { roomColourHex } from "@takeup/domain";
import { ErrorState } from "../../../components/ui/states.tsx";
import { Spinner } from "../../../components/ui/spinner.tsx";
import { cx } from "../../../lib/cx.ts";
import { addDays, formatDayLong, formatDayShort, minuteToTime, startOfStudioWeek, studioDaysRange, studioToday } from "../../../lib/studio-time.ts";
import { useBookings } from "../api/get-bookings.ts";
import { BookingBlock, slotHeight } from "./booking-block.tsx";
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
import { CalendarToolbar, Legend, type CalendarView } from "./calendar-toolbar.tsx";
import { useDragSelection } from "./use-drag-selection.ts";
import { useGridCursor } from "./use-grid-cursor.ts";

export type { CalendarView } from "./calendar-toolbar.tsx";

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

const defaultLengthMinutes = 60;

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

  const cellLabel = (columnIndex: number, slot: number) => {
    const col = columns[columnIndex];
    return col ? `${col.room.name} ${formatDayShort(col.date)} ${minuteToTime(slot * slotMinutes)}` : "";
  };

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

  const { gridRef, column, slot: cursorSlot, setCursor, onKeyDown } = useGridCursor({ columnCount: columns.length, firstSlot, activate });
  const { drag, inDrag, onPointerDown, onPointerOver, onClick } = useDragSelection({
    enabled: onSelectSlot !== undefined,
    isCovered: (columnIndex, slot) => coveredBy.has(`${columnIndex}:${slot}`),
    select,
    activate,
    setCursor,
  });

  const week = view === "week";
  const columnBasis = week ? "basis-10" : "basis-28 sm:basis-40";

  return (
    <div className="flex flex-col gap-3">
      <CalendarToolbar
        view={view}
        date={date}
        days={days}
        today={today}
        onNavigate={onNavigate}
        showNight={showNight}
        onShowNight={setShowNight}
        showCancelled={showCancelled}
        onShowCancelled={setShowCancelled}
      />

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
                    const dragged = inDrag(col.index, slot);
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

/** "Room A" → "A" for the narrow week columns; other names keep their first word. */
function shortRoomName(name: string): string {
  const match = /^room\s+(.+)$/i.exec(name);
  return match?.[1] ?? name.split(/\s+/)[0] ?? name;
}
