import type { ReactNode } from "react";
import type { TimeEntryEditDto } from "@takeup/domain";
import { cx } from "../../../lib/cx.ts";
import { formatDayShort, formatStudioDayTime, formatStudioTime, studioParts } from "../../../lib/studio-time.ts";
import { formatWorked } from "./durations.ts";

type Span = { startedAt: string; endedAt: string | null };

/** The studio day a correction is about: the day its proposed start falls on. */
export const editDay = (edit: Pick<TimeEntryEditDto, "proposed">, timeZone: string) => studioParts(edit.proposed.startedAt, timeZone).date;

const minutesOf = (span: Span, breaks: readonly Span[]) => {
  if (!span.endedAt) return null;
  const breakMs = breaks.reduce((sum, b) => sum + (b.endedAt ? Date.parse(b.endedAt) - Date.parse(b.startedAt) : 0), 0);
  return Math.round((Date.parse(span.endedAt) - Date.parse(span.startedAt) - breakMs) / 60_000);
};

/** "+28 min", "−1 h 5 min" */
const signed = (minutes: number) => `${minutes > 0 ? "+" : "−"}${formatWorked(Math.abs(minutes))}`;

/**
 * What a correction changes, line by line in studio time: each changed value as
 * "current → proposed" in bold, unchanged ones quiet, and the worked time's difference.
 */
export function EditChange({ edit, timeZone }: { edit: Pick<TimeEntryEditDto, "proposed" | "current">; timeZone: string }) {
  const day = editDay(edit, timeZone);
  // Times on the day of the entry read as 09:30; anything on another day says its day.
  const at = (iso: string | null) => {
    if (!iso) return "still open";
    return studioParts(iso, timeZone).date === day ? formatStudioTime(iso, timeZone) : formatStudioDayTime(iso, timeZone);
  };
  const breaksText = (breaks: readonly Span[]) =>
    breaks.length === 0 ? "none" : breaks.map((b) => `${at(b.startedAt)}–${b.endedAt ? at(b.endedAt) : "still on"}`).join(", ");

  const { proposed, current } = edit;
  const proposedWorked = minutesOf(proposed, proposed.breaks);

  if (!current) {
    return (
      <div className="flex flex-col gap-0.5 text-sm">
        <p className="font-semibold">New entry on {formatDayShort(day)}</p>
        <Line label="In" to={at(proposed.startedAt)} />
        <Line label="Out" to={at(proposed.endedAt)} />
        <Line label="Breaks" to={breaksText(proposed.breaks)} />
        <Line label="Worked" to={proposedWorked === null ? "—" : formatWorked(proposedWorked)} />
      </div>
    );
  }

  const currentWorked = minutesOf(current, current.breaks);
  const difference = proposedWorked !== null && currentWorked !== null ? proposedWorked - currentWorked : null;
  return (
    <div className="flex flex-col gap-0.5 text-sm">
      <Line label="In" from={at(current.startedAt)} to={at(proposed.startedAt)} />
      <Line label="Out" from={at(current.endedAt)} to={at(proposed.endedAt)} />
      <Line label="Breaks" from={breaksText(current.breaks)} to={breaksText(proposed.breaks)} />
      <Line
        label="Worked"
        from={currentWorked === null ? "—" : formatWorked(currentWorked)}
        to={proposedWorked === null ? "—" : formatWorked(proposedWorked)}
        extra={difference ? <span className="font-semibold text-rust-deep">({signed(difference)})</span> : null}
      />
    </div>
  );
}

type LineProps = { label: string; from?: string; to: string; extra?: ReactNode };

function Line({ label, from, to, extra }: LineProps) {
  const changed = from !== undefined && from !== to;
  return (
    <p className={cx("flex flex-wrap items-baseline gap-x-1.5", from !== undefined && !changed && "text-muted")}>
      <span className="w-16 shrink-0 text-xs font-semibold tracking-wide text-muted uppercase">{label}</span>
      {changed ? (
        <span className="whitespace-nowrap">
          <del className="text-muted decoration-1">{from}</del>
          <span aria-hidden="true"> → </span>
          <span className="sr-only">changes to</span>
          <ins className="font-semibold text-ink no-underline">{to}</ins>
        </span>
      ) : (
        <span>
          {to}
          {from !== undefined ? <span className="sr-only"> (no change)</span> : null}
        </span>
      )}
      {extra ? <span className="whitespace-nowrap">{extra}</span> : null}
    </p>
  );
}
