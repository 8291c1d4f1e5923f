import { Button } from "../../../components/ui/button.tsx";
import { cx } from "../../../lib/cx.ts";
import { addDays, formatDayLong, formatDayShort } from "../../../lib/studio-time.ts";

export type CalendarView = "day" | "week";

type CalendarToolbarProps = {
  view: CalendarView;
  /** The day the calendar is on, and the days it shows. */
  date: string;
  days: string[];
  today: string;
  onNavigate: (next: { view: CalendarView; date: string }) => void;
  showNight: boolean;
  onShowNight: (show: boolean) => void;
  showCancelled: boolean;
  onShowCancelled: (show: boolean) => void;
};

/** Previous, Today and Next, the title, day or week, and what the grid shows. */
export function CalendarToolbar({ view, date, days, today, onNavigate, showNight, onShowNight, showCancelled, onShowCancelled }: CalendarToolbarProps) {
  const week = view === "week";
  const title = week ? weekTitle(days) : formatDayLong(date);
  const step = week ? 7 : 1;
  return (
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
          <input type="checkbox" className="size-4 accent-rust" checked={showNight} onChange={(e) => onShowNight(e.target.checked)} />
          Night hours
        </label>
        <label className="flex items-center gap-1.5 text-sm">
          <input type="checkbox" className="size-4 accent-rust" checked={showCancelled} onChange={(e) => onShowCancelled(e.target.checked)} />
          Cancelled
        </label>
      </div>
    </div>
  );
}

/** How each state is drawn. */
export function Legend() {
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

function weekTitle(days: string[]): string {
  const first = days[0];
  const last = days[days.length - 1];
  if (!first || !last) return "";
  return `${formatDayShort(first)} – ${formatDayShort(last)} ${last.slice(0, 4)}`;
}
