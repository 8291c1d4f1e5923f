import { useMemo } from "react";
import type { TimeEntryDto } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { DataTable, type ColumnDef } from "../../../components/ui/data-table.tsx";
import { formatDayShort, formatStudioDayTime, formatStudioTime, formatTimeRange, studioParts } from "../../../lib/studio-time.ts";
import { breakMinutes, formatWorked } from "./durations.ts";
import { EntryFlags, flagLabels } from "../../../components/ui/entry-flags.tsx";

type TimesheetTableProps = {
  entries: TimeEntryDto[];
  timeZone: string;
  /** Leave out for a read-only timesheet. */
  onCorrect?: (entry: TimeEntryDto) => void;
  emptyMessage?: string;
};

export const sourceLabels: Record<TimeEntryDto["source"], string> = { clock: "Clock", manual: "Correction" };

export const entrySession = (entry: TimeEntryDto) => (entry.booking ? `${entry.booking.clientName} — ${entry.booking.roomName}` : "Shop time");

/** "Mon 7 Dec 09:58–18:30", to name an entry in a button or a message. */
export const entryName = (entry: TimeEntryDto, timeZone: string) =>
  entry.endedAt
    ? formatTimeRange(entry.startedAt, entry.endedAt, timeZone, { withDay: true })
    : `${formatStudioDayTime(entry.startedAt, timeZone)}, still open`;

export function TimesheetTable({ entries, timeZone, onCorrect, emptyMessage = "No time on the clock this week." }: TimesheetTableProps) {
  const columns = useMemo<ColumnDef<TimeEntryDto>[]>(() => {
    const day = (iso: string) => studioParts(iso, timeZone).date;
    const list: ColumnDef<TimeEntryDto>[] = [
      { id: "date", header: "Date", accessorFn: (e) => e.startedAt, cell: ({ row }) => <span className="font-medium">{formatDayShort(day(row.original.startedAt))}</span> },
      { id: "in", header: "In", accessorFn: (e) => formatStudioTime(e.startedAt, timeZone), enableSorting: false },
      {
        id: "out",
        header: "Out",
        enableSorting: false,
        accessorFn: (e) => (e.endedAt === null ? "" : day(e.endedAt) === day(e.startedAt) ? formatStudioTime(e.endedAt, timeZone) : formatStudioDayTime(e.endedAt, timeZone)),
        cell: ({ getValue }) => (getValue<string>() === "" ? <span className="text-muted">Still in</span> : getValue<string>()),
      },
      {
        id: "breaks",
        header: "Breaks",
        enableSorting: false,
        accessorFn: (e) => (e.breaks.length === 0 ? "—" : formatWorked(breakMinutes(e.breaks))),
      },
      {
        id: "worked",
        header: "Worked",
        accessorFn: (e) => e.workedMinutes ?? -1,
        cell: ({ row }) => (row.original.workedMinutes === null ? <span className="text-muted">Running</span> : formatWorked(row.original.workedMinutes)),
      },
      {
        id: "session",
        header: "Session",
        accessorFn: entrySession,
        cell: ({ row }) => <span className="block max-w-44 min-w-32 whitespace-normal">{entrySession(row.original)}</span>,
      },
      // Which of the person's pay rates the entry is paid at (engineer, assistant …).
      { id: "rate", header: "Paid as", accessorFn: (e) => e.payRateCode },
      { id: "source", header: "Source", accessorFn: (e) => sourceLabels[e.source] },
      {
        id: "flags",
        header: "Flags",
        enableSorting: false,
        accessorFn: (e) => e.flags.map((f) => flagLabels[f]).join(" "),
        cell: ({ row }) => (
          <div className="max-w-36 whitespace-normal">
            <EntryFlags flags={row.original.flags} />
          </div>
        ),
      },
    ];
    if (onCorrect) {
      list.push({
        id: "actions",
        header: () => <span className="sr-only">Actions</span>,
        enableSorting: false,
        cell: ({ row }) => {
          const entry = row.original;
          return <CorrectAction entry={entry} timeZone={timeZone} onCorrect={onCorrect} />;
        },
      });
    }
    return list;
  }, [timeZone, onCorrect]);

  return (
    <DataTable
      label="Time entries"
      data={entries}
      columns={columns}
      getRowId={(e) => String(e.id)}
      initialSorting={[{ id: "date", desc: false }]}
      emptyMessage={emptyMessage}
      pageSize={50}
      hideFilter
    />
  );
}

/** The row's way to a correction: not while the entry is open, nor while one already waits. */
function CorrectAction({ entry, timeZone, onCorrect }: { entry: TimeEntryDto; timeZone: string; onCorrect: (entry: TimeEntryDto) => void }) {
  if (entry.endedAt === null) return <span className="text-xs text-muted">Clock out first</span>;
  if (entry.flags.includes("pending_edit")) return <span className="text-xs text-muted">Waiting for a decision</span>;
  return (
    <Button variant="secondary" size="sm" onClick={() => onCorrect(entry)} aria-label={`Ask for a correction to ${entryName(entry, timeZone)}`}>
      Ask for a correction
    </Button>
  );
}

/** The same entries as cards, for a phone: everything in a row fits the width, the button included. */
export function TimesheetCards({ entries, timeZone, onCorrect, emptyMessage = "No time on the clock this week." }: TimesheetTableProps) {
  if (entries.length === 0) return <p className="rounded-lg border border-line bg-card px-4 py-8 text-center text-sm text-muted">{emptyMessage}</p>;
  const sorted = [...entries].sort((a, b) => a.startedAt.localeCompare(b.startedAt));
  return (
    <ul aria-label="Time entries" className="divide-y divide-line rounded-lg border border-line bg-card">
      {sorted.map((entry) => {
        const breaks = breakMinutes(entry.breaks);
        return (
          <li key={entry.id} className="flex flex-col gap-1.5 px-4 py-3">
            <div className="flex items-baseline justify-between gap-3">
              <p className="font-semibold">{formatDayShort(studioParts(entry.startedAt, timeZone).date)}</p>
              <p className="font-semibold tabular-nums">{entry.workedMinutes === null ? "Running" : formatWorked(entry.workedMinutes)}</p>
            </div>
            <p className="text-sm tabular-nums">
              {entry.endedAt ? formatTimeRange(entry.startedAt, entry.endedAt, timeZone) : `In at ${formatStudioTime(entry.startedAt, timeZone)}, still clocked in`}
              {breaks > 0 ? ` · break ${formatWorked(breaks)}` : ""}
            </p>
            <p className="text-sm text-muted">
              {entrySession(entry)} · paid as {entry.payRateCode} · {sourceLabels[entry.source]}
            </p>
            <EntryFlags flags={entry.flags} />
            {onCorrect ? (
              <div className="pt-1">
                <CorrectAction entry={entry} timeZone={timeZone} onCorrect={onCorrect} />
              </div>
            ) : null}
          </li>
        );
      })}
    </ul>
  );
}
