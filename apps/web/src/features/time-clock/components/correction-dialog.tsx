import { useMemo, useState } from "react";
import { useFieldArray, useForm, useWatch, type UseFormRegisterReturn } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { z } from "zod";
import { proposeEditInput, type ProposeEditInput, type TimeEntryDto } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { Dialog, DialogActions } from "../../../components/ui/dialog.tsx";
import { FormAlert, FormField } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { Select } from "../../../components/ui/select.tsx";
import { Textarea } from "../../../components/ui/textarea.tsx";
import { useToast } from "../../../components/ui/use-toast.ts";
import { applyApiErrors } from "../../../lib/form-errors.ts";
import { formatDayShort, formatTimeRange, studioLocalDateTimeToIso, studioParts } from "../../../lib/studio-time.ts";
import { useSessionsAround } from "../api/get-sessions-around.ts";
import { useProposeEdit } from "../api/propose-edit.ts";
import { inStudioTime } from "../../../lib/studio-message.ts";

type CorrectionDialogProps = {
  open: boolean;
  onClose: () => void;
  /** The entry to correct; leave out to add missing time. */
  entry?: TimeEntryDto;
  /** Whose time it is: their sessions are offered to tie the time to. */
  staffUserId: string;
  timeZone: string;
};

/** "Ask for a correction" to an entry, or "Add missing time": nothing changes until a manager approves. */
export function CorrectionDialog({ open, onClose, entry, staffUserId, timeZone }: CorrectionDialogProps) {
  const description = entry ? (
    <>
      Your entry on {formatDayShort(studioParts(entry.startedAt, timeZone).date)},{" "}
      {entry.endedAt ? formatTimeRange(entry.startedAt, entry.endedAt, timeZone) : "still open"}. Times are studio time ({timeZone}). A manager approves the
      change before it counts.
    </>
  ) : (
    <>Time you worked but did not clock. Times are studio time ({timeZone}). A manager approves it before it counts.</>
  );
  return (
    <Dialog open={open} onClose={onClose} title={entry ? "Ask for a correction" : "Add missing time"} description={description}>
      <CorrectionForm entry={entry} staffUserId={staffUserId} timeZone={timeZone} onDone={onClose} onCancel={onClose} />
    </Dialog>
  );
}

const localValue = (iso: string, timeZone: string) => {
  const parts = studioParts(iso, timeZone);
  return `${parts.date}T${parts.time}`;
};

const wallClock = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}$/;

/** The form speaks studio wall time (datetime-local); the contract wants instants with the studio's offset. */
function correctionForm(timeZone: string) {
  const instant = (value: string) => (wallClock.test(value) ? studioLocalDateTimeToIso(value, timeZone) : null);
  return z
    .object({
      start: z.string().min(1, "Enter when you started"),
      end: z.string().min(1, "Enter when you finished"),
      breaks: z.array(z.object({ from: z.string(), to: z.string() })),
      /** A booking id, or SHOP for time that was not a session. */
      session: z.string(),
      reason: proposeEditInput.shape.reason,
    })
    .superRefine((values, ctx) => {
      const start = instant(values.start);
      const end = instant(values.end);
      if (values.start && !start) ctx.addIssue({ code: "custom", path: ["start"], message: "Enter a date and a time" });
      if (values.end && !end) ctx.addIssue({ code: "custom", path: ["end"], message: "Enter a date and a time" });
      if (!start || !end) return;
      const startMs = Date.parse(start);
      const endMs = Date.parse(end);
      if (endMs <= startMs) ctx.addIssue({ code: "custom", path: ["end"], message: "The end must be after the start" });
      else if (endMs - startMs > 24 * 3_600_000) ctx.addIssue({ code: "custom", path: ["end"], message: "An entry lasts at most 24 hours; split longer work into two entries" });
      values.breaks.forEach((b, index) => {
        if (!b.from && !b.to) return;
        const from = instant(b.from);
        const to = instant(b.to);
        if (!from) ctx.addIssue({ code: "custom", path: ["breaks", index, "from"], message: "Enter when the break started" });
        if (!to) ctx.addIssue({ code: "custom", path: ["breaks", index, "to"], message: "Enter when the break ended" });
        if (!from || !to) return;
        if (Date.parse(to) <= Date.parse(from)) ctx.addIssue({ code: "custom", path: ["breaks", index, "to"], message: "A break ends after it starts" });
        else if (Date.parse(from) < startMs || Date.parse(to) > endMs) ctx.addIssue({ code: "custom", path: ["breaks", index, "from"], message: "A break falls between the start and the end" });
      });
    });
}
type CorrectionValues = z.infer<ReturnType<typeof correctionForm>>;

