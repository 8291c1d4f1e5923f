import { useState } from "react";
import { careKindLabels, careKinds, type CareKind, type RecorderDto } from "@takeup/domain";
import { Badge } from "../../../components/ui/badge.tsx";
import { Button } from "../../../components/ui/button.tsx";
import { Card } from "../../../components/ui/card.tsx";
import { FormAlert, FormField } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { Select } from "../../../components/ui/select.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { useToast } from "../../../components/ui/use-toast.ts";
import { errorMessage } from "../../../lib/api-client.ts";
import { useLogCare, useRecorders } from "../api/recorders.ts";

/** Each tape recorder's hours since care against the owner's intervals, its log, and a form to add to it. */
export function RecorderCare({ today }: { today: string }) {
  const recorders = useRecorders();
  if (recorders.isPending) return <LoadingState />;
  if (recorders.isError) return <ErrorState error={recorders.error} onRetry={() => void recorders.refetch()} />;
  return (
    <div className="flex flex-col gap-4">
      <p className="text-sm text-muted">
        Running hours come from the wrapped sessions each recorder was booked into. The intervals are the studio&apos;s own settings, following common practice; machines differ.
      </p>
      {recorders.data.map((r) => (
        <RecorderCard key={r.id} recorder={r} today={today} />
      ))}
    </div>
  );
}

function RecorderCard({ recorder, today }: { recorder: RecorderDto; today: string }) {
  const log = useLogCare(recorder.id);
  const toast = useToast();
  const [kind, setKind] = useState<CareKind>("cleaning");
  const [doneOn, setDoneOn] = useState(today);
  const [doneBy, setDoneBy] = useState("");
  const [notes, setNotes] = useState("");
  return (
    <Card title={recorder.name}>
      <p className="mb-2 text-sm text-muted">
        {recorder.roomName ?? "In the stores"} · {recorder.runningHours} running hours in all
      </p>
      <table className="mb-3 w-full text-sm">
        <thead>
          <tr className="text-left text-muted">
            <th className="py-1 font-medium">Care</th>
            <th className="py-1 font-medium">Last done</th>
            <th className="py-1 font-medium">Hours since</th>
            <th className="py-1 font-medium">Interval</th>
            <th className="py-1 font-medium">Due</th>
          </tr>
        </thead>
        <tbody>
          {recorder.care.map((c) => (
            <tr key={c.kind} className="border-t border-line">
              <td className="py-1">{careKindLabels[c.kind]}</td>
              <td className="py-1">{c.lastOn ?? "Never logged"}</td>
              <td className="py-1">{c.hoursSince}</td>
              <td className="py-1">{c.intervalHours === null ? "—" : `${c.intervalHours} h`}</td>
              <td className="py-1">{c.due ? <Badge tone="accent">Due now</Badge> : "—"}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {recorder.alignmentWarnings.length ? (
        <p role="note" className="mb-3 rounded-md border border-rust/30 bg-rust-wash px-3 py-2 text-sm text-rust-deep">
          Booked sessions would take it past its alignment interval:{" "}
          {recorder.alignmentWarnings.map((w) => `${w.title ?? `booking #${w.bookingId}`} (${w.hoursAtEnd} h by its end)`).join("; ")}.
        </p>
      ) : null}
      <FormAlert message={log.isError ? errorMessage(log.error) : null} />
      <div className="flex flex-wrap items-end gap-2">
        <FormField label="Care done">
          {(control) => (
            <Select {...control} value={kind} onChange={(e) => setKind(e.target.value as CareKind)}>
              {careKinds.map((k) => (
                <option key={k} value={k}>
                  {careKindLabels[k]}
                </option>
              ))}
            </Select>
          )}
        </FormField>
        <FormField label="On">{(control) => <Input {...control} type="date" value={doneOn} max={today} onChange={(e) => setDoneOn(e.target.value)} />}</FormField>
        <FormField label="By" className="min-w-40 flex-1">
          {(control) => <Input {...control} value={doneBy} onChange={(e) => setDoneBy(e.target.value)} />}
        </FormField>
        <FormField label="Notes" optional className="min-w-40 flex-1">
          {(control) => <Input {...control} value={notes} onChange={(e) => setNotes(e.target.value)} />}
        </FormField>
        <Button
          pending={log.isPending}
          onClick={() =>
            log.mutate(
              { kind, doneOn, doneBy, notes },
              {
                onSuccess: () => {
                  setDoneBy("");
                  setNotes("");
                  toast(`${careKindLabels[kind]} logged`);
                },
              },
            )
          }
        >
          Log care
        </Button>
      </div>
      {recorder.log.length ? (
        <details className="mt-3 text-sm">
          <summary className="cursor-pointer font-medium">Care log ({recorder.log.length})</summary>
          <ul className="mt-2 flex flex-col gap-1">
            {recorder.log.map((e) => (
              <li key={e.id}>
                {e.doneOn} · {careKindLabels[e.kind]} · {e.doneBy}
                {e.notes ? <span className="text-muted"> — {e.notes}</span> : null}
              </li>
            ))}
          </ul>
        </details>
      ) : null}
    </Card>
  );
}
