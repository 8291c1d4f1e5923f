import { useId, useState, type ReactNode } from "react";
import { formatMoney, roomColourHex, type BookingDto, type EngineerDto, type EquipmentDto } from "@takeup/domain";
import { Badge } from "../../../components/ui/badge.tsx";
import { Button } from "../../../components/ui/button.tsx";
import { CheckList } from "../../../components/ui/check-list.tsx";
import { Dialog } from "../../../components/ui/dialog.tsx";
import { FormAlert } from "../../../components/ui/form-field.tsx";
import { ErrorState, LoadingState } from "../../../components/ui/states.tsx";
import { useToast } from "../../../components/ui/use-toast.ts";
import { errorMessage } from "../../../lib/api-client.ts";
import { formatStudioDayTime, formatTimeRange } from "../../../lib/studio-time.ts";
import { useConfirmBooking } from "../api/confirm-booking.ts";
import { useBooking } from "../api/get-booking.ts";
import { useReleaseBooking } from "../api/release-booking.ts";
import { useStartBooking } from "../api/start-booking.ts";
import { useUpdateBooking } from "../api/update-booking.ts";
import { useWrapBooking } from "../api/wrap-booking.ts";
import { BookingStatusBadge } from "./booking-status.tsx";
import { CancelBookingDialog } from "./cancel-booking-dialog.tsx";
import { QuoteBreakdown } from "./quote-breakdown.tsx";

type BookingPanelProps = {
  bookingId: number | null;
  onClose: () => void;
  timeZone: string;
  /** Owner and manager change who and what is on a booking. */
  canEdit: boolean;
  engineers: EngineerDto[];
  equipment: EquipmentDto[];
  /** Opens another booking in the panel, e.g. the first hold a second hold waits behind. */
  onOpenBooking?: (bookingId: number) => void;
};

export function BookingPanel({ bookingId, onClose, ...props }: BookingPanelProps) {
  return (
    <Dialog open={bookingId !== null} onClose={onClose} title={`Booking #${bookingId ?? ""}`} size="lg">
      {bookingId !== null ? <BookingDetails key={bookingId} bookingId={bookingId} {...props} /> : null}
    </Dialog>
  );
}

function BookingDetails({ bookingId, ...props }: Omit<BookingPanelProps, "bookingId" | "onClose"> & { bookingId: number }) {
  const booking = useBooking(bookingId);
  if (booking.isPending) return <LoadingState label="Loading the booking…" />;
  if (booking.isError) return <ErrorState error={booking.error} onRetry={() => void booking.refetch()} />;
  return <BookingView booking={booking.data} {...props} />;
}

