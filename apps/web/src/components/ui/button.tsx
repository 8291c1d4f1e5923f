import type { ComponentProps } from "react";
import { cx } from "../../lib/cx.ts";
import { Spinner } from "./spinner.tsx";

type Variant = "primary" | "secondary" | "ghost" | "danger";
type Size = "sm" | "md";

const variants: Record<Variant, string> = {
  primary: "bg-rust text-white hover:bg-rust-deep border border-rust",
  secondary: "bg-card text-ink border border-line-strong hover:bg-paper-deep",
  ghost: "text-ink hover:bg-paper-deep border border-transparent",
  danger: "bg-alert text-white border border-alert hover:brightness-110",
};

const sizes: Record<Size, string> = {
  sm: "h-8 px-2.5 text-sm gap-1.5",
  md: "h-10 px-4 text-[0.9375rem] gap-2",
};

/** Shared with links that must look like buttons (an <a> stays an <a>). */
export function buttonStyles(variant: Variant = "primary", size: Size = "md", className?: string) {
  return cx(
    "inline-flex shrink-0 items-center justify-center rounded-md font-semibold whitespace-nowrap transition-colors",
    "disabled:cursor-not-allowed disabled:opacity-60",
    variants[variant],
    sizes[size],
    className,
  );
}

type ButtonProps = ComponentProps<"button"> & { variant?: Variant; size?: Size; pending?: boolean };

export function Button({ variant, size, pending = false, className, children, disabled, type = "button", ...props }: ButtonProps) {
  return (
    <button
      type={type}
      className={buttonStyles(variant, size, className)}
      disabled={disabled || pending}
      aria-busy={pending || undefined}
      {...props}
    >
      {pending ? <Spinner /> : null}
      {children}
    </button>
  );
}
