import { useMemo, useState } from "react";
import { useForm, useWatch, type UseFormRegisterReturn, type UseFormSetValue } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import type { BookingDto, ClientSummaryDto, EngineerDto, EquipmentDto, QuoteInput, RoomDto } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { CheckList } from "../../../components/ui/check-list.tsx";
import { Dialog } from "../../../components/ui/dialog.tsx";
import { FormAlert, FormField } from "../../../components/ui/form-field.tsx";
import { Input } from "../../../components/ui/input.tsx";
import { Select } from "../../../components/ui/select.tsx";
import { Spinner } from "../../../components/ui/spinner.tsx";
import { Textarea } from "../../../components/ui/textarea.tsx";
import { useToast } from "../../../components/ui/use-toast.ts";
import { ApiError, errorMessage } from "../../../lib/api-client.ts";
import { applyApiErrors } from "../../../lib/form-errors.ts";
import { addDays, formatDayShort, sessionInstants, studioDayStartIso } from "../../../lib/studio-time.ts";
import { useDebouncedValue } from "../../../lib/use-debounced-value.ts";
import { quoteKeys } from "../api/booking-keys.ts";
import { useCreateBooking } from "../api/create-booking.ts";
import { useCreateProject } from "../api/create-project.ts";
import { useProjects } from "../api/get-projects.ts";
import { useQuote } from "../api/get-quote.ts";
import { describeConflict } from "./describe-conflict.ts";
import { QuoteBreakdown } from "./quote-breakdown.tsx";

export type QuoteStart = { roomId: number; date: string; start: string; end: string };

const quoteDelayMs = 300;

const bookingForm = z.object({
  roomId: z.string().min(1, "Choose a room"),
  clientAccountId: z.string().min(1, "Choose the client"),
  projectId: z.string(),
  date: z.string().regex(/^\d{4}-\d{2}-\d{2}$/, "Choose a date"),
  start: z.string().regex(/^\d{2}:\d{2}$/, "Enter a start time"),
  end: z.string().regex(/^\d{2}:\d{2}$/, "Enter an end time"),
  engineerIds: z.array(z.string()),
  equipmentIds: z.array(z.string()),
  title: z.string().trim().max(120, "Use at most 120 characters"),
  notes: z.string().trim().max(2000, "Use at most 2000 characters"),
  lockout: z.boolean(),
  lastDay: z.string(),
}).refine((v) => !v.lockout || (/^\d{4}-\d{2}-\d{2}$/.test(v.lastDay) && v.lastDay >= v.date), { path: ["lastDay"], message: "Choose a last day on or after the first" });
type BookingFormValues = z.infer<typeof bookingForm>;

const fields = ["roomId", "clientAccountId", "projectId", "date", "start", "end", "engineerIds", "equipmentIds", "title", "notes", "lastDay"] as const;

/**
 * The instants to quote and book: a session's start and end, or for a lockout the whole studio
 * days from the first day's midnight to the midnight after the last (the API widens to these too).
 */
function bookingInstants(values: Pick<BookingFormValues, "date" | "start" | "end" | "lockout" | "lastDay">, timeZone: string) {
  if (!values.lockout) return sessionInstants(values.date, values.start, values.end, timeZone);
  if (!/^\d{4}-\d{2}-\d{2}$/.test(values.date) || !/^\d{4}-\d{2}-\d{2}$/.test(values.lastDay) || values.lastDay < values.date) return null;
  return { startsAt: studioDayStartIso(values.date, timeZone), endsAt: studioDayStartIso(addDays(values.lastDay, 1), timeZone), overnight: false };
}
const apiFieldToForm: Record<string, string> = { startsAt: "start", endsAt: "end" };

type QuotePanelProps = {
  open: boolean;
  onClose: () => void;
  initial: QuoteStart;
  rooms: RoomDto[];
  clients: ClientSummaryDto[];
  engineers: EngineerDto[];
  equipment: EquipmentDto[];
  timeZone: string;
  onBooked?: (booking: BookingDto) => void;
};

/** "New booking": pick the slot and the people, see the full price and anything in the way, then hold or book. */
export function QuotePanel({ open, onClose, ...props }: QuotePanelProps) {
  return (
    <Dialog open={open} onClose={onClose} title="New booking" description="Nothing is booked until you press a button below." size="xl">
      <QuoteForm {...props} onClose={onClose} />
    </Dialog>
  );
}