function BookingView({ booking, timeZone, canEdit, engineers, equipment, onOpenBooking }: Omit<BookingPanelProps, "bookingId" | "onClose"> & { booking: BookingDto }) {
  const currency = booking.quote.currency;
  const money = (cents: number) => formatMoney(cents, currency);
  const editable = canEdit && booking.status !== "cancelled" && booking.status !== "wrapped";

  return (
    <div className="flex flex-col gap-5">
      <div className="flex flex-wrap items-center gap-2">
        <BookingStatusBadge booking={booking} />
        {booking.requestedByClient ? <Badge tone="accent">Requested by the client</Badge> : null}
        {booking.title ? <span className="font-semibold">{booking.title}</span> : null}
      </div>

      <dl className="grid gap-x-6 gap-y-2 text-sm sm:grid-cols-[auto_1fr]">
        <Term label="Room">
          <span className="flex items-center gap-2">
            <span aria-hidden="true" className="size-3 rounded-sm" style={{ backgroundColor: roomColourHex[booking.room.colour] }} />
            {booking.room.name}
          </span>
        </Term>
        <Term label="Client">{booking.client.name}</Term>
        <Term label="Project">{booking.project?.name ?? <span className="text-muted">None</span>}</Term>
        <Term label="When">
          {formatTimeRange(booking.startsAt, booking.endsAt, timeZone, { withDay: true })}
          <span className="text-muted"> · studio time</span>
          {booking.lockout ? <span className="block text-muted">Lockout: whole days around the clock, each at the day rate</span> : null}
        </Term>
        {booking.status === "hold" && booking.holdExpiresAt ? (
          <Term label="Hold">Hold lapses {formatStudioDayTime(booking.holdExpiresAt, timeZone)}</Term>
        ) : null}
        {booking.queuedBehindId !== null ? (
          <Term label="Queue">
            {onOpenBooking ? (
              <button
                type="button"
                className="font-medium text-rust-deep underline-offset-2 hover:underline"
                onClick={() => onOpenBooking(booking.queuedBehindId as number)}
              >
                Second hold behind #{booking.queuedBehindId}
              </button>
            ) : (
              <>Second hold behind #{booking.queuedBehindId}</>
            )}
          </Term>
        ) : null}
        <Term label="Deposit">
          {booking.depositRequiredCents === 0
            ? "None required"
            : booking.depositReceivedAt
              ? `${money(booking.depositRequiredCents)}, received ${formatStudioDayTime(booking.depositReceivedAt, timeZone)}`
              : `${money(booking.depositRequiredCents)}, not received yet`}
        </Term>
        {booking.status === "cancelled" ? (
          <Term label="Cancelled">
            {booking.cancelledAt ? formatStudioDayTime(booking.cancelledAt, timeZone) : "Yes"}
            {booking.cancellationFeeCents ? `, fee ${money(booking.cancellationFeeCents)}` : ", no fee"}
            {booking.cancellationReason ? ` — ${booking.cancellationReason}` : ""}
          </Term>
        ) : null}
        {booking.notes ? (
          <Term label="Notes">
            <span className="whitespace-pre-line">{booking.notes}</span>
          </Term>
        ) : null}
      </dl>

      <BookingActions booking={booking} />

      <div className="grid gap-5 sm:grid-cols-2">
        <AssignedList
          booking={booking}
          kind="engineers"
          editable={editable}
          assigned={booking.engineers.map((e) => ({ value: e.userId, label: e.name, detail: e.grade === "assistant" ? "assistant" : undefined }))}
          options={engineers.map((e) => ({ value: e.userId, label: e.name, detail: e.grade === "assistant" ? "assistant" : undefined }))}
        />
        <AssignedList
          booking={booking}
          kind="equipment"
          editable={editable}
          assigned={booking.equipment.map((e) => ({ value: String(e.id), label: e.name }))}
          options={equipment
            .filter((e) => e.active || booking.equipment.some((b) => b.id === e.id))
            .map((e) => ({ value: String(e.id), label: e.name, detail: e.homeRoomId !== booking.room.id ? (e.homeRoomName ?? "stores") : undefined }))}
        />
      </div>

      <div>
        <h3 className="mb-2 font-semibold">Quoted price</h3>
        <QuoteBreakdown quote={booking.quote} depositRequiredCents={booking.depositRequiredCents} label="Quoted price" />
      </div>
    </div>
  );
}

function Term({ label, children }: { label: string; children: ReactNode }) {
  return (
    <>
      <dt className="font-semibold text-muted">{label}</dt>
      <dd className="min-w-0">{children}</dd>
    </>
  );
}