const fields = ["start", "end", "breaks", "session", "reason"] as const;
const SHOP = "shop";

/** The API names the contract's fields; the form shows them under its own. */
const fromApiField = (field: string): string =>
  field
    .replace(/^startedAt$/, "start")
    .replace(/^endedAt$/, "end")
    .replace(/^breaks\.(\d+)\.startedAt$/, "breaks.$1.from")
    .replace(/^breaks\.(\d+)\.endedAt$/, "breaks.$1.to")
    .replace(/^breaks\.(\d+)$/, "breaks.$1.from")
    .replace(/^bookingId$/, "session");

function defaults(entry: TimeEntryDto | undefined, timeZone: string): CorrectionValues {
  const closed = entry?.breaks.filter((b): b is { id: number; startedAt: string; endedAt: string } => b.endedAt !== null) ?? [];
  return {
    start: entry ? localValue(entry.startedAt, timeZone) : "",
    end: entry?.endedAt ? localValue(entry.endedAt, timeZone) : "",
    // One empty pair is offered even without breaks; left empty, it is no break.
    breaks: closed.length > 0 ? closed.map((b) => ({ from: localValue(b.startedAt, timeZone), to: localValue(b.endedAt, timeZone) })) : [{ from: "", to: "" }],
    session: entry?.booking ? String(entry.booking.id) : SHOP,
    reason: "",
  };
}

type CorrectionFormProps = { entry?: TimeEntryDto; staffUserId: string; timeZone: string; onDone: () => void; onCancel: () => void };

