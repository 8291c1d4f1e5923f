/** Why a quote could not be made. Codes are stable so callers can map them to HTTP errors. */
export type PricingProblemCode =
  | "invalid_instant"
  | "not_whole_minutes"
  | "after_start"
  | "max_length"
  | "duplicate_engineer"
  | "invalid_engineer_rate"
  | "invalid_rate_card"
  | "invalid_time_zone"
  | "unknown_currency";

export interface PricingProblem {
  code: PricingProblemCode;
  /** The input field at fault, e.g. "endsAt" or "engineers[1].rateCentsOverride". */
  field: string;
  message: string;
}

export type Validation<T> = { ok: true; value: T } | { ok: false; problems: PricingProblem[] };

/** Thrown by `quote` when its inputs fail validation; carries every problem found, not just the first. */
export class PricingError extends Error {
  readonly problems: readonly PricingProblem[];

  constructor(problems: readonly PricingProblem[]) {
    super(problems.map((problem) => problem.message).join(" "));
    this.name = "PricingError";
    this.problems = problems;
  }
}
