import type { TimeClockDto } from "@takeup/domain";
import { cx } from "../../../lib/cx.ts";
import { formatDayShort, studioToday } from "../../../lib/studio-time.ts";
import { formatWorked } from "./durations.ts";

type Week = TimeClockDto["week"];

/** The workweek so far, day by day, with a bar per day and the week's total. */
export function WeekSoFar({ week, timeZone }: { week: Week; timeZone: string }) {
  const today = studioToday(timeZone);
  // Bars share one scale: a ten-hour day fills most of it, a longer day stretches it.
  const scale = Math.max(600, ...week.days.map((d) => d.workedMinutes));
  return (
    <section aria-labelledby="week-so-far" className="min-w-0 rounded-lg border border-line bg-card">
      <div className="border-b border-line px-4 py-3">
        <h2 id="week-so-far" className="font-semibold">
          This week
        </h2>
        <p className="text-sm text-muted">Workweek from {formatDayShort(week.workweekStart)}</p>
      </div>
      <table className="w-full border-collapse text-sm tabular-nums">
        <caption className="sr-only">Hours worked each day this week</caption>
        <thead className="sr-only">
          <tr>
            <th scope="col">Day</th>
            <th scope="col">Worked</th>
          </tr>
        </thead>
        <tbody>
          {week.days.map((day) => (
            <tr key={day.date} className={cx("border-b border-line last:border-b-0", day.date === today && "bg-rust-wash/40")}>
              <th scope="row" className="w-28 px-4 py-2 text-left font-medium whitespace-nowrap">
                {formatDayShort(day.date)}
                {day.date === today ? <span className="sr-only"> (today)</span> : null}
              </th>
              <td className="px-4 py-2">
                <div className="flex items-center gap-3">
                  <span aria-hidden="true" className="h-2.5 min-w-0 flex-1 overflow-hidden rounded-full bg-paper-deep">
                    <span className="block h-full rounded-full bg-rust" style={{ width: `${Math.round((day.workedMinutes / scale) * 100)}%` }} />
                  </span>
                  <span className={cx("w-24 shrink-0 text-right whitespace-nowrap", day.workedMinutes === 0 && "text-muted")}>
                    {day.workedMinutes === 0 ? "—" : formatWorked(day.workedMinutes)}
                  </span>
                </div>
              </td>
            </tr>
          ))}
        </tbody>
        <tfoot>
          <tr className="border-t-2 border-line-strong">
            <th scope="row" className="px-4 py-2.5 text-left font-semibold">
              Week total
            </th>
            <td className="px-4 py-2.5 text-right text-base font-semibold whitespace-nowrap">{formatWorked(week.workedMinutes)}</td>
          </tr>
        </tfoot>
      </table>
    </section>
  );
}
