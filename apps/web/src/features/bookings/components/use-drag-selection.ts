import { useEffect, useRef, useState, type MouseEvent, type PointerEvent } from "react";
import type { Cursor } from "./use-grid-cursor.ts";

export type Drag = { column: number; from: number; to: number };

/**
 * Picking free time with a mouse or pen: press on an empty cell, drag down or up (stopping at
 * the next booking), let go to select the stretch. Touch scrolls instead, and a tap activates.
 */
export function useDragSelection({
  enabled,
  isCovered,
  select,
  activate,
  setCursor,
}: {
  /** False on a read-only calendar. */
  enabled: boolean;
  /** Whether a booking lies over the cell. */
  isCovered: (column: number, slot: number) => boolean;
  select: (column: number, fromSlot: number, toSlot: number) => void;
  activate: (column: number, slot: number) => void;
  setCursor: (cursor: Cursor) => void;
}) {
  const [drag, setDrag] = useState<Drag | null>(null);
  const lastPointer = useRef<string>("mouse");

  const cellFrom = (event: PointerEvent<HTMLDivElement>) => (event.target as HTMLElement).closest<HTMLElement>("[data-slot]");

  const onPointerDown = (event: PointerEvent<HTMLDivElement>) => {
    lastPointer.current = event.pointerType;
    if (!enabled || event.button !== 0) return;
    const cell = cellFrom(event);
    if (!cell || (event.target as HTMLElement).closest("button")) return;
    const columnIndex = Number(cell.dataset.column);
    const slot = Number(cell.dataset.slot);
    if (isCovered(columnIndex, slot)) return;
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
    while (reach !== slot && !isCovered(drag.column, reach + step)) reach += step;
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
    if (lastPointer.current !== "touch" || !enabled) return;
    const cell = (event.target as HTMLElement).closest<HTMLElement>("[data-slot]");
    if (!cell || (event.target as HTMLElement).closest("button")) return;
    activate(Number(cell.dataset.column), Number(cell.dataset.slot));
  };

  /** Whether the cell lies in the stretch being dragged out. */
  const inDrag = (column: number, slot: number) => drag !== null && drag.column === column && slot >= Math.min(drag.from, drag.to) && slot <= Math.max(drag.from, drag.to);

  return { drag, inDrag, onPointerDown, onPointerOver, onClick };
}
