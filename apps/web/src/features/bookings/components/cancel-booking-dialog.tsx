import { useId, useState } from "react";
import { formatMoney, type BookingDto } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { Dialog, DialogActions } from "../../../components/ui/dialog.tsx";
import { FormAlert } from "../../../components/ui/form-field.tsx";
import { LoadingState } from "../../../components/ui/states.tsx";
import { Textarea } from "../../../components/ui/textarea.tsx";
import { useToast } from "../../../components/ui/use-toast.ts";
import { errorMessage } from "../../../lib/api-client.ts";
import { useCancelBooking } from "../api/cancel-booking.ts";
import { useCancellationPreview } from "../api/get-cancellation-preview.ts";

type CancelBookingDialogProps = { booking: BookingDto; open: boolean; onClose: () => void; onCancelled?: () => void };

/** Shows what cancelling costs now, and why, before anything is cancelled. */
export function CancelBookingDialog({ booking, open, onClose, onCancelled }: CancelBookingDialogProps) {
  return (
    <Dialog open={open} onClose={onClose} title={`Cancel booking #${booking.id}?`} size="sm">
      <CancelBookingBody booking={booking} onClose={onClose} onCancelled={onCancelled} />
    </Dialog>
  );
}

function CancelBookingBody({ booking, onClose, onCancelled }: Omit<CancelBookingDialogProps, "open">) {
  const toast = useToast();
  const preview = useCancellationPreview(booking.id);
  const cancel = useCancelBooking(booking.id);
  const [reason, setReason] = useState("");
  const reasonId = useId();
  const currency = booking.quote.currency;

  const confirm = () =>
    cancel.mutate(reason.trim() ? { reason: reason.trim() } : {}, {
      onSuccess: (saved) => {
        toast(
          saved.cancellationFeeCents
            ? `Booking #${saved.id} cancelled; a fee of ${formatMoney(saved.cancellationFeeCents, currency)} is due`
            : `Booking #${saved.id} cancelled, no fee`,
        );
        onCancelled?.();
        onClose();
      },
    });

  if (preview.isPending) return <LoadingState label="Working out the cancellation fee…" />;
  if (preview.isError) {
    return (
      <>
        <FormAlert message={errorMessage(preview.error)} />
        <DialogActions>
          <Button variant="secondary" onClick={onClose}>
            Keep booking
          </Button>
          <Button variant="secondary" onClick={() => void preview.refetch()}>
            Try again
          </Button>
        </DialogActions>
      </>
    );
  }

  const fee = preview.data.feeCents;
  return (
    <div className="flex flex-col gap-3 text-sm">
      <FormAlert message={cancel.isError ? errorMessage(cancel.error) : null} />
      <p>
        {booking.client.name}, {booking.room.name}. The quoted price was {formatMoney(booking.quoteTotalCents, currency)}.
      </p>
      <div className="rounded-md border border-line bg-paper/60 px-3 py-2">
        <p className="font-semibold">{fee > 0 ? `Cancellation fee: ${formatMoney(fee, currency)}` : "No cancellation fee"}</p>
        <p className="mt-0.5 text-muted">{preview.data.explanation}</p>
      </div>
      <div className="flex flex-col gap-1.5">
        <div className="flex items-baseline justify-between">
          <label htmlFor={reasonId} className="font-semibold">
            Reason
          </label>
          <span className="text-xs text-muted">Optional</span>
        </div>
        <Textarea id={reasonId} value={reason} onChange={(event) => setReason(event.target.value)} rows={2} maxLength={200} />
      </div>
      <DialogActions>
        <Button variant="secondary" onClick={onClose} data-autofocus>
          Keep booking
        </Button>
        <Button variant="danger" onClick={confirm} pending={cancel.isPending}>
          {fee > 0 ? `Cancel booking and charge ${formatMoney(fee, currency)}` : "Cancel booking (no fee)"}
        </Button>
      </DialogActions>
    </div>
  );
}