/** The buttons the API says this person may press on this booking now. */
function BookingActions({ booking }: { booking: BookingDto }) {
  const toast = useToast();
  const confirm = useConfirmBooking(booking.id);
  const start = useStartBooking(booking.id);
  const wrap = useWrapBooking(booking.id);
  const release = useReleaseBooking(booking.id);
  const [depositReceived, setDepositReceived] = useState(false);
  const [cancelling, setCancelling] = useState(false);
  const depositId = useId();
  const allowed = new Set(booking.allowedActions);
  if (allowed.size === 0) return null;

  const onError = (error: unknown) => toast(errorMessage(error), "error");
  const busy = confirm.isPending || start.isPending || wrap.isPending || release.isPending;

  return (
    <div className="flex flex-col gap-3 rounded-md border border-line bg-paper/60 p-3">
      {allowed.has("confirm") && booking.depositRequiredCents > 0 ? (
        <div className="flex items-center gap-2 text-sm">
          <input id={depositId} type="checkbox" className="size-4 accent-rust" checked={depositReceived} onChange={(e) => setDepositReceived(e.target.checked)} />
          <label htmlFor={depositId}>Deposit received</label>
          <span className="text-muted">({formatMoney(booking.depositRequiredCents, booking.quote.currency)})</span>
        </div>
      ) : null}
      <div className="flex flex-wrap gap-2">
        {allowed.has("confirm") ? (
          <Button
            pending={confirm.isPending}
            disabled={busy}
            onClick={() =>
              confirm.mutate(
                booking.depositRequiredCents > 0 ? { depositReceived } : {},
                { onSuccess: (saved) => toast(`Booking #${saved.id} confirmed`), onError },
              )
            }
          >
            Confirm booking
          </Button>
        ) : null}
        {allowed.has("start") ? (
          <Button pending={start.isPending} disabled={busy} onClick={() => start.mutate(undefined, { onSuccess: () => toast("Session started"), onError })}>
            Start session
          </Button>
        ) : null}
        {allowed.has("wrap") ? (
          <Button pending={wrap.isPending} disabled={busy} onClick={() => wrap.mutate(undefined, { onSuccess: () => toast("Session wrapped"), onError })}>
            Wrap session
          </Button>
        ) : null}
        {allowed.has("release") ? (
          <Button
            variant="secondary"
            pending={release.isPending}
            disabled={busy}
            onClick={() => release.mutate(undefined, { onSuccess: () => toast("Hold released; the slot is free"), onError })}
          >
            Release hold
          </Button>
        ) : null}
        {allowed.has("cancel") ? (
          <Button variant="secondary" disabled={busy} onClick={() => setCancelling(true)}>
            Cancel booking
          </Button>
        ) : null}
      </div>
      {allowed.has("cancel") ? <CancelBookingDialog booking={booking} open={cancelling} onClose={() => setCancelling(false)} /> : null}
    </div>
  );
}

type Option = { value: string; label: string; detail?: string };

/** Engineers or equipment on the booking, with a checklist to change them (saved with PATCH). */
function AssignedList({
  booking,
  kind,
  editable,
  assigned,
  options,
}: {
  booking: BookingDto;
  kind: "engineers" | "equipment";
  editable: boolean;
  assigned: Option[];
  options: Option[];
}) {
  const toast = useToast();
  const update = useUpdateBooking(booking.id);
  const [editing, setEditing] = useState(false);
  const [chosen, setChosen] = useState<string[]>([]);
  const title = kind === "engineers" ? "Engineers" : "Equipment";

  const open = () => {
    setChosen(assigned.map((a) => a.value));
    update.reset();
    setEditing(true);
  };
  const save = () =>
    update.mutate(kind === "engineers" ? { engineerIds: chosen } : { equipmentIds: chosen.map(Number) }, {
      onSuccess: () => {
        setEditing(false);
        toast(kind === "engineers" ? "Engineers saved" : "Equipment saved");
      },
    });

  // Someone assigned who is no longer offered (e.g. deactivated) still shows, so saving does not drop them unseen.
  const allOptions = [...options, ...assigned.filter((a) => !options.some((o) => o.value === a.value))];

  return (
    <section aria-label={title} className="flex flex-col gap-2">
      <div className="flex items-center justify-between gap-2">
        <h3 className="font-semibold">{title}</h3>
        {editable && !editing ? (
          <Button variant="ghost" size="sm" onClick={open}>
            {kind === "engineers" ? "Assign engineers" : "Assign equipment"}
          </Button>
        ) : null}
      </div>
      {editing ? (
        <div className="flex flex-col gap-2 rounded-md border border-line p-3">
          <FormAlert message={update.isError ? errorMessage(update.error) : null} />
          <CheckList legend={kind === "engineers" ? "Engineers on this booking" : "Equipment on this booking"} items={allOptions} value={chosen} onChange={setChosen} scroll />
          <div className="flex flex-wrap justify-end gap-2">
            <Button variant="secondary" size="sm" onClick={() => setEditing(false)}>
              Cancel
            </Button>
            <Button size="sm" onClick={save} pending={update.isPending}>
              {kind === "engineers" ? "Save engineers" : "Save equipment"}
            </Button>
          </div>
        </div>
      ) : assigned.length === 0 ? (
        <p className="text-sm text-muted">{kind === "engineers" ? "No engineer assigned." : "No equipment booked."}</p>
      ) : (
        <ul className="flex flex-col gap-1 text-sm">
          {assigned.map((item) => (
            <li key={item.value}>
              {item.label}
              {item.detail ? <span className="text-muted"> · {item.detail}</span> : null}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
