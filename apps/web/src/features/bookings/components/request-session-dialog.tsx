import { useMemo, useState } from "react";
import { useForm, useWatch } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { z } from "zod";
import type { QuoteInput, RoomDto } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { Dialog, DialogActions } from "../../../components/ui/dialog.tsx";
import { FormAlert, FormField } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { Select } from "../../../components/ui/select.tsx";
import { Textarea } from "../../../components/ui/textarea.tsx";
import { useToast } from "../../../components/ui/use-toast.ts";
import { ApiError, errorMessage } from "../../../lib/api-client.ts";
import { applyApiErrors } from "../../../lib/form-errors.ts";
import { addDays, sessionInstants, studioToday } from "../../../lib/studio-time.ts";
import { useDebouncedValue } from "../../../lib/use-debounced-value.ts";
import { useCreateBookingRequest } from "../api/create-booking-request.ts";
import { useProjects } from "../api/get-projects.ts";
import { useQuote } from "../api/get-quote.ts";
import { describeConflict } from "./describe-conflict.ts";
import { QuoteBreakdown } from "./quote-breakdown.tsx";

const requestForm = z.object({
  roomId: z.string().min(1, "Choose a room"),
  date: z.string().regex(/^\d{4}-\d{2}-\d{2}$/, "Choose a date"),
  start: z.string().regex(/^\d{2}:\d{2}$/, "Enter a start time"),
  end: z.string().regex(/^\d{2}:\d{2}$/, "Enter an end time"),
  projectId: z.string(),
  notes: z.string().trim().max(2000, "Use at most 2000 characters"),
});
type RequestFormValues = z.infer<typeof requestForm>;

type RequestSessionDialogProps = { open: boolean; onClose: () => void; rooms: RoomDto[]; clientId: number; timeZone: string };

export function RequestSessionDialog({ open, onClose, ...props }: RequestSessionDialogProps) {
  return (
    <Dialog
      open={open}
      onClose={onClose}
      title="Request a session"
      description="The studio sees your request as a hold and confirms it with you."
      size="lg"
    >
      <RequestForm {...props} onDone={onClose} />
    </Dialog>
  );
}

function RequestForm({ rooms, clientId, timeZone, onDone }: Omit<RequestSessionDialogProps, "open" | "onClose"> & { onDone: () => void }) {
  const toast = useToast();
  const request = useCreateBookingRequest();
  const projects = useProjects(clientId);
  const [formError, setFormError] = useState<string | null>(null);
  const bookable = useMemo(() => rooms.filter((r) => r.active).sort((a, b) => a.position - b.position), [rooms]);
  const { register, handleSubmit, setError, control, formState } = useForm<RequestFormValues>({
    resolver: zodResolver(requestForm),
    defaultValues: { roomId: bookable[0] ? String(bookable[0].id) : "", date: addDays(studioToday(timeZone), 7), start: "10:00", end: "18:00", projectId: "", notes: "" },
  });
  const [roomId, date, start, end] = useWatch({ control, name: ["roomId", "date", "start", "end"] });
  const times = sessionInstants(date, start, end, timeZone);
  const input: QuoteInput | null = times && roomId ? { roomId: Number(roomId), startsAt: times.startsAt, endsAt: times.endsAt } : null;
  const quote = useQuote(useDebouncedValue(input, 300));

  const submit = handleSubmit(async (values) => {
    setFormError(null);
    const instants = sessionInstants(values.date, values.start, values.end, timeZone);
    if (!instants) return;
    try {
      await request.mutateAsync({
        roomId: Number(values.roomId),
        startsAt: instants.startsAt,
        endsAt: instants.endsAt,
        projectId: values.projectId ? Number(values.projectId) : null,
        ...(values.notes ? { notes: values.notes } : {}),
      });
      toast("Request sent — the studio will confirm it");
      onDone();
    } catch (error) {
      const renamed =
        error instanceof ApiError
          ? new ApiError(error.status, error.code, error.message, error.details.map((d) => ({ ...d, field: d.field === "startsAt" ? "start" : d.field === "endsAt" ? "end" : d.field })))
          : error;
      setFormError(applyApiErrors(renamed, setError, { fields: ["roomId", "date", "start", "end", "projectId", "notes"] }));
    }
  });

  const { errors } = formState;
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      <FormAlert message={formError} />
      <FormField label="Room" error={errors.roomId?.message}>
        {(field) => (
          <Select {...field} {...register("roomId")}>
            {bookable.map((room) => (
              <option key={room.id} value={room.id}>
                {room.description ? `${room.name} — ${room.description}` : room.name}
              </option>
            ))}
          </Select>
        )}
      </FormField>
      <div className="grid gap-4 sm:grid-cols-3">
        <FormField label="Date" error={errors.date?.message}>
          {(field) => <Input {...field} {...register("date")} type="date" />}
        </FormField>
        <FormField label="Start" error={errors.start?.message}>
          {(field) => <Input {...field} {...register("start")} type="time" step={900} />}
        </FormField>
        <FormField label="End" hint={times?.overnight ? "Runs past midnight." : undefined} error={errors.end?.message}>
          {(field) => <Input {...field} {...register("end")} type="time" step={900} />}
        </FormField>
      </div>
      <p className="-mt-2 text-xs text-muted">Studio time ({timeZone}).</p>
      <FormField label="Project" optional error={errors.projectId?.message}>
        {(field) => (
          <Select {...field} {...register("projectId")}>
            <option value="">No project</option>
            {(projects.data ?? [])
              .filter((p) => p.active)
              .map((project) => (
                <option key={project.id} value={project.id}>
                  {project.name}
                </option>
              ))}
          </Select>
        )}
      </FormField>
      <FormField label="Notes" optional hint="What you plan to record, the engineer you would like, anything the studio should know." error={errors.notes?.message}>
        {(field) => <Textarea {...field} {...register("notes")} rows={3} />}
      </FormField>
      {input ? (
        <div className="flex flex-col gap-2">
          <h3 className="font-semibold">Estimated price</h3>
          {quote.isError ? (
            <p className="text-sm text-muted">{errorMessage(quote.error)}</p>
          ) : quote.data ? (
            <>
              <QuoteBreakdown quote={quote.data.quote} depositRequiredCents={quote.data.depositRequiredCents} label="Estimated price" />
              {quote.data.conflicts.length > 0 ? (
                <div role="alert" className="rounded-md border border-alert/30 bg-alert-wash px-3 py-2 text-sm text-alert">
                  <p className="font-semibold">That time is not free:</p>
                  <ul className="mt-1 list-disc pl-5">
                    {quote.data.conflicts.map((c) => (
                      <li key={`${c.resource}-${c.bookingId}`}>{describeConflict(c, timeZone, date)}</li>
                    ))}
                  </ul>
                </div>
              ) : null}
            </>
          ) : (
            <p className="text-sm text-muted">Working out the price…</p>
          )}
          <p className="text-xs text-muted">Engineers and equipment are added by the studio; the confirmed booking shows the final price.</p>
        </div>
      ) : null}
      <DialogActions>
        <Button variant="secondary" onClick={onDone}>
          Cancel
        </Button>
        <Button type="submit" pending={formState.isSubmitting}>
          Send request
        </Button>
      </DialogActions>
    </form>
  );
}
