import type { PayPeriodStatus } from "@takeup/domain";
import { cx } from "../../../lib/cx.ts";

export const periodStatusLabels: Record<PayPeriodStatus, string> = { open: "Open", approved: "Approved", locked: "Locked" };

// Open is an outline, approved is tinted, locked is solid: the further along, the heavier.
const styles: Record<PayPeriodStatus, string> = {
  open: "border-ink/30 bg-card text-ink",
  approved: "border-rust/40 bg-rust-wash text-rust-deep",
  locked: "border-ink bg-ink text-paper",
};

export function PeriodStatusBadge({ status }: { status: PayPeriodStatus }) {
  return (
    <span className={cx("inline-flex items-center gap-1 rounded-full border px-2 py-0.5 text-xs font-semibold whitespace-nowrap", styles[status])}>
      {status === "locked" ? (
        <svg viewBox="0 0 12 12" className="size-3" fill="none" aria-hidden="true">
          <rect x="2" y="5.5" width="8" height="5.5" rx="1" fill="currentColor" />
          <path d="M4 5.5V4a2 2 0 0 1 4 0v1.5" stroke="currentColor" strokeWidth="1.3" />
        </svg>
      ) : null}
      {periodStatusLabels[status]}
    </span>
  );
}