type Mode = { status: "hold" | "confirmed"; queueBehindHold?: boolean };

function QuoteForm({ initial, rooms, clients, engineers, equipment, timeZone, onBooked, onClose }: Omit<QuotePanelProps, "open">) {
  const toast = useToast();
  const queryClient = useQueryClient();
  const create = useCreateBooking();
  const [formError, setFormError] = useState<string | null>(null);
  const activeRooms = useMemo(() => rooms.filter((r) => r.active || r.id === initial.roomId).sort((a, b) => a.position - b.position), [rooms, initial.roomId]);
  const activeClients = useMemo(() => clients.filter((c) => c.active).sort((a, b) => a.name.localeCompare(b.name)), [clients]);

  const { register, handleSubmit, setError, setValue, control, formState } = useForm<BookingFormValues>({
    resolver: zodResolver(bookingForm),
    defaultValues: {
      roomId: String(initial.roomId),
      clientAccountId: "",
      projectId: "",
      date: initial.date,
      start: initial.start,
      end: initial.end,
      engineerIds: [],
      equipmentIds: [],
      title: "",
      notes: "",
      lockout: false,
      lastDay: initial.date,
    },
  });
  const [roomId, clientAccountId, date, start, end, engineerIds, equipmentIds, lockout, lastDay] = useWatch({
    control,
    name: ["roomId", "clientAccountId", "date", "start", "end", "engineerIds", "equipmentIds", "lockout", "lastDay"],
  });

  const times = bookingInstants({ date, start, end, lockout, lastDay }, timeZone);
  const current: QuoteInput | null =
    times && roomId
      ? {
          roomId: Number(roomId),
          startsAt: times.startsAt,
          endsAt: times.endsAt,
          engineerIds,
          equipmentIds: equipmentIds.map(Number),
          ...(lockout ? { lockout: true } : {}),
        }
      : null;
  const debounced = useDebouncedValue(current, quoteDelayMs);
  const quote = useQuote(debounced);
  const upToDate = JSON.stringify(current) === JSON.stringify(debounced) && !quote.isPlaceholderData && !quote.isFetching;
  const result = quote.data;
  const conflicts = result?.conflicts ?? [];
  const canBook = current !== null && upToDate && quote.isSuccess && conflicts.length === 0;
  const canQueue = current !== null && upToDate && quote.isSuccess && conflicts.length > 0 && result?.canQueueBehindHold === true;

  const book = (mode: Mode) =>
    handleSubmit(async (values) => {
      setFormError(null);
      const instants = bookingInstants(values, timeZone);
      if (!instants) return;
      try {
        const booking = await create.mutateAsync({
          roomId: Number(values.roomId),
          clientAccountId: Number(values.clientAccountId),
          projectId: values.projectId ? Number(values.projectId) : null,
          startsAt: instants.startsAt,
          endsAt: instants.endsAt,
          engineerIds: values.engineerIds,
          equipmentIds: values.equipmentIds.map(Number),
          ...(values.title ? { title: values.title } : {}),
          ...(values.notes ? { notes: values.notes } : {}),
          status: mode.status,
          ...(values.lockout ? { lockout: true } : {}),
          ...(mode.queueBehindHold ? { queueBehindHold: true } : {}),
        });
        toast(
          mode.queueBehindHold
            ? `Second hold pencilled for ${booking.client.name}`
            : mode.status === "hold"
              ? `Hold pencilled for ${booking.client.name}`
              : `Booking confirmed for ${booking.client.name}`,
        );
        onBooked?.(booking);
        onClose();
      } catch (error) {
        if (error instanceof ApiError && error.status === 409) {
          // Someone took the slot since the quote: say so, and ask again what is in the way.
          setFormError(error.message);
          void queryClient.invalidateQueries({ queryKey: quoteKeys.all });
          return;
        }
        const renamed =
          error instanceof ApiError
            ? new ApiError(error.status, error.code, error.message, error.details.map((d) => ({ ...d, field: apiFieldToForm[d.field] ?? d.field })))
            : error;
        setFormError(applyApiErrors(renamed, setError, { fields }));
      }
    })();

  const { errors } = formState;
  const pending = create.isPending;
  const roomEquipment = sortEquipment(equipment, Number(roomId));

  return (
    <form onSubmit={(event) => event.preventDefault()} noValidate className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_minmax(0,22rem)]">
      <div className="flex min-w-0 flex-col gap-4">
        <FormAlert message={formError} />
        <div className="grid gap-4 sm:grid-cols-2">
          <FormField label="Room" error={errors.roomId?.message}>
            {(field) => (
              <Select {...field} {...register("roomId")}>
                {activeRooms.map((room) => (
                  <option key={room.id} value={room.id}>
                    {room.name}
                  </option>
                ))}
              </Select>
            )}
          </FormField>
          <FormField label="Client" error={errors.clientAccountId?.message}>
            {(field) => (
              <Select
                {...field}
                {...register("clientAccountId", { onChange: () => setValue("projectId", "") })}
              >
                <option value="">Choose a client…</option>
                {activeClients.map((client) => (
                  <option key={client.id} value={client.id}>
                    {client.name}
                  </option>
                ))}
              </Select>
            )}
          </FormField>
        </div>
        <ProjectField
          clientId={clientAccountId ? Number(clientAccountId) : null}
          register={register("projectId")}
          setValue={setValue}
          error={errors.projectId?.message}
        />
        <label className="flex items-start gap-2 text-sm">
          <input type="checkbox" className="mt-0.5 size-4 accent-rust" {...register("lockout")} />
          <span>
            <span className="font-medium">Lockout</span>
            <span className="block text-xs text-muted">The room is held around the clock for whole days, each at the day rate: no hourly time and no after-hours premium.</span>
          </span>
        </label>
        {lockout ? (
          <div className="grid gap-4 sm:grid-cols-2">
            <FormField label="First day" error={errors.date?.message}>
              {(field) => <Input {...field} {...register("date")} type="date" />}
            </FormField>
            <FormField label="Last day" error={errors.lastDay?.message}>
              {(field) => <Input {...field} {...register("lastDay")} type="date" />}
            </FormField>
          </div>
        ) : (
          <div className="grid gap-4 sm:grid-cols-3">
            <FormField label="Date" error={errors.date?.message}>
              {(field) => <Input {...field} {...register("date")} type="date" />}
            </FormField>
            <FormField label="Start" error={errors.start?.message}>
              {(field) => <Input {...field} {...register("start")} type="time" step={900} />}
            </FormField>
            <FormField
              label="End"
              hint={times?.overnight ? `Ends ${formatDayShort(times.endsAt.slice(0, 10))}, past midnight.` : undefined}
              error={errors.end?.message}
            >
              {(field) => <Input {...field} {...register("end")} type="time" step={900} />}
            </FormField>
          </div>
        )}
        <p className="-mt-2 text-xs text-muted">{lockout ? `Whole days, midnight to midnight, studio time (${timeZone}).` : `Studio time (${timeZone}).`}</p>
        <div className="grid gap-4 sm:grid-cols-2">
          <CheckList
            legend="Engineers"
            items={engineers.map((e) => ({ value: e.userId, label: e.name, detail: e.grade === "assistant" ? "assistant" : undefined }))}
            value={engineerIds}
            onChange={(next) => setValue("engineerIds", next, { shouldDirty: true })}
            empty="No engineers on the team yet."
          />
          <CheckList
            legend="Equipment"
            items={roomEquipment.map((e) => ({
              value: String(e.id),
              label: e.name,
              detail: e.homeRoomId !== Number(roomId) ? (e.homeRoomName ?? "stores") : undefined,
            }))}
            value={equipmentIds}
            onChange={(next) => setValue("equipmentIds", next, { shouldDirty: true })}
            empty="No equipment listed."
            scroll
          />
        </div>
        <FormField label="Title" optional error={errors.title?.message}>
          {(field) => <Input {...field} {...register("title")} autoComplete="off" placeholder="e.g. Drum tracking" />}
        </FormField>
        <FormField label="Notes" optional error={errors.notes?.message}>
          {(field) => <Textarea {...field} {...register("notes")} rows={2} />}
        </FormField>
      </div>

      <div className="flex min-w-0 flex-col gap-3 lg:sticky lg:top-0 lg:self-start">
        <h3 className="flex items-center gap-2 font-semibold">
          Quote {quote.isFetching ? <Spinner label="Updating the quote" /> : null}
        </h3>
        {current === null ? (
          <p className="text-sm text-muted">Choose a room, a date and the times to see the price.</p>
        ) : quote.isError ? (
          <p role="alert" className="rounded-md border border-alert/30 bg-alert-wash px-3 py-2 text-sm font-medium text-alert">
            {errorMessage(quote.error)}
          </p>
        ) : result ? (
          <div className={upToDate ? undefined : "opacity-60"}>
            <QuoteBreakdown quote={result.quote} depositRequiredCents={result.depositRequiredCents} />
          </div>
        ) : (
          <p className="text-sm text-muted">Working out the price…</p>
        )}
        {conflicts.length > 0 && upToDate ? (
          <div role="alert" className="rounded-md border border-alert/30 bg-alert-wash px-3 py-2 text-sm text-alert">
            <p className="font-semibold">Something is in the way:</p>
            <ul className="mt-1 list-disc pl-5">
              {conflicts.map((conflict) => (
                <li key={`${conflict.resource}-${conflict.bookingId}-${conflict.name}`}>{describeConflict(conflict, timeZone, date)}</li>
              ))}
            </ul>
            {result?.canQueueBehindHold ? (
              <p className="mt-1 text-ink">Only holds are in the way: you can queue a second hold, which moves up if the first is released.</p>
            ) : null}
          </div>
        ) : null}
        <div className="flex flex-wrap gap-2">
          {canQueue ? (
            <Button onClick={() => void book({ status: "hold", queueBehindHold: true })} pending={pending}>
              Queue as second hold
            </Button>
          ) : null}
          <Button variant="secondary" disabled={!canBook} pending={pending && !canQueue} onClick={() => void book({ status: "hold" })}>
            Pencil a hold
          </Button>
          <Button disabled={!canBook} pending={pending && !canQueue} onClick={() => void book({ status: "confirmed" })}>
            Book and confirm
          </Button>
        </div>
        <p className="text-xs text-muted">A hold keeps the slot for a while without a commitment; booking and confirming asks for the deposit.</p>
      </div>
    </form>
  );
}

