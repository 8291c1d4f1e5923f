import { useMemo, useState, type ReactNode } from "react";
import type { TimeEntryEditDto } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { DataTable, type ColumnDef } from "../../../components/ui/data-table.tsx";
import { Dialog, DialogActions } from "../../../components/ui/dialog.tsx";
import { FormField } from "../../../components/ui/form-field.tsx";
import { EmptyState, ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { Textarea } from "../../../components/ui/textarea.tsx";
import { useToast } from "../../../components/ui/use-toast.ts";
import { errorMessage } from "../../../lib/api-client.ts";
import { formatDayShort, formatStudioDayTime } from "../../../lib/studio-time.ts";
import { useApproveEdit } from "../api/approve-edit.ts";
import { useTimeEntryEdits } from "../api/get-time-entry-edits.ts";
import { useRejectEdit } from "../api/reject-edit.ts";
import { EditChange, editDay } from "./edit-change.tsx";
import { EditStatusBadge } from "./edit-status.tsx";
import { inStudioTime } from "../../../lib/studio-message.ts";
import { Tabs } from "./tabs.tsx";
import { useWideScreen } from "./use-wide-screen.ts";

type TabKey = "waiting" | "decided";

/** "Priya Oduya, Mon 7 Dec": names a correction in buttons and messages. */
const editName = (edit: TimeEntryEditDto, timeZone: string) => `${edit.staffName}, ${formatDayShort(editDay(edit, timeZone))}`;

/** The corrections waiting for the owner's or manager's decision, and the ones decided lately. */
export function CorrectionsReview({ timeZone }: { timeZone: string }) {
  const [tab, setTab] = useState<TabKey>("waiting");
  const pending = useTimeEntryEdits({ status: "pending" });
  const waiting = pending.data?.length;
  return (
    <Tabs
      label="Corrections"
      selected={tab}
      onSelect={setTab}
      tabs={[
        { key: "waiting", label: waiting === undefined ? "Waiting" : `Waiting (${waiting})`, panel: <WaitingCorrections query={pending} timeZone={timeZone} /> },
        { key: "decided", label: "Decided", panel: <DecidedCorrections timeZone={timeZone} /> },
      ]}
    />
  );
}

/** Whose time it is, and who asked when that was someone else. */
function PersonCell({ edit }: { edit: TimeEntryEditDto }) {
  return (
    <span className="flex flex-col">
      <span className="font-medium">{edit.staffName}</span>
      {edit.proposedByName && edit.proposedByName !== edit.staffName ? <span className="text-xs text-muted">asked by {edit.proposedByName}</span> : null}
    </span>
  );
}

/** Why the viewer may not approve (decision 011), or null when they may. */
const whoDecides: Partial<Record<TimeEntryEditDto["approvalRule"], string>> = {
  own_time: "Your own time: an owner or another manager decides.",
  another_owner: "Your own time: another owner decides.",
  owners_only: "An owner's time: another owner decides.",
  cannot_decide: "An owner or a manager decides.",
};

const reasonCell = (edit: TimeEntryEditDto) => <p className="max-w-xs min-w-48 break-words whitespace-normal">{edit.reason}</p>;

/** Who, which day, what would change and why: the columns both lists begin with. */
const correctionColumns = (timeZone: string): ColumnDef<TimeEntryEditDto>[] => [
      { id: "person", header: "Person", accessorFn: (e) => e.staffName, cell: ({ row }) => <PersonCell edit={row.original} /> },
      { id: "day", header: "Day", accessorFn: (e) => e.proposed.startedAt, cell: ({ row }) => formatDayShort(editDay(row.original, timeZone)) },
      { id: "change", header: "Change", enableSorting: false, cell: ({ row }) => <EditChange edit={row.original} timeZone={timeZone} /> },
      { id: "reason", header: "Reason", enableSorting: false, accessorFn: (e) => e.reason, cell: ({ row }) => reasonCell(row.original) },
];

function WaitingCorrections({ query, timeZone }: { query: ReturnType<typeof useTimeEntryEdits>; timeZone: string }) {
  const wide = useWideScreen();
  const columns = useMemo<ColumnDef<TimeEntryEditDto>[]>(
    () => [
      ...correctionColumns(timeZone),
      { id: "asked", header: "Asked", accessorFn: (e) => e.createdAt, cell: ({ row }) => formatStudioDayTime(row.original.createdAt, timeZone) },
      {
        id: "actions",
        header: () => <span className="sr-only">Decision</span>,
        enableSorting: false,
        cell: ({ row }) => <DecisionActions edit={row.original} timeZone={timeZone} />,
      },
    ],
    [timeZone],
  );
  if (query.isPending) return <LoadingState label="Loading corrections…" />;
  if (query.isError) return <ErrorState error={query.error} onRetry={() => void query.refetch()} />;
  if (query.data.length === 0) return <EmptyState title="No corrections waiting.">When someone asks for a correction, it shows up here.</EmptyState>;
  if (!wide) {
    return (
      <CorrectionCards label="Corrections waiting for a decision" edits={[...query.data].sort((a, b) => a.createdAt.localeCompare(b.createdAt))} timeZone={timeZone}>
        {(edit) => (
          <>
            <p className="text-xs text-muted">Asked {formatStudioDayTime(edit.createdAt, timeZone)}</p>
            <DecisionActions edit={edit} timeZone={timeZone} />
          </>
        )}
      </CorrectionCards>
    );
  }
  return (
    <DataTable
      label="Corrections waiting for a decision"
      filterLabel="Filter corrections"
      data={query.data}
      columns={columns}
      getRowId={(e) => String(e.id)}
      initialSorting={[{ id: "asked", desc: false }]}
    />
  );
}

function DecidedCorrections({ timeZone }: { timeZone: string }) {
  const wide = useWideScreen();
  const all = useTimeEntryEdits();
  const columns = useMemo<ColumnDef<TimeEntryEditDto>[]>(
    () => [
      ...correctionColumns(timeZone),
      {
        id: "decision",
        header: "Decision",
        accessorFn: (e) => e.decidedAt ?? "",
        cell: ({ row }) => {
          return <Decision edit={row.original} timeZone={timeZone} />;
        },
      },
    ],
    [timeZone],
  );
  if (all.isPending) return <LoadingState label="Loading decisions…" />;
  if (all.isError) return <ErrorState error={all.error} onRetry={() => void all.refetch()} />;
  const decided = all.data.filter((e) => e.status !== "pending");
  if (decided.length === 0) return <EmptyState title="Nothing decided yet." />;
  if (!wide) {
    return (
      <CorrectionCards label="Decided corrections" edits={[...decided].sort((a, b) => (b.decidedAt ?? "").localeCompare(a.decidedAt ?? ""))} timeZone={timeZone}>
        {(edit) => <Decision edit={edit} timeZone={timeZone} />}
      </CorrectionCards>
    );
  }
  return (
    <DataTable
      label="Decided corrections"
      filterLabel="Filter decisions"
      data={decided}
      columns={columns}
      getRowId={(e) => String(e.id)}
      initialSorting={[{ id: "decision", desc: true }]}
    />
  );
}

function Decision({ edit, timeZone }: { edit: TimeEntryEditDto; timeZone: string }) {
  return (
    <div className="flex max-w-xs min-w-44 flex-col items-start gap-1 whitespace-normal">
      <EditStatusBadge status={edit.status} />
      {edit.selfApproved ? <span className="rounded-full border border-rust/30 bg-rust-wash px-2 py-0.5 text-xs font-medium text-rust-deep">Self-approved</span> : null}
      <span className="text-sm">
        {edit.decidedByName ?? "Someone"}
        {edit.decidedAt ? `, ${formatStudioDayTime(edit.decidedAt, timeZone)}` : ""}
      </span>
      {edit.decisionNote ? <span className="text-sm break-words text-muted">“{edit.decisionNote}”</span> : null}
    </div>
  );
}

type CorrectionCardsProps = { label: string; edits: TimeEntryEditDto[]; timeZone: string; children: (edit: TimeEntryEditDto) => ReactNode };

/** Corrections as cards, for a phone: the change, the reason and the buttons all fit the width. */
function CorrectionCards({ label, edits, timeZone, children }: CorrectionCardsProps) {
  return (
    <ul aria-label={label} className="divide-y divide-line rounded-lg border border-line bg-card">
      {edits.map((edit) => (
        <li key={edit.id} className="flex flex-col gap-2 px-4 py-3">
          <p className="font-semibold">
            {edit.staffName} · {formatDayShort(editDay(edit, timeZone))}
          </p>
          {edit.proposedByName && edit.proposedByName !== edit.staffName ? <p className="text-xs text-muted">Asked by {edit.proposedByName}</p> : null}
          <EditChange edit={edit} timeZone={timeZone} />
          <p className="text-sm break-words">“{edit.reason}”</p>
          {children(edit)}
        </li>
      ))}
    </ul>
  );
}

function DecisionActions({ edit, timeZone }: { edit: TimeEntryEditDto; timeZone: string }) {
  const toast = useToast();
  const approve = useApproveEdit();
  const [rejecting, setRejecting] = useState(false);
  const [confirmingSelf, setConfirmingSelf] = useState(false);
  const name = editName(edit, timeZone);
  const blocked = whoDecides[edit.approvalRule];
  const onApprove = () =>
    approve.mutate(
      { id: edit.id },
      {
        onSuccess: () => {
          setConfirmingSelf(false);
          toast(edit.approvalRule === "self_approval" ? `Correction self-approved: ${name}` : `Correction approved: ${name}`);
        },
        onError: (error) => toast(inStudioTime(errorMessage(error), timeZone), "error"),
      },
    );
  return (
    <div className="flex max-w-xs flex-col items-start gap-1 whitespace-normal">
      <div className="flex gap-2">
        <Button
          size="sm"
          onClick={edit.approvalRule === "self_approval" ? () => setConfirmingSelf(true) : onApprove}
          pending={approve.isPending}
          disabled={blocked !== undefined}
          aria-label={`Approve: ${name}`}
        >
          Approve
        </Button>
        {edit.approvalRule !== "cannot_decide" ? (
          <Button variant="secondary" size="sm" onClick={() => setRejecting(true)} disabled={approve.isPending} aria-label={`Reject: ${name}`}>
            Reject
          </Button>
        ) : null}
      </div>
      {blocked ? <p className="text-xs text-muted">{blocked}</p> : null}
      {rejecting ? <RejectDialog edit={edit} name={name} timeZone={timeZone} onClose={() => setRejecting(false)} /> : null}
      {confirmingSelf ? (
        <Dialog
          open
          onClose={() => setConfirmingSelf(false)}
          title="Approve your own correction?"
          description="You are the studio's only owner, so nobody else can decide it. It is recorded as self-approved, and the bookkeeper sees it flagged in the pay period and in the export."
          size="sm"
        >
          <DialogActions>
            <Button variant="secondary" onClick={() => setConfirmingSelf(false)}>
              Cancel
            </Button>
            <Button onClick={onApprove} pending={approve.isPending}>
              Self-approve
            </Button>
          </DialogActions>
        </Dialog>
      ) : null}
    </div>
  );
}

function RejectDialog({ edit, name, timeZone, onClose }: { edit: TimeEntryEditDto; name: string; timeZone: string; onClose: () => void }) {
  const toast = useToast();
  const reject = useRejectEdit();
  const [note, setNote] = useState("");
  const tooLong = note.trim().length > 500;
  const onReject = () => {
    if (tooLong) return;
    reject.mutate(
      { id: edit.id, note },
      {
        onSuccess: () => {
          toast(`Correction rejected: ${name}`);
          onClose();
        },
        onError: (error) => toast(inStudioTime(errorMessage(error), timeZone), "error"),
      },
    );
  };
  return (
    <Dialog open onClose={onClose} title="Reject this correction?" description={`${name}: the times stay as they are.`} size="sm">
      <form
        noValidate
        onSubmit={(event) => {
          event.preventDefault();
          onReject();
        }}
        className="flex flex-col gap-4"
      >
        <FormField label="Note" optional hint={`Tells ${edit.staffName} why.`} error={tooLong ? "Use at most 500 characters" : undefined}>
          {(field) => <Textarea {...field} value={note} onChange={(event) => setNote(event.target.value)} rows={3} />}
        </FormField>
        <DialogActions>
          <Button variant="secondary" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" variant="danger" pending={reject.isPending}>
            Reject correction
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
