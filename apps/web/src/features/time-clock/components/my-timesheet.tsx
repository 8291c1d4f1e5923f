import { useCallback, useState } from "react";
import { useSearchParams } from "react-router";
import type { TimeEntryDto } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { addDays, formatDayShort, startOfStudioWeek, studioToday } from "../../../lib/studio-time.ts";
import { useTimeEntries } from "../api/get-time-entries.ts";
import { CorrectionDialog } from "./correction-dialog.tsx";
import { formatWorked } from "./durations.ts";
import { MyCorrections } from "./my-corrections.tsx";
import { TimesheetCards, TimesheetTable } from "./timesheet-table.tsx";
import { useWideScreen } from "./use-wide-screen.ts";

type MyTimesheetProps = { staffUserId: string; timeZone: string; workweekStartDay: number };

const isoDate = /^\d{4}-\d{2}-\d{2}$/;

/** "Mon 7 Dec – Sun 13 Dec 2026" */
export const formatWeek = (start: string) => `${formatDayShort(start)} – ${formatDayShort(addDays(start, 6))} ${addDays(start, 6).slice(0, 4)}`;

/** One studio workweek of the person's own time, with corrections asked from each row. */
export function MyTimesheet({ staffUserId, timeZone, workweekStartDay }: MyTimesheetProps) {
  const [search, setSearch] = useSearchParams();
  const thisWeek = startOfStudioWeek(studioToday(timeZone), workweekStartDay);
  const asked = search.get("week");
  // Any date in the address is snapped to the start of its workweek.
  const week = asked && isoDate.test(asked) ? startOfStudioWeek(asked, workweekStartDay) : thisWeek;
  const goTo = (start: string) => setSearch(start === thisWeek ? {} : { week: start });

  const entries = useTimeEntries({ from: week, to: addDays(week, 6), staffUserId });
  const wide = useWideScreen();
  const [dialog, setDialog] = useState<{ entry?: TimeEntryDto } | null>(null);
  const onCorrect = useCallback((entry: TimeEntryDto) => setDialog({ entry }), []);
  const worked = (entries.data ?? []).reduce((sum, e) => sum + (e.workedMinutes ?? 0), 0);

  return (
    <div className="flex flex-col gap-8">
      <section aria-labelledby="timesheet-week" className="flex flex-col gap-4">
        <div className="flex flex-col gap-3 md:flex-row md:items-center md:justify-between">
          <h2 id="timesheet-week" className="text-lg font-semibold">
            Week of {formatWeek(week)}
          </h2>
          <div className="flex flex-wrap gap-2">
            <Button variant="secondary" onClick={() => goTo(addDays(week, -7))}>
              Previous week
            </Button>
            {week !== thisWeek ? (
              <Button variant="secondary" onClick={() => goTo(thisWeek)}>
                This week
              </Button>
            ) : null}
            <Button variant="secondary" onClick={() => goTo(addDays(week, 7))} disabled={week >= thisWeek}>
              Next week
            </Button>
          </div>
        </div>
        <div className="flex flex-col gap-3 sm:flex-row sm:items-center sm:justify-between">
          <p className="text-sm text-muted">
            {entries.isSuccess ? `Worked ${formatWorked(worked)} in closed entries. ` : ""}Times are studio time ({timeZone}).
          </p>
          <Button onClick={() => setDialog({})} className="self-start sm:self-auto">
            Add missing time
          </Button>
        </div>
        {entries.isPending ? (
          <LoadingState label="Loading your time…" />
        ) : entries.isError ? (
          <ErrorState error={entries.error} onRetry={() => void entries.refetch()} />
        ) : (
          wide ? (
            <TimesheetTable entries={entries.data} timeZone={timeZone} onCorrect={onCorrect} />
          ) : (
            <TimesheetCards entries={entries.data} timeZone={timeZone} onCorrect={onCorrect} />
          )
        )}
      </section>
      <section aria-labelledby="my-corrections" className="flex flex-col gap-3">
        <div>
          <h2 id="my-corrections" className="text-lg font-semibold">
            My corrections
          </h2>
          <p className="text-sm text-muted">Each waits for the studio manager or the owner; approved ones change the timesheet.</p>
        </div>
        <MyCorrections staffUserId={staffUserId} timeZone={timeZone} />
      </section>
      {dialog ? <CorrectionDialog open onClose={() => setDialog(null)} entry={dialog.entry} staffUserId={staffUserId} timeZone={timeZone} /> : null}
    </div>
  );
}
