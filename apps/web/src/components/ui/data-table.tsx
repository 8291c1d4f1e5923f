import { Fragment, useId, useState, type ReactNode } from "react";
import {
  flexRender,
  getCoreRowModel,
  getExpandedRowModel,
  getFilteredRowModel,
  getPaginationRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type SortingState,
} from "@tanstack/react-table";
import { cx } from "../../lib/cx.ts";
import { Button } from "./button.tsx";

export type { ColumnDef } from "@tanstack/react-table";

type DataTableProps<T> = {
  /** Names the table for screen readers, e.g. "Team members". */
  label: string;
  data: T[];
  columns: ColumnDef<T>[];
  getRowId?: (row: T) => string;
  filterLabel?: string;
  pageSize?: number;
  initialSorting?: SortingState;
  emptyMessage?: string;
  /** Extra content under a row, shown when the row is expanded (row.toggleExpanded()). */
  renderSubRow?: (row: T) => ReactNode;
  /** Opens a row on a mouse click anywhere in it; keep a button or link in the row for the keyboard. */
  onRowClick?: (row: T) => void;
  /** Hides the filter box when the screen has filters of its own. */
  hideFilter?: boolean;
};

const sortNames = { asc: "ascending", desc: "descending" } as const;

export function DataTable<T>({
  label,
  data,
  columns,
  getRowId,
  filterLabel = "Filter",
  pageSize = 25,
  initialSorting = [],
  emptyMessage = "Nothing here yet.",
  renderSubRow,
  onRowClick,
  hideFilter = false,
}: DataTableProps<T>) {
  const [sorting, setSorting] = useState<SortingState>(initialSorting);
  const [globalFilter, setGlobalFilter] = useState("");
  const filterId = useId();
  const table = useReactTable({
    data,
    columns,
    getRowId: getRowId ? (row) => getRowId(row) : undefined,
    state: { sorting, globalFilter },
    onSortingChange: setSorting,
    onGlobalFilterChange: setGlobalFilter,
    // The default only filters columns whose first value is text; a blank first cell would hide a column from the filter.
    getColumnCanGlobalFilter: () => true,
    globalFilterFn: (row, columnId, filter: string) =>
      String(row.getValue(columnId) ?? "").toLowerCase().includes(filter.trim().toLowerCase()),
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getPaginationRowModel: getPaginationRowModel(),
    getExpandedRowModel: getExpandedRowModel(),
    getRowCanExpand: () => renderSubRow !== undefined,
    initialState: { pagination: { pageIndex: 0, pageSize } },
  });

  const rows = table.getRowModel().rows;
  const filteredCount = table.getFilteredRowModel().rows.length;
  const { pageIndex } = table.getState().pagination;
  const from = filteredCount === 0 ? 0 : pageIndex * pageSize + 1;
  const to = Math.min(filteredCount, (pageIndex + 1) * pageSize);
  const columnCount = table.getVisibleLeafColumns().length;

  return (
    <div className="flex flex-col gap-3">
      {hideFilter ? null : (
        <div className="flex flex-wrap items-center gap-2">
          <label htmlFor={filterId} className="text-sm font-semibold">
            {filterLabel}
          </label>
          <input
            id={filterId}
            type="search"
            value={globalFilter}
            onChange={(event) => setGlobalFilter(event.target.value)}
            placeholder="Type to narrow the list"
            className="h-8 w-full max-w-xs rounded-md border border-line-strong bg-card px-2.5 text-sm placeholder:text-muted/70 focus-visible:border-rust"
          />
        </div>
      )}
      {/* relative: screen-reader-only text inside the table must not escape the scrolling box and widen the page. */}
      <div className="relative overflow-x-auto rounded-lg border border-line bg-card">
        <table aria-label={label} className="w-full border-collapse text-left text-sm tabular-nums">
          <thead className="border-b border-line bg-paper-deep/60 text-xs text-muted">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  const title = flexRender(header.column.columnDef.header, header.getContext());
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      aria-sort={sorted ? sortNames[sorted] : undefined}
                      className="px-3 py-2 font-semibold whitespace-nowrap"
                    >
                      {header.column.getCanSort() ? (
                        <button
                          type="button"
                          onClick={header.column.getToggleSortingHandler()}
                          className="-mx-1 inline-flex items-center gap-1 rounded px-1 hover:text-ink"
                        >
                          {title}
                          <SortMark direction={sorted} />
                        </button>
                      ) : (
                        title
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {rows.length === 0 ? (
              <tr>
                <td colSpan={columnCount} className="px-3 py-8 text-center text-muted">
                  {globalFilter ? `Nothing matches “${globalFilter}”.` : emptyMessage}
                </td>
              </tr>
            ) : (
              rows.map((row) => (
                <Fragment key={row.id}>
                  <tr
                    className={cx("border-b border-line last:border-b-0 hover:bg-paper/60", onRowClick && "cursor-pointer")}
                    onClick={
                      onRowClick
                        ? (event) => {
                            // A click on a control in the row does its own thing.
                            if ((event.target as HTMLElement).closest("button, a, input, select, textarea")) return;
                            onRowClick(row.original);
                          }
                        : undefined
                    }
                  >
                    {row.getVisibleCells().map((cell) => (
                      <td key={cell.id} className="px-3 py-1.5 align-middle whitespace-nowrap">
                        {flexRender(cell.column.columnDef.cell, cell.getContext())}
                      </td>
                    ))}
                  </tr>
                  {renderSubRow && row.getIsExpanded() ? (
                    <tr className="border-b border-line bg-paper/50 last:border-b-0">
                      <td colSpan={columnCount} className="px-3 py-3">
                        {renderSubRow(row.original)}
                      </td>
                    </tr>
                  ) : null}
                </Fragment>
              ))
            )}
          </tbody>
        </table>
      </div>
      <div className="flex flex-wrap items-center justify-between gap-2 text-sm text-muted">
        <p>{filteredCount === 0 ? "No rows" : `Showing ${from}–${to} of ${filteredCount}`}</p>
        {table.getPageCount() > 1 ? (
          <div className="flex items-center gap-2">
            <Button variant="secondary" size="sm" onClick={() => table.previousPage()} disabled={!table.getCanPreviousPage()}>
              Previous
            </Button>
            <span>
              Page {pageIndex + 1} of {table.getPageCount()}
            </span>
            <Button variant="secondary" size="sm" onClick={() => table.nextPage()} disabled={!table.getCanNextPage()}>
              Next
            </Button>
          </div>
        ) : null}
      </div>
    </div>
  );
}

function SortMark({ direction }: { direction: false | "asc" | "desc" }) {
  return (
    <svg viewBox="0 0 10 12" className={cx("h-3 w-2.5", direction ? "text-rust" : "opacity-40")} aria-hidden="true">
      <path d="M5 1l3 4H2z" fill="currentColor" opacity={direction === "desc" ? 0.3 : 1} />
      <path d="M5 11L2 7h6z" fill="currentColor" opacity={direction === "asc" ? 0.3 : 1} />
    </svg>
  );
}
