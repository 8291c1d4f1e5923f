import type { TimeEntryEditDto } from "@takeup/domain";
import { EmptyState, ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { formatDayShort, formatStudioDayTime } from "../../../lib/studio-time.ts";
import { useTimeEntryEdits } from "../api/get-time-entry-edits.ts";
import { EditChange, editDay } from "./edit-change.tsx";
import { EditStatusBadge } from "./edit-status.tsx";

/** The corrections this person asked for, newest first, with each decision and its note. */
export function MyCorrections({ staffUserId, timeZone }: { staffUserId: string; timeZone: string }) {
  const edits = useTimeEntryEdits();
  if (edits.isPending) return <LoadingState label="Loading your corrections…" />;
  if (edits.isError) return <ErrorState error={edits.error} onRetry={() => void edits.refetch()} />;
  // Owner and manager get everyone's corrections from the API; this list is one's own.
  const mine = edits.data.filter((e) => e.staffUserId === staffUserId);
  if (mine.length === 0) return <EmptyState title="No corrections asked for yet.">When a time is wrong, ask for a correction from its row above.</EmptyState>;
  return (
    <ul className="divide-y divide-line rounded-lg border border-line bg-card">
      {mine.map((edit) => (
        <CorrectionItem key={edit.id} edit={edit} timeZone={timeZone} />
      ))}
    </ul>
  );
}

function CorrectionItem({ edit, timeZone }: { edit: TimeEntryEditDto; timeZone: string }) {
  const title = `${edit.current ? "Correction" : "Missing time"} for ${formatDayShort(editDay(edit, timeZone))}`;
  return (
    <li className="flex flex-col gap-2 px-4 py-3 sm:flex-row sm:items-start sm:justify-between sm:gap-6">
      <div className="min-w-0">
        <p className="flex flex-wrap items-center gap-2 font-semibold">
          {title}
          <EditStatusBadge status={edit.status} />
        </p>
        <p className="mt-0.5 text-sm break-words text-muted">“{edit.reason}”</p>
        {edit.status !== "pending" ? (
          <p className="mt-1 text-sm">
            {edit.status === "approved" ? "Approved" : "Rejected"}
            {edit.decidedByName ? ` by ${edit.decidedByName}` : ""}
            {edit.decidedAt ? ` on ${formatStudioDayTime(edit.decidedAt, timeZone)}` : ""}
            {edit.decisionNote ? <span className="block break-words text-muted">Note: “{edit.decisionNote}”</span> : null}
          </p>
        ) : (
          <p className="mt-1 text-sm text-muted">Asked on {formatStudioDayTime(edit.createdAt, timeZone)}; waiting for a manager.</p>
        )}
      </div>
      <div className="shrink-0">
        <EditChange edit={edit} timeZone={timeZone} />
      </div>
    </li>
  );
}
