import { useState } from "react";
import { reelMovementLabels, type ReelDetailDto, type Role } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { Card } from "../../../components/ui/card.tsx";
import { FormAlert, FormField } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { useToast } from "../../../components/ui/use-toast.ts";
import { errorMessage } from "../../../lib/api-client.ts";
import { useCheckIn, useCheckOut, useRelease } from "../api/reels.ts";

const when = (iso: string, timeZone: string) => new Intl.DateTimeFormat("en-US", { dateStyle: "medium", timeStyle: "short", timeZone }).format(new Date(iso));

/** The reel's comings and goings, newest first, and (for staff) the next move. */
export function ReelMovements({ reel, role, timeZone }: { reel: ReelDetailDto; role: Role; timeZone: string }) {
  const staff = role === "owner" || role === "manager" || role === "engineer";
  return (
    <Card title="Movements">
      {staff ? <NextMove reel={reel} mayRelease={role !== "engineer"} /> : null}
      {reel.movements.length === 0 ? (
        <p className="text-sm text-muted">It has not left the vault.</p>
      ) : (
        <ul className="flex flex-col gap-2 text-sm" aria-label="Movements">
          {reel.movements.map((m) => (
            <li key={m.id} className="border-t border-line pt-2 first:border-0 first:pt-0">
              <span className="font-semibold">{reelMovementLabels[m.kind]}</span> — {m.person}, {when(m.at, timeZone)}
              {m.reason ? <span className="text-muted"> · {m.reason}</span> : null}
              {m.dueBack ? <span className="text-muted"> · due back {m.dueBack}</span> : null}
              {m.recordedBy ? <span className="text-muted"> · recorded by {m.recordedBy}</span> : null}
            </li>
          ))}
        </ul>
      )}
    </Card>
  );
}

function NextMove({ reel, mayRelease }: { reel: ReelDetailDto; mayRelease: boolean }) {
  const toast = useToast();
  const checkOut = useCheckOut(reel.id);
  const checkIn = useCheckIn(reel.id);
  const release = useRelease(reel.id);
  const [person, setPerson] = useState("");
  const [reason, setReason] = useState("");
  const [dueBack, setDueBack] = useState("");
  const failed = [checkOut, checkIn, release].find((m) => m.isError);
  const done = (message: string) => () => {
    setPerson("");
    setReason("");
    toast(message);
  };
  if (reel.status === "released") return null;
  return (
    <div className="mb-4 flex flex-col gap-3 rounded-md border border-line bg-paper p-3">
      <FormAlert message={failed ? errorMessage(failed.error) : null} />
      <div className="flex flex-wrap items-end gap-2">
        <FormField label={reel.status === "in_vault" ? "Taken by" : "Brought back by"} className="min-w-48 flex-1">
          {(control) => <Input {...control} value={person} onChange={(e) => setPerson(e.target.value)} />}
        </FormField>
        {reel.status === "in_vault" ? (
          <>
            <FormField label="Why" className="min-w-48 flex-1">
              {(control) => <Input {...control} value={reason} onChange={(e) => setReason(e.target.value)} />}
            </FormField>
            <FormField label="Due back">{(control) => <Input {...control} type="date" value={dueBack} onChange={(e) => setDueBack(e.target.value)} />}</FormField>
            <Button pending={checkOut.isPending} onClick={() => checkOut.mutate({ person, reason, dueBack }, { onSuccess: done("Checked out") })}>
              Check out
            </Button>
          </>
        ) : (
          <Button pending={checkIn.isPending} onClick={() => checkIn.mutate({ person }, { onSuccess: done("Checked in") })}>
            Check in
          </Button>
        )}
        {mayRelease ? (
          <Button variant="secondary" pending={release.isPending} onClick={() => release.mutate({ person, reason }, { onSuccess: done("Released to its owner") })}>
            Release to owner
          </Button>
        ) : null}
      </div>
    </div>
  );
}
