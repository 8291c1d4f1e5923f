import { useRef, useState, type KeyboardEvent, type RefObject } from "react";
import { slotsPerDay } from "./calendar-layout.ts";

export type Cursor = { column: number; slot: number };

/**
 * The keyboard's place in the calendar grid: one cell is in the tab order at a time (roving
 * tabindex); arrow keys, Page Up/Down and Home/End move it, Enter or Space activates the cell.
 */
export function useGridCursor({
  columnCount,
  firstSlot,
  activate,
}: {
  columnCount: number;
  /** The first slot shown (night hours may be hidden). */
  firstSlot: number;
  activate: (column: number, slot: number) => void;
}) {
  const [cursor, setCursor] = useState<Cursor>(() => ({ column: 0, slot: 10 * 4 }));
  const gridRef: RefObject<HTMLDivElement | null> = useRef<HTMLDivElement>(null);
  const column = Math.min(cursor.column, Math.max(columnCount - 1, 0));
  const slot = Math.max(cursor.slot, firstSlot);

  // Every cell is focusable from script; focusing one makes it the cursor (see the cell's onFocus).
  const focusCell = (next: Cursor) => {
    setCursor(next);
    gridRef.current?.querySelector<HTMLElement>(`[data-column="${next.column}"][data-slot="${next.slot}"]`)?.focus();
  };

  const onKeyDown = (event: KeyboardEvent<HTMLDivElement>) => {
    const cell = (event.target as HTMLElement).closest<HTMLElement>("[data-slot]");
    if (!cell || cell !== event.target) return;
    const current = { column: Number(cell.dataset.column), slot: Number(cell.dataset.slot) };
    const lastColumn = columnCount - 1;
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

  return { gridRef, column, slot, setCursor, onKeyDown };
}