function CorrectionForm({ entry, staffUserId, timeZone, onDone, onCancel }: CorrectionFormProps) {
  const toast = useToast();
  const [formError, setFormError] = useState<string | null>(null);
  const schema = useMemo(() => correctionForm(timeZone), [timeZone]);
  const { register, handleSubmit, setError, formState, control } = useForm<CorrectionValues>({
    resolver: zodResolver(schema),
    defaultValues: defaults(entry, timeZone),
  });
  const breaks = useFieldArray({ control, name: "breaks" });
  const propose = useProposeEdit();

  const onSubmit = handleSubmit((values) => {
    setFormError(null);
    const iso = (value: string) => studioLocalDateTimeToIso(value, timeZone) ?? value;
    const input: ProposeEditInput = {
      ...(entry ? { timeEntryId: entry.id } : {}),
      startedAt: iso(values.start),
      endedAt: iso(values.end),
      // The proposal replaces the entry's breaks, so the ones kept are sent again.
      breaks: values.breaks.filter((b) => b.from && b.to).map((b) => ({ startedAt: iso(b.from), endedAt: iso(b.to) })),
      bookingId: values.session === SHOP ? null : Number(values.session),
      reason: values.reason.trim(),
    };
    propose.mutate(input, {
      onSuccess: () => {
        toast(entry ? "Correction sent for approval" : "Missing time sent for approval");
        onDone();
      },
      onError: (error) => {
        const message = applyApiErrors(error, setError, { fields, fromApiField });
        setFormError(message ? inStudioTime(message, timeZone) : null);
      },
    });
  });

  const { errors } = formState;
  const start = useWatch({ control, name: "start" });
  const startDay = wallClock.test(start) ? start.slice(0, 10) : entry ? studioParts(entry.startedAt, timeZone).date : null;
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <FormAlert message={formError} />
      <div className="grid gap-4 sm:grid-cols-2">
        <FormField label="Start" error={errors.start?.message}>
          {(field) => <Input {...field} {...register("start")} type="datetime-local" step={60} />}
        </FormField>
        <FormField label="End" error={errors.end?.message}>
          {(field) => <Input {...field} {...register("end")} type="datetime-local" step={60} />}
        </FormField>
      </div>
      <SessionField staffUserId={staffUserId} day={startDay} timeZone={timeZone} current={entry?.booking ?? null} error={errors.session?.message} register={register("session")} />
      <fieldset className="flex min-w-0 flex-col gap-3">
        <legend className="text-sm font-semibold">Breaks</legend>
        <p className="-mt-1 text-sm text-muted">Unpaid breaks inside this time. Leave a break empty if there was none.</p>
        {breaks.fields.map((item, index) => {
          const name = index === 0 ? "Break" : `Break ${index + 1}`;
          return (
            <div key={item.id} className="grid items-start gap-3 rounded-md border border-line bg-paper/60 p-3 sm:grid-cols-[1fr_1fr_auto]">
              <FormField label={`${name} from`} optional error={errors.breaks?.[index]?.from?.message}>
                {(field) => <Input {...field} {...register(`breaks.${index}.from`)} type="datetime-local" step={60} />}
              </FormField>
              <FormField label={`${name} to`} optional error={errors.breaks?.[index]?.to?.message}>
                {(field) => <Input {...field} {...register(`breaks.${index}.to`)} type="datetime-local" step={60} />}
              </FormField>
              <Button variant="ghost" size="sm" className="sm:mt-7" onClick={() => breaks.remove(index)} aria-label={`Remove ${name.toLowerCase()}`}>
                Remove
              </Button>
            </div>
          );
        })}
        <div>
          <Button variant="secondary" size="sm" onClick={() => breaks.append({ from: "", to: "" })} disabled={breaks.fields.length >= 10}>
            {breaks.fields.length === 0 ? "Add a break" : "Add another break"}
          </Button>
        </div>
      </fieldset>
      <FormField label="Reason" hint="Say what happened, for the manager who approves it." error={errors.reason?.message}>
        {(field) => <Textarea {...field} {...register("reason")} rows={3} maxLength={500} />}
      </FormField>
      <DialogActions>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
        <Button type="submit" pending={propose.isPending}>
          Send for approval
        </Button>
      </DialogActions>
    </form>
  );
}

type SessionFieldProps = {
  staffUserId: string;
  day: string | null;
  timeZone: string;
  current: TimeEntryDto["booking"];
  error?: string;
  register: UseFormRegisterReturn<"session">;
};

/** Shop time, or one of the person's sessions around the day the time starts on. */
function SessionField({ staffUserId, day, timeZone, current, error, register }: SessionFieldProps) {
  const sessions = useSessionsAround(staffUserId, day, timeZone);
  const options = (sessions.data ?? []).map((s) => ({
    value: String(s.id),
    label: `${s.clientName} — ${s.roomName}, ${formatTimeRange(s.startsAt, s.endsAt, timeZone, { withDay: true })}`,
  }));
  // The entry's own session stays on offer even when it lies outside the days looked at.
  if (current && !options.some((o) => o.value === String(current.id))) options.unshift({ value: String(current.id), label: `${current.clientName} — ${current.roomName}` });
  return (
    <FormField label="Session" hint={sessions.isPending && day ? "Looking up your sessions…" : "The session this time was for, or shop time."} error={error}>
      {(field) => (
        <Select {...field} {...register}>
          <option value={SHOP}>Shop time (not a session)</option>
          {options.map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
        </Select>
      )}
    </FormField>
  );
}

