import type { ComponentProps } from "react";
import { cx } from "../../lib/cx.ts";
import { controlStyles } from "./input.tsx";

type SelectProps = Omit<ComponentProps<"select">, "size"> & { size?: "sm" | "md" };

export function Select({ className, size = "md", children, ...props }: SelectProps) {
  return (
    <div className={cx("relative", className)}>
      <select
        className={cx(controlStyles, "appearance-none pr-8", size === "sm" ? "h-8 text-sm" : "h-10")}
        {...props}
      >
        {children}
      </select>
      <svg
        className="pointer-events-none absolute top-1/2 right-2.5 size-4 -translate-y-1/2 text-muted"
        viewBox="0 0 16 16"
        fill="none"
        aria-hidden="true"
      >
        <path d="M4 6l4 4 4-4" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" strokeLinejoin="round" />
      </svg>
    </div>
  );
}