/** The room's own kit first, then the rest of the studio's. */
function sortEquipment(equipment: EquipmentDto[], roomId: number): EquipmentDto[] {
  return equipment
    .filter((e) => e.active)
    .sort((a, b) => Number(b.homeRoomId === roomId) - Number(a.homeRoomId === roomId) || a.name.localeCompare(b.name));
}

type ProjectFieldProps = {
  clientId: number | null;
  register: UseFormRegisterReturn<"projectId">;
  setValue: UseFormSetValue<BookingFormValues>;
  error?: string;
};

function ProjectField({ clientId, register, setValue, error }: ProjectFieldProps) {
  const projects = useProjects(clientId);
  const [adding, setAdding] = useState(false);
  const [name, setName] = useState("");
  const [problem, setProblem] = useState<string | null>(null);
  const create = useCreateProject(clientId ?? 0);

  const add = () => {
    if (!clientId || !name.trim()) {
      setProblem("Enter the project's name");
      return;
    }
    setProblem(null);
    create.mutate(
      { name: name.trim() },
      {
        onSuccess: (project) => {
          setAdding(false);
          setName("");
          // The list refetches with the new project; select it once it is an option.
          void projects.refetch().then(() => setValue("projectId", String(project.id), { shouldDirty: true }));
        },
        onError: (failure) => setProblem(errorMessage(failure)),
      },
    );
  };

  return (
    <div className="flex flex-col gap-2">
      <div className="flex items-end gap-2">
        <FormField label="Project" optional className="min-w-0 flex-1" error={error}>
          {(field) => (
            <Select {...field} {...register} disabled={!clientId}>
              <option value="">{clientId ? "No project" : "Choose the client first"}</option>
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
        {clientId ? (
          <Button variant="secondary" aria-expanded={adding} onClick={() => setAdding((a) => !a)}>
            New project
          </Button>
        ) : null}
      </div>
      {adding ? (
        <div className="flex flex-wrap items-end gap-2 rounded-md border border-line bg-paper/60 p-3">
          <FormField label="New project name" className="min-w-0 flex-1" error={problem ?? undefined}>
            {(field) => (
              <Input
                {...field}
                value={name}
                onChange={(event) => setName(event.target.value)}
                onKeyDown={(event) => {
                  if (event.key === "Enter") {
                    event.preventDefault();
                    add();
                  }
                }}
                autoComplete="off"
              />
            )}
          </FormField>
          <Button onClick={add} pending={create.isPending}>
            Add project
          </Button>
        </div>
      ) : null}
    </div>
  );
}
