import type { TimeEntryEditDto } from "@takeup/domain";
import { cx } from "../../../lib/cx.ts";

type Status = TimeEntryEditDto["status"];

export const editStatusLabels: Record<Status, string> = { pending: "Waiting", approved: "Approved", rejected: "Rejected" };

const styles: Record<Status, string> = {
  pending: "border-dashed border-ink/40 bg-card text-ink",
  approved: "border-ink/20 bg-paper-deep text-ink",
  rejected: "border-alert/40 bg-alert-wash text-alert",
};

export function EditStatusBadge({ status }: { status: Status }) {
  return (
    <span className={cx("inline-flex items-center rounded-full border px-2 py-0.5 text-xs font-semibold whitespace-nowrap", styles[status])}>
      {editStatusLabels[status]}
    </span>
  );
}
