import type { ReactNode } from "react";
import { Button } from "./button.tsx";
import { Dialog, DialogActions } from "./dialog.tsx";

type ConfirmDialogProps = {
  open: boolean;
  title: string;
  children: ReactNode;
  confirmLabel: string;
  tone?: "primary" | "danger";
  pending?: boolean;
  onConfirm: () => void;
  onCancel: () => void;
};

export function ConfirmDialog({ open, title, children, confirmLabel, tone = "primary", pending, onConfirm, onCancel }: ConfirmDialogProps) {
  return (
    <Dialog open={open} onClose={onCancel} title={title} size="sm">
      <div className="space-y-2 text-sm text-ink">{children}</div>
      <DialogActions>
        <Button variant="secondary" onClick={onCancel} data-autofocus>
          Cancel
        </Button>
        <Button variant={tone} onClick={onConfirm} pending={pending}>
          {confirmLabel}
        </Button>
      </DialogActions>
    </Dialog>
  );
}
