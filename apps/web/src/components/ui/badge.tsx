import type { ReactNode } from "react";
import { cx } from "../../lib/cx.ts";

type Tone = "neutral" | "accent" | "muted";

const tones: Record<Tone, string> = {
  neutral: "border-line-strong bg-card text-ink",
  accent: "border-rust/30 bg-rust-wash text-rust-deep",
  muted: "border-line bg-paper-deep text-muted",
};

export function Badge({ tone = "neutral", children }: { tone?: Tone; children: ReactNode }) {
  return (
    <span className={cx("inline-flex items-center rounded-full border px-2 py-0.5 text-xs font-medium whitespace-nowrap", tones[tone])}>
      {children}
    </span>
  );
}
