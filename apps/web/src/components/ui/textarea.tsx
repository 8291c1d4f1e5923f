import type { ComponentProps } from "react";
import { cx } from "../../lib/cx.ts";
import { controlStyles } from "./input.tsx";

export function Textarea({ className, rows = 3, ...props }: ComponentProps<"textarea">) {
  return <textarea rows={rows} className={cx(controlStyles, "py-2 leading-snug", className)} {...props} />;
}
