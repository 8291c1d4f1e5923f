import { useId, type ReactNode } from "react";
import { cx } from "../../lib/cx.ts";

export type FieldControlProps = {
  id: string;
  "aria-describedby"?: string;
  "aria-invalid"?: true;
};

type FormFieldProps = {
  label: string;
  error?: string;
  hint?: string;
  optional?: boolean;
  className?: string;
  /** Receives the ids to spread on the control, so label, hint and error stay tied to it. */
  children: (control: FieldControlProps) => ReactNode;
};

export function FormField({ label, error, hint, optional = false, className, children }: FormFieldProps) {
  const id = useId();
  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  const describedBy = [hint ? hintId : null, error ? errorId : null].filter(Boolean).join(" ");
  return (
    <div className={cx("flex flex-col gap-1.5", className)}>
      <div className="flex items-baseline justify-between gap-2">
        <label htmlFor={id} className="text-sm font-semibold text-ink">
          {label}
        </label>
        {/* Outside the label so the field's name stays exactly its label text. */}
        {optional ? <span className="text-xs text-muted">Optional</span> : null}
      </div>
      {children({ id, "aria-describedby": describedBy || undefined, "aria-invalid": error ? true : undefined })}
      {hint ? (
        <p id={hintId} className="text-sm text-muted">
          {hint}
        </p>
      ) : null}
      {error ? (
        <p id={errorId} className="text-sm font-medium text-alert">
          {error}
        </p>
      ) : null}
    </div>
  );
}

/** A message about the whole form (not one field), announced when it appears. */
export function FormAlert({ message }: { message: string | null | undefined }) {
  if (!message) return null;
  return (
    <p role="alert" className="rounded-md border border-alert/30 bg-alert-wash px-3 py-2 text-sm font-medium text-alert">
      {message}
    </p>
  );
}
