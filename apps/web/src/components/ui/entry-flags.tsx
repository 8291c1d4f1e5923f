import type { TimeEntryDto } from "@takeup/domain";
import { cx } from "../../lib/cx.ts";

type Flag = TimeEntryDto["flags"][number];

export const flagLabels: Record<Flag, string> = {
  open_too_long: "Open too long",
  missing_break: "No break recorded",
  pending_edit: "Correction waiting",
  no_pay_rate: "No pay rate",
  self_approved: "Self-approved correction",
};

// Problems that stop pay are marked strongest; a waiting correction is only news.
const flagStyles: Record<Flag, string> = {
  open_too_long: "border-alert/40 bg-alert-wash text-alert",
  no_pay_rate: "border-alert/40 bg-alert-wash text-alert",
  missing_break: "border-rust/30 bg-rust-wash text-rust-deep",
  pending_edit: "border-line-strong border-dashed bg-card text-ink",
  self_approved: "border-rust/30 bg-rust-wash text-rust-deep",
};

export function EntryFlags({ flags }: { flags: readonly Flag[] }) {
  if (flags.length === 0) return null;
  return (
    <ul className="flex flex-wrap gap-1">
      {flags.map((flag) => (
        <li key={flag} className={cx("inline-flex items-center rounded-full border px-2 py-0.5 text-xs font-medium whitespace-nowrap", flagStyles[flag])}>
          {flagLabels[flag]}
        </li>
      ))}
    </ul>
  );
}
