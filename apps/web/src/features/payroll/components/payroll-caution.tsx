import { payrollCaution } from "@takeup/domain";
import { cx } from "../../../lib/cx.ts";

type PayrollCautionProps = {
  /** The API's copy (`caution`) when the screen has it; the shared text otherwise. They are the same words. */
  text?: string;
  /** On the settings screen, where the choices are made, it stands out more. */
  prominent?: boolean;
  className?: string;
};

/** The caution every payroll screen shows: the rules are the studio's choice, not advice. */
export function PayrollCaution({ text, prominent = false, className }: PayrollCautionProps) {
  return (
    <aside
      aria-label="Payroll caution"
      className={cx(
        "max-w-3xl rounded-lg border text-sm",
        prominent ? "border-line-strong border-l-4 border-l-rust bg-card px-4 py-3 text-ink" : "border-line px-4 py-3 text-muted",
        className,
      )}
    >
      {prominent ? <p className="mb-1 font-semibold">Before you change anything</p> : null}
      <p>{text || payrollCaution}</p>
    </aside>
  );
}
