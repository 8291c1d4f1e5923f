import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { unlockPayPeriodInput, type PayPeriodDto, type Role } from "@takeup/domain";
import { Button } from "../../../components/ui/button.tsx";
import { ConfirmDialog } from "../../../components/ui/confirm-dialog.tsx";
import { Dialog, DialogActions } from "../../../components/ui/dialog.tsx";
import { FormAlert, FormField } from "../../../components/ui/form-field.tsx";
import { Textarea } from "../../../components/ui/textarea.tsx";
import { useToast } from "../../../components/ui/use-toast.ts";
import { errorMessage } from "../../../lib/api-client.ts";
import { applyApiErrors } from "../../../lib/form-errors.ts";
import { useApprovePayPeriod } from "../api/approve-pay-period.ts";
import { useLockPayPeriod } from "../api/lock-pay-period.ts";
import { useReopenPayPeriod } from "../api/reopen-pay-period.ts";
import { useUnlockPayPeriod } from "../api/unlock-pay-period.ts";
import { canApprovePeriods, canLockPeriods, canUnlockPeriods } from "../../../config/access.ts";

type PeriodActionsProps = { period: PayPeriodDto; role: Role; label: string };

/** What may happen next to a period, for this person: open → approved → locked, and back where allowed. */
export function PeriodActions({ period, role, label }: PeriodActionsProps) {
  const toast = useToast();
  const approve = useApprovePayPeriod();
  const lock = useLockPayPeriod();
  const reopen = useReopenPayPeriod();
  const [dialog, setDialog] = useState<"lock" | "unlock" | null>(null);
  const failed = (error: unknown) => toast(errorMessage(error), "error");

  const onApprove = () => approve.mutate(period.id, { onSuccess: () => toast(`Pay period ${label} approved`), onError: failed });
  const onReopen = () => reopen.mutate(period.id, { onSuccess: () => toast(`Pay period ${label} reopened`), onError: failed });
  const onLock = () =>
    lock.mutate(period.id, {
      onSuccess: () => {
        setDialog(null);
        toast(`Pay period ${label} locked`);
      },
      onError: (error) => {
        setDialog(null);
        failed(error);
      },
    });

  const buttons = [];
  if (period.status === "open" && canApprovePeriods(role)) {
    buttons.push(
      <Button key="approve" onClick={onApprove} pending={approve.isPending}>
        Approve period
      </Button>,
    );
  }
  if (period.status === "approved" && canLockPeriods(role)) {
    buttons.push(
      <Button key="lock" onClick={() => setDialog("lock")}>
        Lock period
      </Button>,
    );
  }
  if (period.status === "approved" && canApprovePeriods(role)) {
    buttons.push(
      <Button key="reopen" variant="secondary" onClick={onReopen} pending={reopen.isPending}>
        Reopen period
      </Button>,
    );
  }
  if (period.status === "locked" && canUnlockPeriods(role)) {
    buttons.push(
      <Button key="unlock" variant="secondary" onClick={() => setDialog("unlock")}>
        Unlock period
      </Button>,
    );
  }
  if (buttons.length === 0) return null;

  return (
    <>
      <div className="flex flex-wrap gap-2">{buttons}</div>
      <ConfirmDialog
        open={dialog === "lock"}
        title="Lock this pay period?"
        confirmLabel="Lock period"
        pending={lock.isPending}
        onConfirm={onLock}
        onCancel={() => setDialog(null)}
      >
        <p>Locked periods cannot change; only the owner can unlock.</p>
        <p className="text-muted">
          The hours, pay rates and payroll settings of {label} are kept as they are now, so the export stays the same.
        </p>
      </ConfirmDialog>
      {dialog === "unlock" ? (
        <UnlockDialog
          periodId={period.id}
          label={label}
          onClose={() => setDialog(null)}
          onUnlocked={() => {
            setDialog(null);
            toast(`Pay period ${label} unlocked`);
          }}
        />
      ) : null}
    </>
  );
}

type UnlockDialogProps = { periodId: number; label: string; onClose: () => void; onUnlocked: () => void };

function UnlockDialog({ periodId, label, onClose, onUnlocked }: UnlockDialogProps) {
  const unlock = useUnlockPayPeriod();
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm({ resolver: zodResolver(unlockPayPeriodInput), defaultValues: { reason: "" } });
  const onSubmit = handleSubmit(({ reason }) => {
    setFormError(null);
    unlock.mutate(
      { id: periodId, reason },
      { onSuccess: onUnlocked, onError: (error) => setFormError(applyApiErrors(error, setError, { fields: ["reason"] })) },
    );
  });
  return (
    <Dialog
      open
      onClose={onClose}
      title="Unlock this pay period?"
      description={`${label} opens again, so its time can change. The reason is kept in the activity log.`}
      size="sm"
    >
      <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
        <FormAlert message={formError} />
        <FormField label="Reason" error={formState.errors.reason?.message}>
          {(field) => <Textarea {...field} {...register("reason")} rows={3} maxLength={500} />}
        </FormField>
        <DialogActions>
          <Button variant="secondary" onClick={onClose}>
            Cancel
          </Button>
          <Button type="submit" variant="danger" pending={unlock.isPending}>
            Unlock period
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
