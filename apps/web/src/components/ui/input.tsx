import type { ComponentProps } from "react";
import { cx } from "../../lib/cx.ts";

export const controlStyles = cx(
  "block w-full rounded-md border border-line-strong bg-card px-3 text-ink placeholder:text-muted/70",
  "focus-visible:border-rust aria-invalid:border-alert disabled:opacity-60",
);

export function Input({ className, type = "text", ...props }: ComponentProps<"input">) {
  return <input type={type} className={cx(controlStyles, "h-10", className)} {...props} />;
}
